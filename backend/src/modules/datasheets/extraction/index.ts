import type { DatasheetExtraction } from '@understudy/shared-types';
import { extractFromText } from './extract';
import { readPdf, type PageSize } from './pdf-text';

export { PdfRejectionError, type PdfRejectionCode } from './errors';
export { summarise } from './summarise';

export interface PdfOptions {
  /** Refuse documents longer than this; DATASHEET_LIMITS.maxPages by default. */
  maxPages?: number;
}

/**
 * The checks an upload needs before the file is stored: that it is a readable, unencrypted PDF within the page limit
 * with a text layer. Throws PdfRejectionError with a sentence for the user otherwise.
 */
export async function inspectPdf(data: Uint8Array, options: PdfOptions = {}): Promise<{ pageCount: number; pages: PageSize[] }> {
  const pdf = await readPdf(data, { ...options, text: 'probe' });
  return { pageCount: pdf.pageCount, pages: pdf.pages };
}

/** Reads a datasheet into proposed parameter values and identity, with the same checks as inspectPdf. */
export async function extractDatasheet(data: Uint8Array, options: PdfOptions = {}): Promise<DatasheetExtraction> {
  const pdf = await readPdf(data, { ...options, text: 'all' });
  return extractFromText(pdf);
}
