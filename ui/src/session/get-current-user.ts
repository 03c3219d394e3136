import { queryOptions, useQuery } from '@tanstack/react-query';
import { meResponse, type CurrentUser } from '@server/contracts/users.ts';
import { apiRequest, ApiError } from '../api-client.ts';

/** The signed-in user, or null when nobody is signed in (the API answers 401). */
export async function getCurrentUser(): Promise<CurrentUser | null> {
  try {
    return (await apiRequest('/me', meResponse)).user;
  } catch (error) {
    if (error instanceof ApiError && error.kind === 'unauthenticated') return null;
    throw error;
  }
}

export const currentUserQuery = () => queryOptions({ queryKey: ['me'], queryFn: getCurrentUser, staleTime: 60_000 });

export const useCurrentUser = () => useQuery(currentUserQuery());
