import { queryOptions, useQuery } from '@tanstack/react-query';
import { motifListResponse } from '@server/contracts/catalogue.ts';
import { apiRequest } from '@ui/api-client.ts';

export const getMotifs = () => apiRequest('/catalogue/motifs', motifListResponse).then((body) => body.motifs);

export const motifsQuery = () =>
  queryOptions({ queryKey: ['catalogue', 'motifs'], queryFn: getMotifs, staleTime: 5 * 60_000 });

export const useMotifs = () => useQuery(motifsQuery());
