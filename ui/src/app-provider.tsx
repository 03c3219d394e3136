import { useState } from 'react';
import { QueryClientProvider } from '@tanstack/react-query';
import { RouterProvider, type createBrowserRouter } from 'react-router-dom';
import { createQueryClient } from './query-client.ts';

/** The providers both apps run inside: one query client per page load and the app's router. */
export function AppProvider({ router }: { router: ReturnType<typeof createBrowserRouter> }) {
  const [queryClient] = useState(createQueryClient);
  return (
    <QueryClientProvider client={queryClient}>
      <RouterProvider router={router} />
    </QueryClientProvider>
  );
}
