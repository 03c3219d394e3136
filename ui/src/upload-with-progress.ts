import type { z } from 'zod';
import { apiErrorBody } from '@server/contracts/errors.ts';
import { ApiError } from './api-client.ts';

/** How far an upload has got: bytes sent of the total, and the share as 0–1 (1 once the body has been sent). */
export interface UploadProgress {
  sentBytes: number;
  totalBytes: number;
  fraction: number;
}

interface UploadOptions {
  /** Text fields sent with the file in the same multipart form. */
  fields?: Record<string, string>;
  onProgress?: (progress: UploadProgress) => void;
  signal?: AbortSignal;
}

/**
 * Sends one file as multipart field `file` to the API and parses the answer with the contract's schema. Uses
 * XMLHttpRequest rather than fetch because only XHR reports upload progress; errors become the same ApiError the
 * JSON client throws, so forms show them alike.
 */
export function uploadWithProgress<T>(
  path: string,
  file: Blob,
  schema: z.ZodType<T>,
  options: UploadOptions = {},
): Promise<T> {
  const form = new FormData();
  for (const [name, value] of Object.entries(options.fields ?? {})) form.append(name, value);
  form.append('file', file, file instanceof File ? file.name : 'upload');

  return new Promise<T>((resolve, reject) => {
    const xhr = new XMLHttpRequest();
    xhr.open('POST', `/api${path}`);
    xhr.withCredentials = true;
    xhr.setRequestHeader('Accept', 'application/json');
    xhr.upload.addEventListener('progress', (event) => {
      if (!event.lengthComputable) return;
      options.onProgress?.({
        sentBytes: event.loaded,
        totalBytes: event.total,
        fraction: event.total ? event.loaded / event.total : 1,
      });
    });
    xhr.upload.addEventListener('load', () =>
      options.onProgress?.({ sentBytes: file.size, totalBytes: file.size, fraction: 1 }),
    );
    xhr.addEventListener('load', () => {
      let body: unknown = null;
      try {
        body = JSON.parse(xhr.responseText);
      } catch {
        // Left null: an answer that is not JSON is reported below by its status.
      }
      if (xhr.status >= 200 && xhr.status < 300) {
        const parsed = schema.safeParse(body);
        if (parsed.success) resolve(parsed.data);
        else reject(new ApiError('server', 'The shop answered in an unexpected shape.', xhr.status));
        return;
      }
      const error = apiErrorBody.safeParse(body);
      if (error.success)
        reject(new ApiError(error.data.error.kind, error.data.error.message, xhr.status, error.data.error.fields));
      else reject(new ApiError('server', `The shop answered with an unexpected error (${xhr.status}).`, xhr.status));
    });
    xhr.addEventListener('error', () =>
      reject(new ApiError('network', 'We could not reach the shop. Check your connection and try again.', 0)),
    );
    xhr.addEventListener('abort', () => reject(new ApiError('network', 'The upload was stopped.', 0)));
    options.signal?.addEventListener('abort', () => xhr.abort());
    xhr.send(form);
  });
}
