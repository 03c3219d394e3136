import { apiRequest } from '@ui/api-client.ts';
import { useDesignChange } from './use-design-change.ts';

/** Switches the design's link off: whoever has it can no longer open the design. */
export const unshareDesign = (id: number) => apiRequest<void>(`/designs/${id}/share`, null, { method: 'DELETE' });

export const useUnshareDesign = () => useDesignChange(unshareDesign);
