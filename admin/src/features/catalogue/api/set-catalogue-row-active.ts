import { useMutation } from '@tanstack/react-query';
import { catalogueRowRef } from '@server/contracts/admin-catalogue-common.ts';
import { apiRequest } from '@ui/api-client.ts';
import { useInvalidateCatalogue, type CatalogueKind } from './save-catalogue-row.ts';

/** Retires a row (customers no longer see it; designs and orders that use it keep it) or offers it again. */
export const setCatalogueRowActive = (kind: CatalogueKind, id: number, isActive: boolean) =>
  apiRequest(`/admin/catalogue/${kind}/${id}/${isActive ? 'reactivate' : 'retire'}`, catalogueRowRef, {
    method: 'POST',
  });

export function useSetCatalogueRowActive(kind: CatalogueKind) {
  const invalidate = useInvalidateCatalogue();
  return useMutation({
    mutationFn: ({ id, isActive }: { id: number; isActive: boolean }) => setCatalogueRowActive(kind, id, isActive),
    onSuccess: () => invalidate(kind),
  });
}
