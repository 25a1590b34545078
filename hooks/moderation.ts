import { useInfiniteQuery, useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import {
  actionOnMeSchema,
  auditPageSchema,
  moderationActionSummarySchema,
  myAppealSchema,
  queueResponseSchema,
  type ModerationActionRequest,
  type QueueFilter,
} from '../shared/types/moderation';
import { z } from '../shared/types/zod';
import { apiMutate, apiRequest } from './api';
import { STALE } from './queryClient';
import { setupKeys } from './setups';

export type AuditFilter = { actor?: string; action?: string; targetType?: string };

export const moderationKeys = {
  all: ['moderation'] as const,
  queues: () => [...moderationKeys.all, 'queue'] as const,
  queue: (filter: QueueFilter) => [...moderationKeys.queues(), filter] as const,
  audits: () => [...moderationKeys.all, 'audit'] as const,
  audit: (filter: AuditFilter) => [...moderationKeys.audits(), filter] as const,
  mine: () => [...moderationKeys.all, 'mine'] as const,
};

/** `?a=1&b=x` from the set values only. */
export function queryString(params: Record<string, string | undefined>): string {
  const parts = Object.entries(params)
    .filter((entry): entry is [string, string] => typeof entry[1] === 'string' && entry[1] !== '')
    .map(([key, value]) => `${key}=${encodeURIComponent(value)}`);
  return parts.length > 0 ? `?${parts.join('&')}` : '';
}

/** The review queue: one row per reported thing and per open appeal. */
export function useModerationQueueQuery(filter: QueueFilter, enabled: boolean) {
  return useQuery({
    queryKey: moderationKeys.queue(filter),
    queryFn: ({ signal }) =>
      apiRequest(`/moderation/queue${queryString({ reason: filter.reason, type: filter.type, kind: filter.kind, order: filter.order })}`, {
        schema: queueResponseSchema,
        signal,
      }),
    staleTime: STALE.moderationQueue,
    enabled,
    // Changing a filter keeps the last rows on screen instead of flashing a spinner.
    placeholderData: (previous) => previous,
  });
}

/**
 * A hide or restore changes what setups, comments, discover and feeds show; moderators' screens
 * are few and these lists are refetched lazily, so every setup-rooted key is marked stale.
 */
function useModerationChanged() {
  const queryClient = useQueryClient();
  return () =>
    Promise.all([
      queryClient.invalidateQueries({ queryKey: moderationKeys.queues() }),
      queryClient.invalidateQueries({ queryKey: moderationKeys.audits() }),
      queryClient.invalidateQueries({ queryKey: setupKeys.all }),
    ]);
}

const actionResponseSchema = z.object({ action: moderationActionSummarySchema });
const appealResponseSchema = z.object({ appeal: myAppealSchema });

/** Hide, restore, dismiss, warn, suspend or hide everything by an account, with the reason the author sees. */
export function useModerationAction() {
  const changed = useModerationChanged();
  return useMutation({
    mutationFn: async (body: ModerationActionRequest) => (await apiMutate('/moderation/actions', { body, schema: actionResponseSchema })).action,
    onSuccess: changed,
  });
}

export function useDecideAppeal() {
  const changed = useModerationChanged();
  return useMutation({
    mutationFn: async ({ appealId, decision, reason }: { appealId: number; decision: 'uphold' | 'overturn'; reason: string }) =>
      (await apiMutate(`/moderation/appeals/${appealId}/decide`, { body: { decision, reason }, schema: appealResponseSchema })).appeal,
    onSuccess: changed,
  });
}

/** The audit log, newest first, a page at a time (keyset cursor). */
export function useAuditLogQuery(filter: AuditFilter, enabled: boolean) {
  return useInfiniteQuery({
    queryKey: moderationKeys.audit(filter),
    queryFn: ({ pageParam, signal }) =>
      apiRequest(`/moderation/audit${queryString({ ...filter, cursor: pageParam ?? undefined })}`, { schema: auditPageSchema, signal }),
    initialPageParam: null as string | null,
    getNextPageParam: (last) => last.nextCursor,
    staleTime: STALE.moderationQueue,
    enabled,
  });
}

const actionsOnMeSchema = z.object({ actions: z.array(actionOnMeSchema) });

/** Moderation actions on my posts or my account, with whether each can still be appealed. */
export function useActionsOnMeQuery(enabled = true) {
  return useQuery({
    queryKey: moderationKeys.mine(),
    queryFn: async ({ signal }) => (await apiRequest('/moderation/mine', { schema: actionsOnMeSchema, signal })).actions,
    staleTime: STALE.moderationMine,
    enabled,
  });
}

/** Appeals one action on my content; the list then shows the appeal and no second form. */
export function useCreateAppeal() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: async (body: { actionId: number; text: string }) => (await apiMutate('/appeals', { body, schema: appealResponseSchema })).appeal,
    onSuccess: () => queryClient.invalidateQueries({ queryKey: moderationKeys.mine() }),
  });
}

/**
 * A suspended racer cannot sign in, so their appeal carries the token the refused sign-in handed
 * out instead of a session.
 */
export function useSuspensionAppeal() {
  return useMutation({
    mutationFn: (body: { appealToken: string; text: string }) => apiMutate('/appeals/suspension', { body }),
  });
}
