// Reads one datasheet PDF and prints its summary as exactly one line of JSON on stdout; reasons go to stderr.
// Exit codes: 0 parsed, 1 refused or unreadable file, 2 usage.
import { readFile } from 'node:fs/promises';
import path from 'node:path';
import type { PdfRejectionCode, PdfRejectionError } from '../modules/datasheets/extraction/errors';

// stdout carries the JSON alone: anything a library logs goes to stderr, set before pdf.js is loaded.
console.log = console.error;
console.info = console.error;
console.debug = console.error;

function fail(message: string, code: number): never {
  process.stderr.write(`parse-datasheet: ${message}\n`);
  process.exit(code);
}

function reason(err: PdfRejectionError): string {
  const phrases: Record<PdfRejectionCode, string> = {
    empty: 'is empty',
    'not-pdf': 'is not a PDF (no PDF header)',
    truncated: 'is truncated: the file ends early; download or copy it again',
    encrypted: 'is encrypted; remove the password and try again',
    unreadable: 'is damaged and cannot be read',
    'too-many-pages': `has ${err.details.pageCount ?? 'too many'} pages, more than the limit of ${err.details.maxPages ?? 'this tool'}`,
    'no-text': 'has no text layer (it looks like a scanned document; OCR is not supported)',
  };
  return phrases[err.code];
}

const file = process.argv[2];
if (!file) fail('usage: parse-datasheet FILE.pdf', 2);
const name = path.basename(file);

let data: Buffer;
try {
  data = await readFile(file);
} catch (err) {
  const code = (err as NodeJS.ErrnoException).code;
  fail(code === 'ENOENT' ? `${name}: no such file` : code === 'EISDIR' ? `${name} is a directory` : `${name}: ${(err as Error).message}`, 1);
}

const { extractDatasheet, summarise, PdfRejectionError: Rejection } = await import('../modules/datasheets/extraction/index');
try {
  const summary = summarise(await extractDatasheet(new Uint8Array(data)));
  process.stdout.write(`${JSON.stringify(summary)}\n`, () => process.exit(0));
} catch (err) {
  if (err instanceof Rejection) fail(`${name} ${reason(err)}`, 1);
  fail(`${name} could not be parsed: ${(err as Error).message}`, 1);
}
