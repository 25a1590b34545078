import { useInfiniteQuery, useQuery } from '@tanstack/react-query';
import { feedPageSchema, feedSuggestionsSchema } from '../shared/types/community';
import { apiRequest } from './api';

export const feedKeys = {
  all: ['feed'] as const,
  list: () => [...feedKeys.all, 'list'] as const,
  suggestions: () => [...feedKeys.all, 'suggestions'] as const,
};

/** Others' activity arrives without any action of mine: a minute old is fresh enough, pull to refresh for now. */
export const FEED_STALE_MS = 60_000;

/** My activity feed, a page at a time: `fetchNextPage` follows the server's cursor. */
export function useFeedQuery(enabled: boolean) {
  return useInfiniteQuery({
    queryKey: feedKeys.list(),
    queryFn: ({ pageParam, signal }) =>
      apiRequest(`/feed${pageParam ? `?cursor=${encodeURIComponent(pageParam)}` : ''}`, { schema: feedPageSchema, signal }),
    initialPageParam: null as string | null,
    getNextPageParam: (last) => last.nextCursor,
    staleTime: FEED_STALE_MS,
    enabled,
  });
}

/** Racers to follow, for an empty feed. */
export function useFeedSuggestionsQuery(enabled: boolean) {
  return useQuery({
    queryKey: feedKeys.suggestions(),
    queryFn: ({ signal }) => apiRequest('/feed/suggestions', { schema: feedSuggestionsSchema, signal }),
    staleTime: FEED_STALE_MS,
    enabled,
  });
}
