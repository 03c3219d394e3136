import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiErrorBody } from '@server/contracts/errors.ts';
import { artworkUploadResponse, type ArtworkUpload } from '@server/contracts/artwork.ts';
import { ApiError } from '@ui/api-client.ts';
import { artworksQuery } from './get-artworks.ts';

/** How far an upload has gone, 0 to 1, while it is sent. */
export type UploadProgress = (fraction: number) => void;

function errorOf(request: XMLHttpRequest): ApiError {
  let body: unknown = null;
  try {
    body = JSON.parse(request.responseText);
  } catch {
    // Not JSON: a proxy's page, say; the status tells what there is to tell.
  }
  const parsed = apiErrorBody.safeParse(body);
  if (parsed.success)
    return new ApiError(parsed.data.error.kind, parsed.data.error.message, request.status, parsed.data.error.fields);
  if (request.status === 413) return new ApiError('too-large', 'That file is too large.', 413);
  return new ApiError('server', `The shop answered with an unexpected error (${request.status}).`, request.status);
}

/**
 * Sends one picture as multipart form data. XMLHttpRequest rather than fetch, because only it reports how much of
 * the body has gone, which the progress bar shows; errors come back as the same ApiError the other calls throw.
 */
export function uploadArtwork(file: File, onProgress: UploadProgress): Promise<ArtworkUpload> {
  return new Promise((resolve, reject) => {
    const request = new XMLHttpRequest();
    request.open('POST', '/api/artwork');
    request.responseType = 'text';
    request.setRequestHeader('Accept', 'application/json');
    request.upload.addEventListener('progress', (event) => {
      if (event.lengthComputable && event.total > 0) onProgress(event.loaded / event.total);
    });
    request.addEventListener('load', () => {
      if (request.status < 200 || request.status >= 300) return reject(errorOf(request));
      const parsed = artworkUploadResponse.safeParse(JSON.parse(request.responseText));
      if (parsed.success) resolve(parsed.data.artwork);
      else reject(new ApiError('server', 'The shop sent back something we could not read.', request.status));
    });
    const offline = () =>
      reject(new ApiError('network', 'We could not reach the shop. Check your connection and try again.', 0));
    request.addEventListener('error', offline);
    request.addEventListener('abort', offline);
    const form = new FormData();
    form.append('file', file);
    request.send(form);
  });
}

/** Uploads a picture and adds it to the customer's uploads, so the designer can place it at once. */
export function useUploadArtwork(onProgress: UploadProgress) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (file: File) => uploadArtwork(file, onProgress),
    onSuccess: (artwork) => {
      queryClient.setQueryData(artworksQuery().queryKey, (current: ArtworkUpload[] | undefined) => [
        artwork,
        ...(current ?? []).filter((known) => known.id !== artwork.id),
      ]);
    },
  });
}
