import { savedDesignResponse } from '@server/contracts/saved-designs.ts';
import type { RenameDesignRequest } from '@server/contracts/design-sharing.ts';
import { apiRequest } from '@ui/api-client.ts';
import { useDesignChange } from './use-design-change.ts';

/** Gives one of the customer's designs a new name; ordered designs may be renamed too. */
export const renameDesign = ({ id, request }: { id: number; request: RenameDesignRequest }) =>
  apiRequest(`/designs/${id}`, savedDesignResponse, { method: 'PATCH', body: request }).then((body) => body.design);

export const useRenameDesign = () => useDesignChange(renameDesign);
