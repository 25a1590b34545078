import { useQuery } from '@tanstack/react-query';
import { historySchema, revisionDetailSchema, type RevisionDetail } from '../shared/types/forks';
import { ApiRequestError, apiRequest } from './api';
import { STALE } from './queryClient';
import { setupKeys, useSetupQuery } from './setups';

export const historyKeys = {
  /** Every history and revision of one setup, whichever share token opened them. */
  setup: (setupId: number) => setupKeys.history(setupId),
  list: (setupId: number, share?: string) => [...historyKeys.setup(setupId), 'list', share ?? null] as const,
  revision: (setupId: number, number: number, share?: string) => [...historyKeys.setup(setupId), 'revision', number, share ?? null] as const,
};

function withShare(path: string, share?: string): string {
  return share ? `${path}?share=${encodeURIComponent(share)}` : path;
}

function validId(n: number): boolean {
  return Number.isSafeInteger(n) && n > 0;
}

/** A setup's revisions, newest first, each with its field changes from the one before. */
export function useHistoryQuery(setupId: number, share?: string) {
  return useQuery({
    queryKey: historyKeys.list(setupId, share),
    queryFn: ({ signal }) => apiRequest(withShare(`/setups/${setupId}/history`, share), { schema: historySchema, signal }),
    staleTime: STALE.setup,
    enabled: validId(setupId),
  });
}

/** One revision of a setup with its whole sheet; a number that is not a revision answers 404. */
export function useRevisionQuery(setupId: number, number: number, share?: string) {
  return useQuery({
    queryKey: historyKeys.revision(setupId, number, share),
    queryFn: ({ signal }) => apiRequest(withShare(`/setups/${setupId}/revisions/${number}`, share), { schema: revisionDetailSchema, signal }),
    // The setup around it (title, revision count) changes, so it goes stale like the setup page.
    staleTime: STALE.setup,
    enabled: validId(setupId) && validId(number),
  });
}

/** One side of a comparison as the compare screen's address carries it. */
export type CompareSideParams = { setupId: number; revision?: number; share?: string };

/**
 * The shareable address of a comparison: `/compare?a=7&ar=3&b=7&br=5`, with `as`/`bs` share tokens
 * for unlisted setups; a side without a revision number compares that setup's current revision.
 */
export function compareHref(a: CompareSideParams, b: CompareSideParams): string {
  // Built by hand: React Native's URLSearchParams cannot set values.
  const parts: string[] = [];
  const add = (name: string, side: CompareSideParams) => {
    parts.push(`${name}=${side.setupId}`);
    if (side.revision !== undefined) parts.push(`${name}r=${side.revision}`);
    if (side.share) parts.push(`${name}s=${encodeURIComponent(side.share)}`);
  };
  add('a', a);
  add('b', b);
  return `/compare?${parts.join('&')}`;
}

/** What one side of the compare screen can show so far. */
export type CompareSideState =
  | { status: 'loading' }
  /** The setup is private to someone else, deleted, or the share token is missing. */
  | { status: 'missing' }
  | { status: 'no-revision'; number: number }
  | { status: 'error'; message: string; retry: () => void }
  /** `revisionNumbers` (newest first) is null when only the revision itself could be read. */
  | { status: 'ready'; detail: RevisionDetail; revisionNumbers: number[] | null };

function isNotFound(error: unknown): boolean {
  return error instanceof ApiRequestError && error.status === 404;
}

/**
 * One side of a comparison: the setup (for its current revision and the list to pick from) and the
 * chosen revision's sheet. Without a number the current revision is used.
 */
export function useCompareSide(setupId: number, requested: number | null, share?: string): CompareSideState {
  const setup = useSetupQuery(setupId, share);
  const number = requested ?? setup.data?.currentRevision.number ?? 0;
  const revision = useRevisionQuery(setupId, number, share);
  if (!validId(setupId) || isNotFound(setup.error)) return { status: 'missing' };
  if (revision.data) {
    return { status: 'ready', detail: revision.data, revisionNumbers: setup.data ? setup.data.revisions.map((r) => r.number) : null };
  }
  if (revision.error) {
    if (!isNotFound(revision.error)) return { status: 'error', message: revision.error.message, retry: () => void revision.refetch() };
    // A missing revision of a setup still loading may be a missing setup: wait to say which.
    return setup.isPending ? { status: 'loading' } : { status: 'no-revision', number };
  }
  if (setup.error && requested === null) return { status: 'error', message: setup.error.message, retry: () => void setup.refetch() };
  return { status: 'loading' };
}
