import { useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import { setupVotesResponseSchema, type SetupVotes, type VoteChoice } from '../shared/types/community';
import type { TrackTypeKey } from '../shared/types/trackTypes';
import { apiMutate, apiRequest } from './api';
import { discoverKeys } from './discover';
import { STALE } from './queryClient';

export const voteKeys = {
  all: ['votes'] as const,
  setup: (setupId: number) => [...voteKeys.all, setupId] as const,
};

/** Per track type, the works / doesn't-work counts of a setup and my own vote. */
export function useSetupVotesQuery(setupId: number, share?: string) {
  return useQuery({
    queryKey: voteKeys.setup(setupId),
    queryFn: async ({ signal }) =>
      (await apiRequest(`/setups/${setupId}/votes${share ? `?share=${encodeURIComponent(share)}` : ''}`, { schema: setupVotesResponseSchema, signal })).votes,
    staleTime: STALE.setup,
    enabled: Number.isSafeInteger(setupId) && setupId > 0,
  });
}

/** `vote` null withdraws my vote on that track type. */
export type VoteChange = { trackType: TrackTypeKey; vote: VoteChoice | null };

/** Casts, changes or withdraws my vote; the answer (every track type's counts) replaces the cached one. */
export function useVoteMutation(setupId: number) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: async ({ trackType, vote }: VoteChange): Promise<SetupVotes> => {
      const path = `/setups/${setupId}/votes/${trackType}`;
      const answer =
        vote === null
          ? await apiMutate(path, { method: 'DELETE', schema: setupVotesResponseSchema })
          : await apiMutate(path, { method: 'PUT', body: { works: vote === 'works' }, schema: setupVotesResponseSchema });
      return answer.votes;
    },
    onSuccess: (votes) => {
      queryClient.setQueryData(voteKeys.setup(setupId), votes);
      // "Best for" orders read these counts.
      void queryClient.invalidateQueries({ queryKey: discoverKeys.all });
    },
  });
}
