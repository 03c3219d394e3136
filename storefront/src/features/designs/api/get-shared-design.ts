import { queryOptions, useQuery } from '@tanstack/react-query';
import { sharedDesignResponse } from '@server/contracts/design-sharing.ts';
import { apiRequest } from '@ui/api-client.ts';

/** A design someone shared by link: read-only, and without anything about who made it. */
export const getSharedDesign = (token: string) =>
  apiRequest(`/shared-designs/${encodeURIComponent(token)}`, sharedDesignResponse).then((body) => body.design);

export const sharedDesignQuery = (token: string) =>
  queryOptions({ queryKey: ['shared-designs', token], queryFn: () => getSharedDesign(token) });

export const useSharedDesign = (token: string) => useQuery(sharedDesignQuery(token));
