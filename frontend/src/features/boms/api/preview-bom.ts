import { useMutation } from '@tanstack/react-query';
import { ApiErrorSchema, BomPreviewSchema, type BomDelimiter, type BomPreview } from '@understudy/shared-types';
import { ApiClientError, api, apiUrl } from '../../../lib/api-client';

export type BomPreviewInput =
  | { kind: 'text'; text: string; delimiter?: BomDelimiter; hasHeader?: boolean }
  /** The bytes go up as they are, so the server can tell their encoding. */
  | { kind: 'file'; file: File };

async function readJson(response: Response): Promise<unknown> {
  const text = await response.text();
  if (!text) return undefined;
  try {
    return JSON.parse(text) as unknown;
  } catch {
    return undefined;
  }
}

/** The api client speaks JSON only; a file goes as multipart, with the same error shape on the way back. */
async function postFile(file: File): Promise<BomPreview> {
  const form = new FormData();
  form.append('file', file, file.name);
  let response: Response;
  try {
    response = await fetch(apiUrl('/boms/preview'), {
      method: 'POST',
      headers: { Accept: 'application/json' },
      credentials: 'same-origin',
      body: form,
    });
  } catch {
    throw new ApiClientError({
      status: 0,
      code: 'network_error',
      message: 'The file did not reach the server. Check your connection and try again.',
    });
  }
  const payload = await readJson(response);
  if (!response.ok) {
    const parsed = ApiErrorSchema.safeParse(payload);
    throw new ApiClientError({
      status: response.status,
      code: parsed.success ? parsed.data.error.code : `http_${response.status}`,
      message: parsed.success
        ? parsed.data.error.message
        : response.status === 413
          ? 'The file is too large to read.'
          : 'Something went wrong on our side. Try again in a moment.',
      payload,
    });
  }
  const result = BomPreviewSchema.safeParse(payload);
  if (!result.success) {
    console.error('Unexpected response shape from POST /boms/preview', result.error.issues);
    throw new ApiClientError({
      status: response.status,
      code: 'invalid_response',
      message: 'The server sent an answer Understudy did not expect. Try again, or tell an admin.',
    });
  }
  return result.data;
}

/** Reads a paste or a file without saving anything: encoding, delimiter, header and a guessed column mapping. */
export function previewBom(input: BomPreviewInput): Promise<BomPreview> {
  if (input.kind === 'file') return postFile(input.file);
  const { text, delimiter, hasHeader } = input;
  return api.post('/boms/preview', { text, delimiter, hasHeader }, BomPreviewSchema);
}

export function usePreviewBom() {
  return useMutation({ mutationFn: previewBom });
}
