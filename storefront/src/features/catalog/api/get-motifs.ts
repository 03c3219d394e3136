import { queryOptions, useQuery } from '@tanstack/react-query';
import { motifListResponse } from '@server/contracts/catalog.ts';
import { apiRequest } from '@ui/api-client.ts';

export const getMotifs = () => apiRequest('/catalog/motifs', motifListResponse).then((body) => body.motifs);

export const motifsQuery = () => queryOptions({ queryKey: ['catalog', 'motifs'], queryFn: getMotifs, staleTime: 5 * 60_000 });

export const useMotifs = () => useQuery(motifsQuery());
