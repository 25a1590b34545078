import { Link } from 'expo-router';
import { Pressable, StyleSheet, View } from 'react-native';
import { layout, radius, space, useTheme } from '../theme';
import { AppText } from './AppText';
import { NavIcon } from './NavIcon';

export type NotificationBellProps = {
  /** Unread notifications; null while not known yet. */
  unreadCount: number | null;
  /** Rail (wide screens): icon and label, like the destinations above it. Bar (phones): icon only, in the top bar. */
  orientation: 'rail' | 'bar';
};

/** "Notifications, 3 unread": what a screen reader says for the bell. */
export function notificationBellLabel(unreadCount: number | null): string {
  return unreadCount ? `Notifications, ${unreadCount} unread` : 'Notifications';
}

/** The number on the badge: two digits at most, so it stays on the bell. */
export function unreadBadgeText(unreadCount: number): string {
  return unreadCount > 99 ? '99+' : String(unreadCount);
}

/** The bell that opens my notifications, with a badge counting the unread ones. */
export function NotificationBell({ unreadCount, orientation }: NotificationBellProps) {
  const { colors } = useTheme();
  const rail = orientation === 'rail';
  return (
    <Link href="/notifications" asChild>
      <Pressable role="link" aria-label={notificationBellLabel(unreadCount)} style={rail ? styles.rail : styles.bar}>
        <View>
          <NavIcon name="bell" color={colors.textMuted} />
          {unreadCount ? (
            <View style={[styles.badge, { backgroundColor: colors.accent, borderColor: colors.surface }]} aria-hidden>
              <AppText variant="caption" style={[styles.badgeText, { color: colors.accentText }]}>
                {unreadBadgeText(unreadCount)}
              </AppText>
            </View>
          ) : null}
        </View>
        {rail ? (
          <AppText variant="caption" tone="muted" aria-hidden>
            Notifications
          </AppText>
        ) : null}
      </Pressable>
    </Link>
  );
}

const styles = StyleSheet.create({
  bar: { minWidth: layout.minTouchTarget, minHeight: layout.minTouchTarget, alignItems: 'center', justifyContent: 'center' },
  rail: {
    flexDirection: 'row',
    alignItems: 'center',
    gap: space.md,
    minHeight: layout.minTouchTarget + 4,
    paddingHorizontal: space.md,
    borderRadius: radius.md,
  },
  badge: {
    position: 'absolute',
    top: -space.sm,
    right: -space.md,
    minWidth: 20,
    paddingHorizontal: space.xs,
    borderRadius: radius.pill,
    borderWidth: 2,
    alignItems: 'center',
  },
  badgeText: { fontWeight: '700', lineHeight: 16 },
});
