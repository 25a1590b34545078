import { useState } from 'react';
import { NotificationList } from '../components/NotificationList';
import { Screen } from '../components/Screen';
import { SignedInGate } from '../components/SignedInGate';
import { ErrorState, LoadingState } from '../components/StatusViews';
import { signInHref, useMeQuery } from '../hooks/auth';
import { useMarkAllNotificationsRead, useMarkNotificationRead, useNotificationsQuery } from '../hooks/notifications';

function MyNotifications() {
  const list = useNotificationsQuery(true);
  const markRead = useMarkNotificationRead();
  const markAll = useMarkAllNotificationsRead();
  const [now] = useState(Date.now);
  if (list.isPending) return <LoadingState label="Loading your notifications…" />;
  if (list.isError && !list.data) {
    return <ErrorState title="Your notifications could not load" message={list.error.message} onRetry={() => void list.refetch()} />;
  }
  const failed = markRead.error ?? markAll.error;
  return (
    <>
      <NotificationList
        notifications={list.data.pages.flatMap((page) => page.notifications)}
        now={now}
        onMarkRead={(id) => markRead.mutate(id)}
        markingId={markRead.isPending ? (markRead.variables ?? null) : null}
        onMarkAllRead={() => markAll.mutate()}
        markingAll={markAll.isPending}
        error={failed ? `Could not mark as read: ${failed.message}` : null}
        hasMore={list.hasNextPage}
        loadingMore={list.isFetchingNextPage}
        onMore={() => void list.fetchNextPage()}
      />
      {list.isFetchNextPageError ? (
        <ErrorState title="Older notifications could not load" message={list.error.message} onRetry={() => void list.fetchNextPage()} />
      ) : null}
    </>
  );
}

export default function NotificationsScreen() {
  const me = useMeQuery();
  return (
    <Screen title="Notifications" subtitle="Follows, comments, forks, changes to what you forked, and moderation." back={{ href: '/activity', label: 'Back to Activity' }}>
      <SignedInGate me={me} signInHref={signInHref('/notifications')}>
        {() => <MyNotifications />}
      </SignedInGate>
    </Screen>
  );
}
