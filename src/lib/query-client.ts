import { QueryCache, QueryClient } from '@tanstack/react-query';
import { ApiError } from './api';

/** Client errors (4xx) will not change on a retry; network and 5xx may. */
function shouldRetry(failureCount: number, error: unknown): boolean {
  if (error instanceof ApiError && error.status >= 400 && error.status < 500) return false;
  return failureCount < 2;
}

export function createQueryClient(): QueryClient {
  const client: QueryClient = new QueryClient({
    queryCache: new QueryCache({
      // A 401 anywhere means the session ended (expired, or signed out in another tab).
      onError: (error, query) => {
        if (error instanceof ApiError && error.status === 401 && query.queryKey[0] !== 'session') {
          void client.invalidateQueries({ queryKey: ['session'] });
        }
      },
    }),
    defaultOptions: {
      queries: {
        staleTime: 30_000,
        retry: shouldRetry,
        refetchOnWindowFocus: false,
      },
      mutations: { retry: false },
    },
  });
  return client;
}

export const queryClient = createQueryClient();
