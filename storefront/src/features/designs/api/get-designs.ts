import { queryOptions, useQuery } from '@tanstack/react-query';
import { savedDesignListResponse } from '@server/contracts/saved-designs.ts';
import { apiRequest } from '@ui/api-client.ts';

/** The signed-in customer's saved designs, the most recently changed first. */
export const getDesigns = () => apiRequest('/designs', savedDesignListResponse).then((body) => body.designs);

/**
 * The list's key is the prefix of every saved design's key (`['designs', id]`), so invalidating it after a change
 * also refreshes a design the designer has open.
 */
export const designListQuery = () => queryOptions({ queryKey: ['designs'], queryFn: getDesigns });

export const useDesigns = (options: { enabled: boolean }) =>
  useQuery({ ...designListQuery(), enabled: options.enabled });
