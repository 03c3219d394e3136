import { designShareResponse } from '@server/contracts/design-sharing.ts';
import { apiRequest } from '@ui/api-client.ts';
import { useDesignChange } from './use-design-change.ts';

/** Turns on the design's read-only link (or gives the one it has) and answers its code. */
export const shareDesign = (id: number) =>
  apiRequest(`/designs/${id}/share`, designShareResponse, { method: 'POST' }).then((body) => body.shareToken);

export const useShareDesign = () => useDesignChange(shareDesign);
