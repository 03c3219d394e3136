import { useMutation, useQueryClient } from '@tanstack/react-query';
import { designListQuery } from './get-designs.ts';

/** A change to one of the customer's designs: afterwards the list (and any open design) is fetched again. */
export function useDesignChange<Args, Answer>(change: (args: Args) => Promise<Answer>) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: change,
    onSettled: () => queryClient.invalidateQueries({ queryKey: designListQuery().queryKey }),
  });
}
