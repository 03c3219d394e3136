import { queryOptions, useQuery } from '@tanstack/react-query';
import { shopSettingsResponse } from '@server/contracts/admin-settings.ts';
import { apiRequest } from '@ui/api-client.ts';

export const getSettings = () => apiRequest('/admin/settings', shopSettingsResponse);

export const settingsQuery = () => queryOptions({ queryKey: ['admin', 'settings'], queryFn: getSettings });

export const useSettings = () => useQuery(settingsQuery());
