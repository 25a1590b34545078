import { useInfiniteQuery, useMutation, useQuery, useQueryClient, type InfiniteData } from '@tanstack/react-query';
import { useEffect, useState } from 'react';
import { AppState, Platform } from 'react-native';
import { notificationPageSchema, unreadCountSchema, type NotificationPage } from '../shared/types/community';
import { apiMutate, apiRequest } from './api';

export const notificationKeys = {
  all: ['notifications'] as const,
  list: () => [...notificationKeys.all, 'list'] as const,
  unread: () => [...notificationKeys.all, 'unread'] as const,
};

/** How often the bell asks for the unread count while the app is on screen. */
export const UNREAD_POLL_MS = 60_000;
/** The list changes as others act; opening it again after half a minute asks again. */
export const NOTIFICATIONS_STALE_MS = 30_000;

/** Whether the app is on screen: the browser tab visible on web, the app in the foreground on phones. */
export function useAppVisible(): boolean {
  const [visible, setVisible] = useState(() => Platform.OS !== 'web' || typeof document === 'undefined' || document.visibilityState !== 'hidden');
  useEffect(() => {
    if (Platform.OS === 'web') {
      if (typeof document === 'undefined') return;
      const changed = () => setVisible(document.visibilityState !== 'hidden');
      document.addEventListener('visibilitychange', changed);
      return () => document.removeEventListener('visibilitychange', changed);
    }
    const subscription = AppState.addEventListener('change', (state) => setVisible(state === 'active'));
    return () => subscription.remove();
  }, []);
  return visible;
}

/** The bell's number: polled every minute while the app is visible, and at once when it becomes visible again. */
export function useUnreadCountQuery(signedIn: boolean) {
  const visible = useAppVisible();
  return useQuery({
    queryKey: notificationKeys.unread(),
    queryFn: async ({ signal }) => (await apiRequest('/notifications/unread-count', { schema: unreadCountSchema, signal })).unreadCount,
    enabled: signedIn && visible,
    refetchInterval: visible ? UNREAD_POLL_MS : false,
    refetchIntervalInBackground: false,
    staleTime: UNREAD_POLL_MS / 2,
  });
}

/** My notifications, newest first, a page at a time. */
export function useNotificationsQuery(enabled: boolean) {
  return useInfiniteQuery({
    queryKey: notificationKeys.list(),
    queryFn: ({ pageParam, signal }) =>
      apiRequest(`/notifications${pageParam ? `?cursor=${encodeURIComponent(pageParam)}` : ''}`, { schema: notificationPageSchema, signal }),
    initialPageParam: null as string | null,
    getNextPageParam: (last) => last.nextCursor,
    staleTime: NOTIFICATIONS_STALE_MS,
    enabled,
  });
}

/** Marks read in the cached list (`id` one, or every one when null) and sets the count the server answered. */
function useReadWritten() {
  const queryClient = useQueryClient();
  return (id: number | null, unreadCount: number) => {
    queryClient.setQueryData(notificationKeys.unread(), unreadCount);
    queryClient.setQueryData<InfiniteData<NotificationPage>>(notificationKeys.list(), (data) =>
      data
        ? {
            ...data,
            pages: data.pages.map((page) => ({
              ...page,
              notifications: page.notifications.map((n) => (id === null || n.id === id ? { ...n, read: true } : n)),
            })),
          }
        : data,
    );
  };
}

export function useMarkNotificationRead() {
  const written = useReadWritten();
  return useMutation({
    mutationFn: async (id: number) => ({ id, ...(await apiMutate(`/notifications/${id}/read`, { schema: unreadCountSchema })) }),
    onSuccess: ({ id, unreadCount }) => written(id, unreadCount),
  });
}

export function useMarkAllNotificationsRead() {
  const written = useReadWritten();
  return useMutation({
    mutationFn: () => apiMutate('/notifications/read-all', { schema: unreadCountSchema }),
    onSuccess: ({ unreadCount }) => written(null, unreadCount),
  });
}
