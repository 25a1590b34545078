import { Link, type Href } from 'expo-router';
import { Pressable, StyleSheet, View } from 'react-native';
import type { NotificationDto } from '../shared/types/community';
import { layout, radius, space, useTheme } from '../theme';
import { AppText } from './AppText';
import { Button } from './Button';
import { formatCommentTime } from './CommentItem';

export type NotificationItemProps = {
  notification: NotificationDto;
  /** The time "3 h ago" is measured against, in ms since 1970. */
  now: number;
  /** Marks it read; also called when it is opened. */
  onMarkRead: (id: number) => void;
  /** While its mark-read is on its way. */
  marking?: boolean;
};

function setupName(n: NotificationDto): string {
  return n.setup?.title ? `“${n.setup.title}”` : 'a setup you can no longer open';
}

/** What happened, in one sentence: "@rafi_new forked “Hollow Pines”". */
export function notificationText(n: NotificationDto): string {
  const who = n.actor ? `@${n.actor.handle}` : 'Someone';
  const revision = n.revision ? ` (revision ${n.revision.number})` : '';
  switch (n.type) {
    case 'new-follower':
      return `${who} started following you`;
    case 'comment-on-setup':
      return `${who} commented on ${setupName(n)}`;
    case 'comment-on-revision':
      return `${who} commented on your change to ${setupName(n)}${revision}`;
    case 'comment-reply':
      return `${who} replied to your comment on ${setupName(n)}`;
    case 'setup-forked':
      return `${who} forked ${setupName(n)}`;
    case 'original-changed':
      return `${who} changed the original of your fork ${setupName(n)}${revision}`;
    case 'report-outcome':
      return n.setup ? `Your report about ${setupName(n)} was reviewed` : 'Your report was reviewed';
    case 'moderation-notice':
      return n.setup ? `The moderators acted on ${setupName(n)}` : 'The moderators made a decision about your account or posts';
  }
}

/** Where opening it leads; null when there is nothing I can open any more. */
export function notificationHref(n: NotificationDto): Href | null {
  if (n.type === 'new-follower') return n.actor ? `/racers/${n.actor.handle}` : null;
  // The outcome and any appeal live on the moderation pages, whether or not the setup can be opened.
  if (n.type === 'report-outcome') return '/reports';
  if (n.type === 'moderation-notice') return '/moderation/mine';
  if (!n.setup?.available) return null;
  const setup = `/setups/${n.setup.id}`;
  if (n.type === 'original-changed') return `${setup}/sync`;
  if (n.type === 'setup-forked') return `${setup}/family`;
  // Comments on a change sit beside it in the history.
  if (n.type === 'comment-on-revision' || (n.type === 'comment-reply' && n.revision)) return `${setup}/history`;
  return setup;
}

/** One notification: what happened, when, the detail it quotes, and a way to mark it read. */
export function NotificationItem({ notification: n, now, onMarkRead, marking }: NotificationItemProps) {
  const { colors } = useTheme();
  const href = notificationHref(n);
  const text = notificationText(n);
  const label = `${n.read ? '' : 'Unread: '}${text}`;
  const body = (
    <View style={styles.text}>
      <AppText style={n.read ? null : styles.unread}>{text}</AppText>
      {n.detail ? (
        <AppText tone="muted" numberOfLines={2}>
          {n.detail}
        </AppText>
      ) : null}
      <AppText variant="caption" tone="muted">
        {formatCommentTime(n.createdAt, now)}
      </AppText>
    </View>
  );
  return (
    <View style={[styles.row, { borderColor: colors.border, backgroundColor: n.read ? colors.surface : colors.accentSoft }]}>
      {n.read ? null : <View style={[styles.dot, { backgroundColor: colors.accent }]} aria-hidden />}
      {href ? (
        <Link href={href} asChild onPress={() => (n.read ? undefined : onMarkRead(n.id))}>
          <Pressable role="link" aria-label={label} style={styles.open}>
            {body}
          </Pressable>
        </Link>
      ) : (
        <View style={styles.open} aria-label={label}>
          {body}
        </View>
      )}
      {n.read ? null : <Button label="Mark read" variant="secondary" onPress={() => onMarkRead(n.id)} busy={marking} accessibilityLabel={`Mark read: ${text}`} />}
    </View>
  );
}

const styles = StyleSheet.create({
  row: { flexDirection: 'row', alignItems: 'center', gap: space.md, borderWidth: 1, borderRadius: radius.md, padding: space.md },
  dot: { width: space.sm, height: space.sm, borderRadius: radius.pill },
  open: { flex: 1, minHeight: layout.minTouchTarget, justifyContent: 'center' },
  text: { gap: 2 },
  unread: { fontWeight: '700' },
});
