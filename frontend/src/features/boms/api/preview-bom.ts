import { useMutation } from '@tanstack/react-query';
import { BomPreviewSchema, type BomDelimiter, type BomPreview } from '@understudy/shared-types';
import { api, apiRequest } from '../../../lib/api-client';

export type BomPreviewInput =
  | { kind: 'text'; text: string; delimiter?: BomDelimiter; hasHeader?: boolean }
  /** The bytes go up as they are, so the server can tell their encoding. */
  | { kind: 'file'; file: File };

/** Reads a paste or a file without saving anything: encoding, delimiter, header and a guessed column mapping. */
export function previewBom(input: BomPreviewInput): Promise<BomPreview> {
  if (input.kind === 'file') {
    const form = new FormData();
    form.append('file', input.file, input.file.name);
    return apiRequest('/boms/preview', { method: 'POST', form, schema: BomPreviewSchema });
  }
  const { text, delimiter, hasHeader } = input;
  return api.post('/boms/preview', { text, delimiter, hasHeader }, BomPreviewSchema);
}

export function usePreviewBom() {
  return useMutation({ mutationFn: previewBom });
}
