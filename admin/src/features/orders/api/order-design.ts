import { queryOptions, useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import {
  orderDesignResponse,
  repricedOrder,
  stitchFileResponse,
  type StitchFileRequest,
} from '@server/contracts/proof-versions.ts';
import type { DesignDocument } from '@server/contracts/designs.ts';
import { fontListResponse, threadListResponse } from '@server/contracts/catalogue.ts';
import { apiErrorBody } from '@server/contracts/errors.ts';
import { ApiError, apiRequest } from '@ui/api-client.ts';
import { orderQuery } from './get-order.ts';

const designPath = (number: string) => `/admin/orders/${encodeURIComponent(number)}/design`;

/** The order's design as the customer last saw it, priced now, with the stitch files entered so far. */
export const orderDesignQuery = (number: string) =>
  queryOptions({
    queryKey: ['admin', 'orders', number, 'design'],
    queryFn: () => apiRequest(designPath(number), orderDesignResponse),
  });
export const useOrderDesign = (number: string) => useQuery(orderDesignQuery(number));

/** The shop's threads and lettering fonts, for the editor's choices. */
export const useEditorChoices = () =>
  useQuery({
    queryKey: ['catalogue', 'editor-choices'],
    queryFn: async () => {
      const [threads, fonts] = await Promise.all([
        apiRequest('/catalogue/threads', threadListResponse),
        apiRequest('/catalogue/fonts', fontListResponse),
      ]);
      return { threads: threads.threads, fonts: fonts.fonts };
    },
    staleTime: 5 * 60_000,
  });

export function useEnterStitchFile(number: string, placementId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (figures: StitchFileRequest) =>
      apiRequest(
        `/admin/orders/${encodeURIComponent(number)}/placements/${encodeURIComponent(placementId)}/stitch-file`,
        stitchFileResponse,
        { method: 'PUT', body: figures },
      ),
    onSuccess: () =>
      Promise.all([
        queryClient.invalidateQueries({ queryKey: orderDesignQuery(number).queryKey }),
        queryClient.invalidateQueries({ queryKey: orderQuery(number).queryKey }),
      ]),
  });
}

/** The server's price of the studio's draft, against what the customer authorized. */
export const usePricedDraft = (number: string, document: DesignDocument | null) =>
  useQuery({
    queryKey: ['admin', 'orders', number, 'draft-price', document],
    queryFn: ({ signal }) =>
      apiRequest(`${designPath(number)}/price`, repricedOrder, { method: 'POST', body: { document }, signal }),
    enabled: document !== null,
    placeholderData: (previous) => previous,
    retry: false,
  });

/** The server's drawing of the draft on the garment, as an object URL the page shows (and frees when replaced). */
export const useDraftPicture = (number: string, document: DesignDocument | null) =>
  useQuery({
    queryKey: ['admin', 'orders', number, 'draft-picture', document],
    queryFn: async ({ signal }) => {
      const response = await fetch(`/api${designPath(number)}/picture`, {
        method: 'POST',
        credentials: 'same-origin',
        headers: { 'Content-Type': 'application/json' },
        body: JSON.stringify({ document }),
        signal,
      });
      if (!response.ok) {
        const failure = apiErrorBody.safeParse(await response.json().catch(() => null));
        throw new ApiError(
          failure.success ? failure.data.error.kind : 'server',
          failure.success ? failure.data.error.message : 'The drawing could not be made; try again.',
          response.status,
        );
      }
      return URL.createObjectURL(await response.blob());
    },
    enabled: document !== null,
    placeholderData: (previous) => previous,
    retry: false,
    gcTime: 0,
  });
