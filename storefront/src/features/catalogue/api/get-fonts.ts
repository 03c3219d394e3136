import { queryOptions, useQuery } from '@tanstack/react-query';
import { fontListResponse } from '@server/contracts/catalogue.ts';
import { apiRequest } from '@ui/api-client.ts';

export const getFonts = () => apiRequest('/catalogue/fonts', fontListResponse).then((body) => body.fonts);

export const fontsQuery = () =>
  queryOptions({ queryKey: ['catalogue', 'fonts'], queryFn: getFonts, staleTime: 5 * 60_000 });

export const useFonts = () => useQuery(fontsQuery());
