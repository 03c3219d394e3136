import { useMutation } from '@tanstack/react-query';
import { catalogueRowRef } from '@server/contracts/admin-catalogue-common.ts';
import { apiRequest } from '@ui/api-client.ts';
import { useInvalidateCatalogue } from './save-catalogue-row.ts';

export type GarmentPart = 'sizes' | 'colours';

interface PartTarget {
  part: GarmentPart;
  garmentId: number;
  /** Absent for a new size or colour. */
  partId?: number;
}

const partPath = ({ part, garmentId, partId }: PartTarget) =>
  `/admin/catalogue/garments/${garmentId}/${part}${partId === undefined ? '' : `/${partId}`}`;

/** Adds (POST) or edits (PUT) a garment's size or fabric colour. */
export const saveGarmentPart = (target: PartTarget, body: unknown) =>
  apiRequest(partPath(target), catalogueRowRef, { method: target.partId === undefined ? 'POST' : 'PUT', body });

/** Deletes a size or colour nothing uses; the server answers 409 when a design or order does. */
export const deleteGarmentPart = (target: Required<PartTarget>) =>
  apiRequest(partPath(target), catalogueRowRef, { method: 'DELETE' });

export function useSaveGarmentPart() {
  const invalidate = useInvalidateCatalogue();
  return useMutation({
    mutationFn: ({ target, body }: { target: PartTarget; body: unknown }) => saveGarmentPart(target, body),
    onSuccess: () => invalidate('garments'),
  });
}

export function useDeleteGarmentPart() {
  const invalidate = useInvalidateCatalogue();
  return useMutation({ mutationFn: deleteGarmentPart, onSuccess: () => invalidate('garments') });
}
