import { QueryClient } from '@tanstack/react-query';
import { ApiRequestError } from './api';

/** Stale times in one place, named by how fast the data changes. */
export const STALE = {
  status: 15_000,
  catalog: 10 * 60_000,
  /** Who is signed in: every mutation that changes it writes the answer straight into the cache. */
  session: 5 * 60_000,
  /** Public racer pages change when their owner edits a profile, which is rare. */
  racer: 60_000,
  /** Admin lists should reflect other admins' actions without a reload. */
  adminUsers: 10_000,
  /** My garage changes only through my own mutations, which update it. */
  garage: 60_000,
  /** A setup page: revisions by its owner arrive through mutations; others' views refresh on focus. */
  setup: 30_000,
  /** Moderators work through the queue together: another's action should show within seconds. */
  moderationQueue: 10_000,
  /** My reports, my limits and actions on my posts change slowly and mostly through my own writes. */
  moderationMine: 30_000,
  /** The dev mailbox exists to show the mail that was just sent. */
  mailbox: 0,
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
