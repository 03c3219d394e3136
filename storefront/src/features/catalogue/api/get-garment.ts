import { queryOptions, useQuery } from '@tanstack/react-query';
import { garmentDetailResponse } from '@server/contracts/catalogue.ts';
import { apiRequest } from '@ui/api-client.ts';

export const getGarment = (slug: string) =>
  apiRequest(`/catalogue/garments/${encodeURIComponent(slug)}`, garmentDetailResponse).then((body) => body.garment);

export const garmentQuery = (slug: string) =>
  queryOptions({ queryKey: ['catalogue', 'garments', slug], queryFn: () => getGarment(slug), staleTime: 5 * 60_000 });

/** One garment with its back drawing and measured sizes, for its own page. */
export const useGarment = (slug: string) => useQuery(garmentQuery(slug));
