import { MutationCache, QueryCache, QueryClient } from '@tanstack/react-query';
import { isApiClientError } from './api-client';

interface QueryClientHooks {
  /** Called for every failed query or mutation, so the app can react to a lost session. */
  onError?: (error: unknown) => void;
}

function shouldRetry(failureCount: number, error: unknown): boolean {
  // A 4xx will not fix itself; a flaky network or 5xx might.
  if (isApiClientError(error) && error.status >= 400 && error.status < 500) return false;
  return failureCount < 2;
}

export function createQueryClient({ onError }: QueryClientHooks = {}): QueryClient {
  return new QueryClient({
    queryCache: new QueryCache({ onError }),
    mutationCache: new MutationCache({ onError }),
    defaultOptions: {
      queries: { retry: shouldRetry, staleTime: 30_000, refetchOnWindowFocus: true },
      mutations: { retry: false },
    },
  });
}
