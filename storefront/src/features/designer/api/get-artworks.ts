import { queryOptions, useQuery } from '@tanstack/react-query';
import { artworkListResponse } from '@server/contracts/artwork.ts';
import { apiRequest } from '@ui/api-client.ts';

/** The customer's own uploads, newest first: the account's, or before signing in, this browser's. */
export const getArtworks = () => apiRequest('/artwork', artworkListResponse).then((body) => body.artworks);

export const artworksQuery = () => queryOptions({ queryKey: ['artwork'], queryFn: getArtworks, staleTime: 5 * 60_000 });

export const useArtworks = () => useQuery(artworksQuery());
