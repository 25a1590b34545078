import { TabSlot, TabTrigger, useTabsWithTriggers } from 'expo-router/ui';
import { StyleSheet, View } from 'react-native';
import { useSafeAreaInsets } from 'react-native-safe-area-context';
import { BrandMark } from '../../components/BrandMark';
import { NavItem } from '../../components/NavItem';
import type { NavIconName } from '../../components/NavIcon';
import { NotificationBell } from '../../components/NotificationBell';
import { useMeQuery } from '../../hooks/auth';
import { useUnreadCountQuery } from '../../hooks/notifications';
import { layout, space, useTheme } from '../../theme';

const DESTINATIONS: Array<{ name: string; href: '/' | '/garage' | '/activity' | '/profile'; label: string; icon: NavIconName }> = [
  { name: 'index', href: '/', label: 'Discover', icon: 'discover' },
  { name: 'garage', href: '/garage', label: 'Garage', icon: 'garage' },
  { name: 'activity', href: '/activity', label: 'Activity', icon: 'activity' },
  { name: 'profile', href: '/profile', label: 'Profile', icon: 'profile' },
];

/** The notifications bell, for signed-in racers only. */
function Bell({ orientation }: { orientation: 'rail' | 'bar' }) {
  const signedIn = Boolean(useMeQuery().data);
  const unread = useUnreadCountQuery(signedIn);
  return signedIn ? <NotificationBell unreadCount={unread.data ?? null} orientation={orientation} /> : null;
}

/** Bottom tab bar on phones; the same destinations in a side rail at ≥ 900 px. */
export default function TabsLayout() {
  const { colors, isWide } = useTheme();
  const insets = useSafeAreaInsets();
  const { NavigationContent } = useTabsWithTriggers({
    triggers: DESTINATIONS.map((d) => ({ type: 'internal' as const, name: d.name, href: d.href })),
  });
  const orientation = isWide ? 'rail' : 'bar';
  const nav = (
    <View
      role="navigation"
      aria-label="Main"
      style={[
        isWide ? styles.rail : styles.bar,
        { backgroundColor: colors.surface, borderColor: colors.border },
        isWide ? null : { paddingBottom: insets.bottom },
      ]}
    >
      {isWide ? (
        <View style={styles.brand}>
          <BrandMark />
        </View>
      ) : null}
      {DESTINATIONS.map((d) => (
        <TabTrigger key={d.name} name={d.name} asChild>
          <NavItem label={d.label} icon={d.icon} orientation={orientation} />
        </TabTrigger>
      ))}
      {isWide ? <Bell orientation="rail" /> : null}
    </View>
  );
  return (
    <NavigationContent>
      <View style={[styles.root, { flexDirection: isWide ? 'row' : 'column', backgroundColor: colors.background }]}>
        {isWide ? nav : null}
        {isWide ? null : (
          <View
            role="banner"
            style={[styles.topBar, { paddingTop: insets.top + space.sm, backgroundColor: colors.surface, borderColor: colors.border }]}
          >
            <BrandMark />
            <Bell orientation="bar" />
          </View>
        )}
        <View style={styles.slot}>
          <TabSlot />
        </View>
        {isWide ? null : nav}
      </View>
    </NavigationContent>
  );
}

const styles = StyleSheet.create({
  root: { flex: 1 },
  slot: { flex: 1 },
  bar: { flexDirection: 'row', borderTopWidth: 1 },
  rail: { width: layout.railWidth, borderRightWidth: 1, paddingHorizontal: space.md, paddingTop: space.xl, gap: space.xs },
  topBar: {
    flexDirection: 'row',
    alignItems: 'center',
    justifyContent: 'space-between',
    paddingHorizontal: space.lg,
    paddingBottom: space.sm,
    borderBottomWidth: 1,
  },
  brand: { paddingHorizontal: space.md, paddingBottom: space.xl },
});
