import { queryOptions, useQuery } from '@tanstack/react-query';
import { fontListResponse } from '@server/contracts/catalog.ts';
import { apiRequest } from '@ui/api-client.ts';

export const getFonts = () => apiRequest('/catalog/fonts', fontListResponse).then((body) => body.fonts);

export const fontsQuery = () => queryOptions({ queryKey: ['catalog', 'fonts'], queryFn: getFonts, staleTime: 5 * 60_000 });

export const useFonts = () => useQuery(fontsQuery());
