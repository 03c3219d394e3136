import { useMutation, useQueryClient } from '@tanstack/react-query';
import { sentProofResponse, type SentProofResponse } from '@server/contracts/studio-orders.ts';
import { apiErrorBody } from '@server/contracts/errors.ts';
import type { DesignDocument } from '@server/contracts/designs.ts';
import { ApiError, apiRequest } from '@ui/api-client.ts';
import { orderQuery } from './get-order.ts';
import { orderBoardKey } from './get-order-board.ts';

export type SendProofInput =
  { source: 'render'; message: string; document?: DesignDocument } | { source: 'photo'; message: string; file: File };

const proofsPath = (number: string) => `/api/admin/orders/${encodeURIComponent(number)}/proofs`;

/**
 * A photo goes up as multipart through XMLHttpRequest, the one browser API that reports upload progress; the
 * answer is read exactly as the shared API client reads one.
 */
function uploadPhoto(
  number: string,
  input: Extract<SendProofInput, { source: 'photo' }>,
  onProgress: (fraction: number) => void,
): Promise<SentProofResponse> {
  const form = new FormData();
  form.set('source', 'photo');
  form.set('message', input.message);
  form.set('file', input.file);
  return new Promise((resolve, reject) => {
    const request = new XMLHttpRequest();
    request.open('POST', proofsPath(number));
    request.setRequestHeader('Accept', 'application/json');
    request.upload.onprogress = (event) => event.lengthComputable && onProgress(event.loaded / event.total);
    request.onerror = () =>
      reject(new ApiError('network', 'We could not reach the shop. Check your connection and try again.', 0));
    request.onload = () => {
      const body = (() => {
        try {
          return JSON.parse(request.responseText);
        } catch {
          return null;
        }
      })();
      if (request.status >= 200 && request.status < 300) return resolve(sentProofResponse.parse(body));
      const failure = apiErrorBody.safeParse(body);
      reject(
        failure.success
          ? new ApiError(failure.data.error.kind, failure.data.error.message, request.status, failure.data.error.fields)
          : new ApiError('server', `The shop answered with an unexpected error (${request.status}).`, request.status),
      );
    };
    request.send(form);
  });
}

export const sendProof = (number: string, input: SendProofInput, onProgress: (fraction: number) => void) =>
  input.source === 'photo'
    ? uploadPhoto(number, input, onProgress)
    : apiRequest(`/admin/orders/${encodeURIComponent(number)}/proofs`, sentProofResponse, {
        method: 'POST',
        body: { source: 'render', message: input.message, ...(input.document && { document: input.document }) },
      });

export function useSendProof(number: string, onProgress: (fraction: number) => void) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (input: SendProofInput) => sendProof(number, input, onProgress),
    onSuccess: () =>
      Promise.all([
        queryClient.invalidateQueries({ queryKey: orderQuery(number).queryKey }),
        queryClient.invalidateQueries({ queryKey: orderBoardKey }),
        queryClient.invalidateQueries({ queryKey: ['admin', 'orders', number, 'design'] }),
      ]),
  });
}
