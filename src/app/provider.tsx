import { QueryClientProvider } from '@tanstack/react-query';
import { useState, type ReactNode } from 'react';
import { ErrorBoundary } from '../components/errors/error-boundary';
import { MainErrorFallback } from '../components/errors/main-error';
import { Toaster } from '../components/ui/toaster';
import { createQueryClient } from '../lib/query-client';
import type { QueryClient } from '@tanstack/react-query';

/** Everything the app needs around its router: the query cache, the last-resort error screen, notices. */
export function AppProvider({ children, queryClient }: { children: (queryClient: QueryClient) => ReactNode; queryClient?: QueryClient }) {
  const [client] = useState(() => queryClient ?? createQueryClient());
  return (
    <ErrorBoundary fallback={<MainErrorFallback />}>
      <QueryClientProvider client={client}>
        {children(client)}
        <Toaster />
      </QueryClientProvider>
    </ErrorBoundary>
  );
}
