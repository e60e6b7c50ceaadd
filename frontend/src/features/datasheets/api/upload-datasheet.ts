import {
  ApiErrorSchema,
  DatasheetUploadResponseSchema,
  UploadRejectionSchema,
  type DatasheetListItem,
  type UploadRejection,
} from '@understudy/shared-types';
import { z } from 'zod';
import { ApiClientError, apiUrl, isApiClientError } from '../../../lib/api-client';

export interface UploadOptions {
  /** Attach the new datasheet to this part. */
  partId?: string;
  onProgress?: (loaded: number, total: number) => void;
  signal?: AbortSignal;
}

const FALLBACK: Record<number, string> = {
  401: 'Please sign in to continue.',
  403: 'You do not have permission to upload datasheets.',
  413: 'The file is too large to upload.',
};

function parseJson(text: string): unknown {
  if (!text) return undefined;
  try {
    return JSON.parse(text) as unknown;
  } catch {
    return undefined;
  }
}

function errorFrom(status: number, payload: unknown): ApiClientError {
  const parsed = ApiErrorSchema.safeParse(payload);
  return new ApiClientError({
    status,
    code: parsed.success ? parsed.data.error.code : `http_${status}`,
    message: parsed.success
      ? parsed.data.error.message
      : (FALLBACK[status] ?? 'Something went wrong on our side. Try again in a moment.'),
    issues: parsed.success ? parsed.data.error.issues : undefined,
    payload,
  });
}

/**
 * Uploads one PDF. XMLHttpRequest rather than fetch, because only it reports upload progress. Same origin, so the
 * session cookie rides along exactly as with the api client, and the browser sets Origin and Sec-Fetch-Site.
 */
export function uploadDatasheet(file: File, { partId, onProgress, signal }: UploadOptions = {}): Promise<DatasheetListItem> {
  return new Promise((resolve, reject) => {
    if (signal?.aborted) {
      reject(new DOMException('The upload was cancelled.', 'AbortError'));
      return;
    }
    const form = new FormData();
    // Text fields first, so the server knows the target part before the file streams in.
    if (partId) form.append('partId', partId);
    form.append('files', file, file.name);

    const xhr = new XMLHttpRequest();
    xhr.open('POST', apiUrl('/datasheets'));
    xhr.setRequestHeader('Accept', 'application/json');
    xhr.upload.onprogress = (event) => {
      onProgress?.(event.loaded, event.lengthComputable ? event.total : file.size);
    };
    xhr.onload = () => {
      const payload = parseJson(xhr.responseText);
      if (xhr.status < 200 || xhr.status >= 300) {
        reject(errorFrom(xhr.status, payload));
        return;
      }
      const parsed = DatasheetUploadResponseSchema.safeParse(payload);
      const item = parsed.success ? parsed.data.items[0] : undefined;
      if (!item) {
        console.error('Unexpected response shape from POST /datasheets', parsed.error?.issues);
        reject(
          new ApiClientError({
            status: xhr.status,
            code: 'invalid_response',
            message: 'The server sent an answer Understudy did not expect. Try again, or tell an admin.',
          }),
        );
        return;
      }
      resolve(item);
    };
    xhr.onerror = () =>
      reject(
        new ApiClientError({
          status: 0,
          code: 'network_error',
          message: 'The upload did not reach the server. Check your connection and try again.',
        }),
      );
    xhr.onabort = () => reject(new DOMException('The upload was cancelled.', 'AbortError'));
    signal?.addEventListener('abort', () => xhr.abort(), { once: true });
    xhr.send(form);
  });
}

const RejectionPayloadSchema = z.object({ files: z.array(UploadRejectionSchema) });

/**
 * Why the server refused the file (422 upload_rejected, 413 too_large), as it said for that one file. One file per
 * request, so the first entry is ours whatever name the server gives it.
 */
export function uploadRejectionOf(error: unknown): UploadRejection | undefined {
  if (!isApiClientError(error) || (error.status !== 422 && error.status !== 413)) return undefined;
  const parsed = RejectionPayloadSchema.safeParse(error.payload);
  return parsed.success ? parsed.data.files[0] : undefined;
}

export function isAbortError(error: unknown): boolean {
  return error instanceof DOMException && error.name === 'AbortError';
}
