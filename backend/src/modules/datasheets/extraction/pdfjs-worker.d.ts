// pdfjs-dist ships no types for its worker build; it is only imported for its side effect.
declare module 'pdfjs-dist/legacy/build/pdf.worker.mjs';
