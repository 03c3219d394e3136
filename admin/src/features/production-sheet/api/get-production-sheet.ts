import { queryOptions, useQuery } from '@tanstack/react-query';
import { productionSheetResponse, type PaperSize } from '@server/contracts/production-sheet.ts';
import { apiRequest } from '@ui/api-client.ts';

const sheetPath = (number: string) => `/admin/orders/${encodeURIComponent(number)}/production-sheet`;

export const getProductionSheet = (number: string) => apiRequest(sheetPath(number), productionSheetResponse);

export const productionSheetQuery = (number: string) =>
  queryOptions({
    queryKey: ['admin', 'orders', number, 'production-sheet'],
    queryFn: () => getProductionSheet(number),
    retry: false,
  });

export const useProductionSheet = (number: string) => useQuery(productionSheetQuery(number));

/** The PDF is a plain same-origin download: the browser sends the session cookie and saves the file. */
export const productionSheetPdfHref = (number: string, paper: PaperSize) =>
  `/api${sheetPath(number)}.pdf?paper=${paper}`;
