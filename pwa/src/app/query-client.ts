import { QueryClient } from '@tanstack/react-query';
import { isApiError } from '../lib/api-error';

/** Server data cache. Client errors (4xx) and offline failures are not retried. */
export function createQueryClient(): QueryClient {
  return new QueryClient({
    defaultOptions: {
      queries: {
        staleTime: 30_000,
        retry: (failureCount, error) => {
          if (isApiError(error) && (error.kind !== 'http' || error.status < 500)) return false;
          return failureCount < 2;
        },
      },
    },
  });
}
