import { queryOptions, useQuery } from '@tanstack/react-query';
import { savedAddressesResponse } from '@server/contracts/saved-addresses.ts';
import { apiRequest } from '@ui/api-client.ts';

/** The signed-in customer's own addresses from earlier orders, most recent first. */
export const getSavedAddresses = () => apiRequest('/addresses', savedAddressesResponse);

export const savedAddressesQuery = () =>
  queryOptions({ queryKey: ['addresses'], queryFn: getSavedAddresses, staleTime: 60_000 });

export const useSavedAddresses = (isEnabled = true) => useQuery({ ...savedAddressesQuery(), enabled: isEnabled });
