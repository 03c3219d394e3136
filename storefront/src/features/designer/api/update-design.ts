import { useMutation, useQueryClient } from '@tanstack/react-query';
import { savedDesignResponse, type SaveDesignRequest } from '@server/contracts/saved-designs.ts';
import { apiRequest } from '@ui/api-client.ts';
import { savedDesignQuery } from './get-saved-design.ts';

/** Saves over one of the customer's designs; a design that is part of an order answers 409 (kept as ordered). */
export const updateDesign = ({ id, request }: { id: number; request: SaveDesignRequest }) =>
  apiRequest(`/designs/${id}`, savedDesignResponse, { method: 'PUT', body: request }).then((body) => body.design);

export function useUpdateDesign() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: updateDesign,
    onSuccess: (design) => queryClient.setQueryData(savedDesignQuery(design.id).queryKey, design),
  });
}
