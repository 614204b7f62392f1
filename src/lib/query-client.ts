import { MutationCache, QueryCache, QueryClient } from "@tanstack/react-query";
import { isApiError } from "./api-client";

type UnauthorizedListener = () => void;
const unauthorizedListeners = new Set<UnauthorizedListener>();

/**
 * Lets the app react once, in one place, when any request says the session is gone (401):
 * the app shell sends the user to sign-in and brings them back afterwards.
 */
export function onUnauthorized(listener: UnauthorizedListener): () => void {
  unauthorizedListeners.add(listener);
  return () => unauthorizedListeners.delete(listener);
}

function notifyIfUnauthorized(error: unknown, meta: Record<string, unknown> | undefined): void {
  if (isApiError(error) && error.status === 401 && meta?.["isAuthProbe"] !== true) {
    for (const listener of unauthorizedListeners) listener();
  }
}

const MAX_RETRIES = 2;

/** Retry only what may succeed next time: network failures and 5xx. A 4xx is an answer, not a glitch. */
export function shouldRetry(failureCount: number, error: unknown): boolean {
  if (isApiError(error)) {
    const isTransient = error.status === 0 || error.status >= 500;
    return isTransient && failureCount < MAX_RETRIES;
  }
  return failureCount < MAX_RETRIES;
}

export const queryClient = new QueryClient({
  queryCache: new QueryCache({ onError: (error, query) => notifyIfUnauthorized(error, query.meta) }),
  mutationCache: new MutationCache({
    onError: (error, _vars, _ctx, mutation) => notifyIfUnauthorized(error, mutation.meta),
  }),
  defaultOptions: {
    queries: {
      staleTime: 30_000,
      gcTime: 5 * 60_000,
      retry: shouldRetry,
      refetchOnWindowFocus: true,
    },
    mutations: {
      retry: false,
    },
  },
});
