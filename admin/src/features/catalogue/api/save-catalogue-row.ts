import { useMutation, useQueryClient } from '@tanstack/react-query';
import { catalogueRowRef } from '@server/contracts/admin-catalogue-common.ts';
import { apiRequest } from '@ui/api-client.ts';
import { studioCatalogueQuery } from './get-studio-catalogue.ts';
import { studioGarmentsQuery } from './get-studio-garments.ts';
import { shippedFontsQuery } from './get-shipped-fonts.ts';

/** The catalogue's editable kinds and where their endpoints are under /api/admin/catalogue. */
export type CatalogueKind = 'garments' | 'motifs' | 'fonts' | 'threads' | 'hoops';

/** What a change touches: the garments list, or the motifs, threads, hoops and fonts list. */
export function useInvalidateCatalogue() {
  const queryClient = useQueryClient();
  return async (kind: CatalogueKind) => {
    if (kind === 'garments') return queryClient.invalidateQueries({ queryKey: studioGarmentsQuery().queryKey });
    await queryClient.invalidateQueries({ queryKey: studioCatalogueQuery().queryKey });
    if (kind === 'fonts') await queryClient.invalidateQueries({ queryKey: shippedFontsQuery().queryKey });
  };
}

/**
 * Saves one catalogue row: `POST /admin/catalogue/<kind>` for a new one, `PUT …/<id>` for an edit. The body is
 * the contract's request, checked by the form with the same schema before it is sent.
 */
export const saveCatalogueRow = (kind: CatalogueKind, id: number | undefined, body: unknown) =>
  apiRequest(id === undefined ? `/admin/catalogue/${kind}` : `/admin/catalogue/${kind}/${id}`, catalogueRowRef, {
    method: id === undefined ? 'POST' : 'PUT',
    body,
  });

export function useSaveCatalogueRow(kind: CatalogueKind) {
  const invalidate = useInvalidateCatalogue();
  return useMutation({
    mutationFn: ({ id, body }: { id?: number; body: unknown }) => saveCatalogueRow(kind, id, body),
    onSuccess: () => invalidate(kind),
  });
}
