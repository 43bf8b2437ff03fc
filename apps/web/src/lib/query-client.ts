import { QueryClient } from '@tanstack/react-query';
import { isApiError } from './api-error';

const maxRetries = 2;

/** Retry only what might succeed the second time: network trouble and 5xx, never a 4xx. */
function shouldRetry(failureCount: number, error: unknown): boolean {
  if (failureCount >= maxRetries) return false;
  if (isApiError(error)) return error.status === 0 || error.status >= 500;
  return false;
}

type QueryClientOptions = {
  /** Pause before a retry; tests pass 0 to keep the same policy without the wait. */
  retryDelayMs?: number;
};

export function createQueryClient({ retryDelayMs }: QueryClientOptions = {}): QueryClient {
  return new QueryClient({
    defaultOptions: {
      queries: {
        staleTime: 30_000,
        retry: shouldRetry,
        ...(retryDelayMs === undefined ? {} : { retryDelay: retryDelayMs }),
        refetchOnWindowFocus: false,
      },
      mutations: {
        retry: false,
      },
    },
  });
}
