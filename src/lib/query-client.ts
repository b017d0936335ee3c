import { MutationCache, QueryCache, QueryClient } from '@tanstack/react-query';
import { isApiError } from './api-client';

interface QueryClientHooks {
  /** Called when any call answers 401: the session ended (expired, signed out in another tab). */
  onUnauthorized: () => void;
}

// A 4xx answer will not change on retry; a dropped connection in the yard often will.
function shouldRetry(failureCount: number, error: unknown): boolean {
  if (isApiError(error) && error.status >= 400 && error.status < 500) return false;
  return failureCount < 2;
}

export function createQueryClient({ onUnauthorized }: QueryClientHooks): QueryClient {
  const handleError = (error: unknown, meta?: Record<string, unknown>) => {
    // Queries that expect a 401 (the session lookup itself) opt out with meta.allowUnauthorized.
    if (isApiError(error) && error.status === 401 && !meta?.allowUnauthorized) onUnauthorized();
  };

  return new QueryClient({
    queryCache: new QueryCache({ onError: (error, query) => handleError(error, query.meta) }),
    mutationCache: new MutationCache({
      onError: (error, _variables, _context, mutation) => handleError(error, mutation.meta),
    }),
    defaultOptions: {
      queries: {
        staleTime: 30_000,
        retry: shouldRetry,
        refetchOnWindowFocus: true,
      },
      mutations: { retry: false },
    },
  });
}
