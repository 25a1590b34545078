import { useInfiniteQuery, useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import { followListSchema, followStatusResponseSchema, type FollowStatus } from '../shared/types/community';
import { apiMutate, apiRequest } from './api';
import { feedKeys } from './feed';
import { STALE } from './queryClient';

export type FollowListKind = 'followers' | 'following';

export const followKeys = {
  all: ['follows'] as const,
  status: (handle: string) => [...followKeys.all, 'status', handle.toLowerCase()] as const,
  lists: () => [...followKeys.all, 'list'] as const,
  list: (handle: string, which: FollowListKind) => [...followKeys.lists(), which, handle.toLowerCase()] as const,
};

const racerPath = (handle: string) => `/racers/${encodeURIComponent(handle)}`;

/** A racer's follower and following counts, and whether I follow them. */
export function useFollowStatusQuery(handle: string) {
  return useQuery({
    queryKey: followKeys.status(handle),
    queryFn: async ({ signal }) => (await apiRequest(`${racerPath(handle)}/follow`, { schema: followStatusResponseSchema, signal })).follow,
    staleTime: STALE.racer,
    enabled: handle.length > 0,
  });
}

/** Who follows a racer, or whom they follow, newest first; fetched only while shown. */
export function useFollowListQuery(handle: string, which: FollowListKind, enabled: boolean) {
  return useInfiniteQuery({
    queryKey: followKeys.list(handle, which),
    queryFn: ({ pageParam, signal }) =>
      apiRequest(`${racerPath(handle)}/${which}${pageParam ? `?cursor=${encodeURIComponent(pageParam)}` : ''}`, { schema: followListSchema, signal }),
    initialPageParam: null as string | null,
    getNextPageParam: (last) => last.nextCursor,
    staleTime: STALE.racer,
    enabled: enabled && handle.length > 0,
  });
}

/**
 * Follows (true) or unfollows (false) a racer. The answer is their new status; the lists, my feed
 * and the suggestions change with it.
 */
export function useSetFollowing() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: async ({ handle, follow }: { handle: string; follow: boolean }) =>
      (await apiMutate(`${racerPath(handle)}/follow`, { method: follow ? 'POST' : 'DELETE', schema: followStatusResponseSchema })).follow,
    onSuccess: (status: FollowStatus) => {
      queryClient.setQueryData(followKeys.status(status.handle), status);
      return Promise.all([
        // My own page's "following" count changed too.
        queryClient.invalidateQueries({
          queryKey: [...followKeys.all, 'status'],
          predicate: (query) => query.queryKey[2] !== status.handle.toLowerCase(),
        }),
        queryClient.invalidateQueries({ queryKey: followKeys.lists() }),
        queryClient.invalidateQueries({ queryKey: feedKeys.all }),
      ]);
    },
  });
}
