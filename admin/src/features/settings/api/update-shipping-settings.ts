import { useMutation, useQueryClient } from '@tanstack/react-query';
import { shippingSettingsResponse, type ShippingSettings } from '@server/contracts/shipping.ts';
import { apiRequest } from '@ui/api-client.ts';
import { shippingSettingsQuery } from './get-shipping-settings.ts';

export const updateShippingSettings = (body: ShippingSettings) =>
  apiRequest('/admin/settings/shipping', shippingSettingsResponse, { method: 'PUT', body });

export function useUpdateShippingSettings() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: updateShippingSettings,
    onSuccess: (saved) => queryClient.setQueryData(shippingSettingsQuery().queryKey, saved),
  });
}
