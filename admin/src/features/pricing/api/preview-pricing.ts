import { keepPreviousData, queryOptions, useQuery } from '@tanstack/react-query';
import { pricingPreviewResponse, type PricingRules } from '@server/contracts/admin-pricing.ts';
import { apiRequest } from '@ui/api-client.ts';

export const previewPricing = (rules: PricingRules) =>
  apiRequest('/admin/pricing/preview', pricingPreviewResponse, { method: 'POST', body: { rules } });

/** Keyed by the rules themselves, so each distinct edit is priced once by the server. */
export const pricingPreviewQuery = (rules: PricingRules | undefined) =>
  queryOptions({
    queryKey: ['admin', 'pricing', 'preview', rules],
    queryFn: () => previewPricing(rules!),
    enabled: rules !== undefined,
    retry: false,
    placeholderData: keepPreviousData,
  });

export const usePricingPreview = (rules: PricingRules | undefined) => useQuery(pricingPreviewQuery(rules));
