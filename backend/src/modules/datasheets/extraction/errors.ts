import type { UploadRejection } from '@understudy/shared-types';

/** The reasons the parser itself can refuse a file; size and duplicates are the upload's business. */
export type PdfRejectionCode = Exclude<UploadRejection['code'], 'too-large' | 'duplicate'>;

export interface PdfRejectionDetails {
  pageCount?: number;
  maxPages?: number;
}

function messageFor(code: PdfRejectionCode, details: PdfRejectionDetails): string {
  switch (code) {
    case 'empty':
      return 'The file is empty.';
    case 'not-pdf':
      return 'This file is not a PDF: it does not start with a PDF header.';
    case 'truncated':
      return 'The PDF is incomplete: the file ends early, as if the download or copy was cut short.';
    case 'encrypted':
      return 'The PDF is password-protected; remove the password and upload it again.';
    case 'unreadable':
      return 'The PDF is damaged and could not be read.';
    case 'too-many-pages':
      return `The PDF has ${details.pageCount ?? 'too many'} pages; the limit is ${details.maxPages ?? 'lower'}.`;
    case 'no-text':
      return 'The PDF has no text layer: it looks like a scanned document; this app reads the text layer only, OCR is not supported.';
  }
}

/** A file the parser refuses, with a one-sentence reason a user can act on. */
export class PdfRejectionError extends Error {
  readonly code: PdfRejectionCode;
  readonly details: PdfRejectionDetails;

  constructor(code: PdfRejectionCode, details: PdfRejectionDetails = {}) {
    super(messageFor(code, details));
    this.name = 'PdfRejectionError';
    this.code = code;
    this.details = details;
  }
}
