import { MutationCache, QueryCache, QueryClient } from '@tanstack/react-query';
import { ApiError, isApiError } from './api-client';
import { notify } from './notify';

declare module '@tanstack/react-query' {
  interface Register {
    // Every request goes through lib/api-client.ts, which only ever throws ApiError.
    defaultError: ApiError;
    mutationMeta: {
      /** The component shows this mutation's errors itself (inline in a form, in a dialog). */
      inlineErrors?: boolean;
    };
    queryMeta: {
      /** The component shows this query's refresh errors itself (a job's progress), so no notice. */
      inlineErrors?: boolean;
    };
  }
}

function messageOf(error: unknown): string {
  return isApiError(error) ? error.message : 'Something went wrong. Please try again.';
}

/** A 401 leads to the sign-in page (api-client's handler), so it is not also shown as a notice. */
function shouldNotify(error: unknown): boolean {
  return !(isApiError(error) && error.isUnauthorized);
}

export function createQueryClient(): QueryClient {
  return new QueryClient({
    queryCache: new QueryCache({
      onError: (error, query) => {
        // Only background refreshes of data already on screen: a first load shows its error in place.
        if (query.state.data !== undefined && !query.meta?.inlineErrors && shouldNotify(error)) {
          notify(`Could not refresh: ${messageOf(error)}`, 'error');
        }
      },
    }),
    mutationCache: new MutationCache({
      onError: (error, _variables, _context, mutation) => {
        if (mutation.meta?.inlineErrors || !shouldNotify(error)) return;
        notify(messageOf(error), 'error');
      },
    }),
    defaultOptions: {
      queries: {
        staleTime: 30_000,
        refetchOnWindowFocus: false,
        // Retry only what may pass on a second try: the server or the network failing.
        retry: (failureCount, error) => isApiError(error) && (error.status >= 500 || error.status === 0) && failureCount < 2,
      },
      mutations: { retry: false },
    },
  });
}
