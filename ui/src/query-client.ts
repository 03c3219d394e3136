import { QueryClient } from '@tanstack/react-query';
import { ApiError } from './api-client.ts';

/** Retries only failures that might pass on a second try (network and server errors), never a 4xx. */
export function createQueryClient(): QueryClient {
  return new QueryClient({
    defaultOptions: {
      queries: {
        retry: (count, error) =>
          count < 2 && (!(error instanceof ApiError) || error.kind === 'network' || error.kind === 'server'),
        refetchOnWindowFocus: false,
      },
    },
  });
}
