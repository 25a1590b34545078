import { QueryClient } from '@tanstack/react-query';
import { ApiRequestError } from './api';

/** Stale times in one place, named by how fast the data changes. */
export const STALE = {
  status: 15_000,
  catalog: 10 * 60_000,
} as const;

export function createQueryClient(): QueryClient {
  return new QueryClient({
    defaultOptions: {
      queries: {
        // Client errors (4xx) will not fix themselves on retry; network and 5xx might.
        retry: (failureCount, error) =>
          failureCount < 2 && !(error instanceof ApiRequestError && error.status >= 400 && error.status < 500),
        refetchOnWindowFocus: false,
      },
    },
  });
}
