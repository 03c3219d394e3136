import { queryOptions, useQuery } from '@tanstack/react-query';
import { savedDesignResponse } from '@server/contracts/saved-designs.ts';
import { apiRequest } from '@ui/api-client.ts';

/** One of the signed-in customer's saved designs; its document has passed the contract's restoreDesign. */
export const getSavedDesign = (id: number) =>
  apiRequest(`/designs/${id}`, savedDesignResponse).then((body) => body.design);

export const savedDesignQuery = (id: number) =>
  queryOptions({ queryKey: ['designs', id], queryFn: () => getSavedDesign(id) });

export const useSavedDesign = (id: number | undefined) =>
  useQuery({ ...savedDesignQuery(id ?? 0), enabled: id !== undefined });
