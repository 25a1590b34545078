import { useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import {
  meSchema,
  messageResponseSchema,
  publicRacerResponseSchema,
  type Me,
  type ProfileUpdate,
} from '../shared/types/auth';
import { z } from '../shared/types/zod';
import { apiMutate, apiRequest } from './api';
import { authKeys } from './auth';
import { STALE } from './queryClient';

export const racerKeys = {
  all: ['racers'] as const,
  detail: (handle: string) => [...racerKeys.all, handle.toLowerCase()] as const,
};

/** A racer's public page. */
export function useRacerQuery(handle: string) {
  return useQuery({
    queryKey: racerKeys.detail(handle),
    queryFn: async ({ signal }) =>
      (await apiRequest(`/racers/${encodeURIComponent(handle)}`, { schema: publicRacerResponseSchema, signal })).racer,
    staleTime: STALE.racer,
    enabled: handle.length > 0,
  });
}

// PATCH /me/profile and DELETE /me/github answer with the full signed-in racer.
const userResponseSchema = z.object({ user: meSchema });

/** Writes the new Me into the cache and drops the public page it feeds. */
function useMeChanged() {
  const queryClient = useQueryClient();
  return (user: Me) => {
    queryClient.setQueryData<Me | null>(authKeys.me(), user);
    return queryClient.invalidateQueries({ queryKey: racerKeys.detail(user.handle) });
  };
}

export function useUpdateProfile() {
  const meChanged = useMeChanged();
  return useMutation({
    mutationFn: async (body: ProfileUpdate) =>
      (await apiMutate('/me/profile', { method: 'PATCH', body, schema: userResponseSchema })).user,
    onSuccess: meChanged,
  });
}

export function useChangeEmail() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (body: { email: string; password?: string }) => apiMutate('/me/email', { body, schema: messageResponseSchema }),
    // The new address waits as pendingEmail until its link is clicked.
    onSuccess: () => queryClient.invalidateQueries({ queryKey: authKeys.me() }),
  });
}

export function useChangePassword() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (body: { currentPassword?: string; newPassword: string }) =>
      apiMutate('/me/password', { body, schema: messageResponseSchema }),
    // A racer who only used GitHub now has a password too (hasPassword).
    onSuccess: () => queryClient.invalidateQueries({ queryKey: authKeys.me() }),
  });
}

export function useUnlinkGithub() {
  const meChanged = useMeChanged();
  return useMutation({
    mutationFn: async () => (await apiMutate('/me/github', { method: 'DELETE', schema: userResponseSchema })).user,
    onSuccess: meChanged,
  });
}
