import { useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import { adminUserListSchema, adminUserSchema, type AdminUser, type Role } from '../shared/types/auth';
import { z } from '../shared/types/zod';
import { apiMutate, apiRequest } from './api';
import { authKeys } from './auth';
import { racerKeys } from './profile';
import { STALE } from './queryClient';

export const adminKeys = {
  all: ['admin'] as const,
  userLists: () => [...adminKeys.all, 'users'] as const,
  users: (query: string) => [...adminKeys.userLists(), query.trim().toLowerCase()] as const,
};

/** Users matching `query` (handle, name or e-mail); only asked for when `enabled` (an admin is signed in). */
export function useAdminUsersQuery(query: string, enabled: boolean) {
  return useQuery({
    queryKey: adminKeys.users(query),
    queryFn: async ({ signal }) =>
      (await apiRequest(`/admin/users?query=${encodeURIComponent(query.trim())}`, { schema: adminUserListSchema, signal })).users,
    staleTime: STALE.adminUsers,
    enabled,
    // Typing a search keeps the last list on screen instead of flashing a spinner per key.
    placeholderData: (previous) => previous,
  });
}

const adminUserResponseSchema = z.object({ user: adminUserSchema });

/**
 * A changed user appears in any number of cached searches, on their public page (role badge)
 * and, when admins act on themselves, in the signed-in racer.
 */
function useAdminUserChanged() {
  const queryClient = useQueryClient();
  return async (user: AdminUser) => {
    const me = queryClient.getQueryData<{ id: number } | null>(authKeys.me());
    await Promise.all([
      queryClient.invalidateQueries({ queryKey: adminKeys.userLists() }),
      queryClient.invalidateQueries({ queryKey: racerKeys.detail(user.handle) }),
      me?.id === user.id ? queryClient.invalidateQueries({ queryKey: authKeys.me() }) : null,
    ]);
  };
}

export function useChangeRole() {
  const changed = useAdminUserChanged();
  return useMutation({
    mutationFn: async ({ id, role }: { id: number; role: Role }) =>
      (await apiMutate(`/admin/users/${id}/role`, { method: 'PATCH', body: { role }, schema: adminUserResponseSchema })).user,
    onSuccess: changed,
  });
}

export function useSuspendUser() {
  const changed = useAdminUserChanged();
  return useMutation({
    mutationFn: async ({ id, until, reason }: { id: number; until: string | null; reason: string }) =>
      (await apiMutate(`/admin/users/${id}/suspend`, { body: { until, reason }, schema: adminUserResponseSchema })).user,
    onSuccess: changed,
  });
}

export function useUnsuspendUser() {
  const changed = useAdminUserChanged();
  return useMutation({
    mutationFn: async ({ id }: { id: number }) =>
      (await apiMutate(`/admin/users/${id}/unsuspend`, { schema: adminUserResponseSchema })).user,
    onSuccess: changed,
  });
}
