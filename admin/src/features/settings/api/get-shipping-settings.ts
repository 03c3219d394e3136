import { queryOptions, useQuery } from '@tanstack/react-query';
import { shippingSettingsResponse } from '@server/contracts/shipping.ts';
import { apiRequest } from '@ui/api-client.ts';

export const getShippingSettings = () => apiRequest('/admin/settings/shipping', shippingSettingsResponse);

export const shippingSettingsQuery = () =>
  queryOptions({ queryKey: ['admin', 'settings', 'shipping'], queryFn: getShippingSettings });

export const useShippingSettings = () => useQuery(shippingSettingsQuery());
