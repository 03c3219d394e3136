import { savedDesignResponse } from '@server/contracts/saved-designs.ts';
import { apiRequest } from '@ui/api-client.ts';
import { useDesignChange } from './use-design-change.ts';

/** Saves a copy of one of the customer's designs as a new design, named “… (copy)”. */
export const duplicateDesign = (id: number) =>
  apiRequest(`/designs/${id}/duplicate`, savedDesignResponse, { method: 'POST' }).then((body) => body.design);

export const useDuplicateDesign = () => useDesignChange(duplicateDesign);
