import { StyleSheet, View } from 'react-native';
import type { NotificationDto } from '../shared/types/community';
import { space } from '../theme';
import { Button } from './Button';
import { FormErrorBanner } from './FormErrorBanner';
import { NotificationItem } from './NotificationItem';
import { EmptyState } from './StatusViews';

export type NotificationListProps = {
  notifications: NotificationDto[];
  now: number;
  onMarkRead: (id: number) => void;
  /** The notification whose mark-read is on its way. */
  markingId: number | null;
  onMarkAllRead: () => void;
  markingAll: boolean;
  /** Why the last mark-read failed. */
  error: string | null;
  hasMore: boolean;
  loadingMore: boolean;
  onMore: () => void;
};

/** My notifications, newest first, with "mark all read" above and older ones on request. */
export function NotificationList(props: NotificationListProps) {
  const { notifications, now, onMarkRead, markingId, onMarkAllRead, markingAll, error, hasMore, loadingMore, onMore } = props;
  if (notifications.length === 0) {
    return (
      <EmptyState
        title="No notifications yet"
        message="You are told here when someone follows you, comments on your setups or changes, replies to you, forks your setups, or changes a setup you forked."
      />
    );
  }
  const anyUnread = notifications.some((n) => !n.read);
  return (
    <View style={styles.list}>
      {anyUnread ? <Button label="Mark all read" variant="secondary" onPress={onMarkAllRead} busy={markingAll} busyLabel="Marking all read…" /> : null}
      <FormErrorBanner message={error} />
      <View role="list" aria-label="Notifications" style={styles.list}>
        {notifications.map((n) => (
          <View key={n.id} role="listitem">
            <NotificationItem notification={n} now={now} onMarkRead={onMarkRead} marking={markingId === n.id} />
          </View>
        ))}
      </View>
      {hasMore ? <Button label="Show older notifications" variant="secondary" onPress={onMore} busy={loadingMore} busyLabel="Loading older notifications…" /> : null}
    </View>
  );
}

const styles = StyleSheet.create({
  list: { gap: space.md },
});
