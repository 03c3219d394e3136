import { useMutation, useQueryClient } from '@tanstack/react-query';
import { shopSettingsResponse, type ShopSettings } from '@server/contracts/admin-settings.ts';
import { apiRequest } from '@ui/api-client.ts';
import { settingsQuery } from './get-settings.ts';

export const updateSettings = (body: ShopSettings) =>
  apiRequest('/admin/settings', shopSettingsResponse, { method: 'PUT', body });

export function useUpdateSettings() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: updateSettings,
    onSuccess: (saved) => queryClient.setQueryData(settingsQuery().queryKey, saved),
  });
}
