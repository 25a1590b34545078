import { useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import { commentListSchema, commentResponseSchema, type CommentCreate, type CommentDto } from '../shared/types/forks';
import { apiMutate, apiRequest } from './api';
import { STALE } from './queryClient';
import { reportKeys } from './reports';
import { setupKeys } from './setups';

export const commentKeys = {
  /** Every comment list of one setup, whichever share token opened it. */
  setup: (setupId: number) => [...setupKeys.all, 'comments', setupId] as const,
  list: (setupId: number, share?: string) => [...commentKeys.setup(setupId), share ?? null] as const,
};

/** The comments on a setup and on each of its changes, top level first, replies nested. */
export function useCommentsQuery(setupId: number, share?: string) {
  return useQuery({
    queryKey: commentKeys.list(setupId, share),
    queryFn: async ({ signal }) =>
      (await apiRequest(`/setups/${setupId}/comments${share ? `?share=${encodeURIComponent(share)}` : ''}`, { schema: commentListSchema, signal })).comments,
    staleTime: STALE.setup,
    enabled: Number.isSafeInteger(setupId) && setupId > 0,
  });
}

/** After any comment write: the lists, the setup page's comment count (every share variant) and my hourly limits. */
function useCommentInvalidation(setupId: number) {
  const queryClient = useQueryClient();
  return () =>
    Promise.all([
      queryClient.invalidateQueries({ queryKey: commentKeys.setup(setupId) }),
      queryClient.invalidateQueries({ queryKey: [...setupKeys.all, 'detail', setupId] }),
      // A new account's count of comments this hour.
      queryClient.invalidateQueries({ queryKey: reportKeys.limits() }),
    ]);
}

export function useCreateComment(setupId: number) {
  const invalidate = useCommentInvalidation(setupId);
  return useMutation({
    mutationFn: async (input: CommentCreate) =>
      (await apiMutate(`/setups/${setupId}/comments`, { body: input, schema: commentResponseSchema })).comment,
    onSuccess: invalidate,
  });
}

export function useEditComment(setupId: number) {
  const invalidate = useCommentInvalidation(setupId);
  return useMutation({
    mutationFn: ({ commentId, bodyMarkdown }: { commentId: number; bodyMarkdown: string }) =>
      apiMutate(`/comments/${commentId}`, { method: 'PATCH', body: { bodyMarkdown } }),
    onSuccess: invalidate,
  });
}

export function useDeleteComment(setupId: number) {
  const invalidate = useCommentInvalidation(setupId);
  return useMutation({
    mutationFn: (commentId: number) => apiMutate(`/comments/${commentId}`, { method: 'DELETE' }),
    onSuccess: invalidate,
  });
}

/** What a comment list needs to write: each resolves when the server accepted, rejects with its error. */
export type CommentActions = {
  /** A new top-level comment on the setup (revisionId null) or on one change, optionally one field of it. */
  post: (input: { bodyMarkdown: string; revisionId: number | null; fieldKey: string | null }) => Promise<unknown>;
  reply: (parent: CommentDto, bodyMarkdown: string) => Promise<unknown>;
  edit: (commentId: number, bodyMarkdown: string) => Promise<unknown>;
  remove: (commentId: number) => Promise<unknown>;
};

/** The four writes bound to one setup, carrying the share token that opened it. */
export function useCommentActions(setupId: number, share?: string): CommentActions {
  const create = useCreateComment(setupId);
  const edit = useEditComment(setupId);
  const remove = useDeleteComment(setupId);
  return {
    post: (input) => create.mutateAsync({ ...input, parentId: null, share }),
    // A reply belongs to the same change as the comment it answers.
    reply: (parent, bodyMarkdown) => create.mutateAsync({ bodyMarkdown, revisionId: parent.revisionId, parentId: parent.id, share }),
    edit: (commentId, bodyMarkdown) => edit.mutateAsync({ commentId, bodyMarkdown }),
    remove: (commentId) => remove.mutateAsync(commentId),
  };
}
