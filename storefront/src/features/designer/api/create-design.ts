import { useMutation, useQueryClient } from '@tanstack/react-query';
import { savedDesignResponse, type SaveDesignRequest } from '@server/contracts/saved-designs.ts';
import { apiRequest } from '@ui/api-client.ts';
import { savedDesignQuery } from './get-saved-design.ts';

/** Saves a new design for the signed-in customer; the answer is the design as stored, with its id. */
export const createDesign = (request: SaveDesignRequest) =>
  apiRequest('/designs', savedDesignResponse, { method: 'POST', body: request }).then((body) => body.design);

export function useCreateDesign() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: createDesign,
    onSuccess: (design) => queryClient.setQueryData(savedDesignQuery(design.id).queryKey, design),
  });
}
