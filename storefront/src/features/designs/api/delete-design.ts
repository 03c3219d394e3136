import { apiRequest } from '@ui/api-client.ts';
import { useDesignChange } from './use-design-change.ts';

/** Deletes one of the customer's designs; one that is part of an order answers 409 and is kept. */
export const deleteDesign = (id: number) => apiRequest<void>(`/designs/${id}`, null, { method: 'DELETE' });

export const useDeleteDesign = () => useDesignChange(deleteDesign);
