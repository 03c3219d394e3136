import { queryOptions, useQuery } from '@tanstack/react-query';
import { hoopListResponse } from '@server/contracts/catalogue.ts';
import { apiRequest } from '@ui/api-client.ts';

/** The studio's hoops, for keeping single items within the largest sewing field. */
export const getHoops = () => apiRequest('/catalogue/hoops', hoopListResponse).then((body) => body.hoops);

export const hoopsQuery = () =>
  queryOptions({ queryKey: ['catalogue', 'hoops'], queryFn: getHoops, staleTime: 5 * 60_000 });

export const useHoops = () => useQuery(hoopsQuery());
