import { useQuery } from '@tanstack/react-query';
import { mailboxSchema } from '../shared/types/auth';
import { apiRequest } from './api';
import { useHealthQuery } from './health';
import { STALE } from './queryClient';

/**
 * Whether to point racers at the development mailbox. The exported web app is always a production
 * bundle, so the server says whether it runs its development tools (health's `devTools`).
 */
export function useShowDevMailbox(): boolean {
  return useHealthQuery().data?.devTools === true;
}

export const mailboxKeys = {
  all: ['mailbox'] as const,
  list: () => [...mailboxKeys.all, 'list'] as const,
};

/** Mail the server sent during development, newest first. */
export function useMailboxQuery() {
  return useQuery({
    queryKey: mailboxKeys.list(),
    queryFn: async ({ signal }) => (await apiRequest('/dev/mailbox', { schema: mailboxSchema, signal })).messages,
    staleTime: STALE.mailbox,
  });
}

/** Web addresses in a plain-text mail body, in order, without trailing punctuation. */
export function linksIn(text: string): string[] {
  const found = text.match(/https?:\/\/[^\s<>"']+/g) ?? [];
  return [...new Set(found.map((url) => url.replace(/[.,;:!?)\]]+$/, '')))];
}
