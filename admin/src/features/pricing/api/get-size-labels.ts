import { useQuery } from '@tanstack/react-query';
import { studioGarmentListResponse } from '@server/contracts/admin-catalogue-garments.ts';
import { apiRequest } from '@ui/api-client.ts';

/**
 * The catalogue's words for each garment's sizes ("6 months" for `6m`), by garment slug and size code, so the price
 * list names sizes as the shop does. Shares the studio catalogue's cached list (same query key).
 */
export function useSizeLabels(): (garment: string, size: string) => string {
  const garments = useQuery({
    queryKey: ['admin', 'catalogue', 'garments'],
    queryFn: () => apiRequest('/admin/catalogue/garments', studioGarmentListResponse),
    staleTime: 60_000,
  });
  const labels = new Map(
    (garments.data?.garments ?? []).flatMap((garment) =>
      garment.sizes.map((size): [string, string] => [`${garment.slug}/${size.code}`, size.label]),
    ),
  );
  return (garment, size) => labels.get(`${garment}/${size}`) ?? size;
}
