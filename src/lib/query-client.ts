import { MutationCache, QueryCache, QueryClient } from '@tanstack/react-query';
import { isApiError, isUnavailable } from './api-client';

interface QueryClientHooks {
  /** Called when any call answers 401: the session ended (expired, signed out in another tab). */
  onUnauthorized: () => void;
}

/** Tries of a read while the server or its database is away (about a minute with the backoff). */
export const UNAVAILABLE_RETRIES = 8;
const MAX_RETRY_DELAY_MS = 15_000;

/**
 * Whether a failed read is tried again. A 4xx answer will not change on retry; a server that is
 * restarting (503) or a dropped connection in the yard often will, so those get more tries.
 */
export function shouldRetryQuery(failureCount: number, error: unknown): boolean {
  if (isUnavailable(error)) return failureCount < UNAVAILABLE_RETRIES;
  if (isApiError(error) && error.status >= 400 && error.status < 500) return false;
  return failureCount < 2;
}

/** Backoff between tries: 1 s, 2 s, 4 s… up to 15 s, and never sooner than the server's Retry-After. */
export function retryDelayMs(failureCount: number, error: unknown): number {
  const backoff = Math.min(1000 * 2 ** Math.max(0, failureCount - 1), MAX_RETRY_DELAY_MS);
  const asked = isApiError(error) && error.retryAfter !== null ? error.retryAfter * 1000 : 0;
  return Math.min(Math.max(backoff, asked), MAX_RETRY_DELAY_MS * 2);
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
        retry: shouldRetryQuery,
        retryDelay: retryDelayMs,
        refetchOnWindowFocus: true,
        // Offline, a read still goes to the service worker, which answers from its cache what
        // this person saw before (instead of waiting for navigator.onLine).
        networkMode: 'offlineFirst',
      },
      // A write is never repeated behind the person's back: the form shows the server's message
      // (503: "try again in a few seconds") and they press the button again.
      // Offline, a write fails at once ("unreachable") so the form can keep it on the phone.
      mutations: { retry: false, networkMode: 'always' },
    },
  });
}
