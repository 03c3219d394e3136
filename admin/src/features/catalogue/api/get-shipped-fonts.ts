import { queryOptions, useQuery } from '@tanstack/react-query';
import { shippedFontListResponse } from '@server/contracts/admin-catalogue-fonts.ts';
import { apiRequest } from '@ui/api-client.ts';

export const getShippedFonts = () => apiRequest('/admin/catalogue/fonts/shipped', shippedFontListResponse);

export const shippedFontsQuery = () =>
  queryOptions({ queryKey: ['admin', 'catalogue', 'shipped-fonts'], queryFn: getShippedFonts });

export const useShippedFonts = () => useQuery(shippedFontsQuery());
