import { StyleSheet, View } from 'react-native';
import type { Role } from '../shared/types/auth';
import { radius, space, useTheme } from '../theme';
import { AppText } from './AppText';

export type RoleBadgeProps = { role: Role };

const LABELS: Record<Role, string> = { racer: 'Racer', moderator: 'Moderator', admin: 'Admin' };

/** Marks the racers who look after the community; ordinary racers get no badge. */
export function RoleBadge({ role }: RoleBadgeProps) {
  const { colors } = useTheme();
  if (role === 'racer') return null;
  return (
    <View style={[styles.badge, { backgroundColor: colors.accentSoft, borderColor: colors.accent }]}>
      <AppText variant="caption" style={[styles.text, { color: colors.accent }]}>
        {LABELS[role]}
      </AppText>
    </View>
  );
}

export function roleLabel(role: Role): string {
  return LABELS[role];
}

const styles = StyleSheet.create({
  badge: { alignSelf: 'flex-start', borderWidth: 1, borderRadius: radius.pill, paddingHorizontal: space.sm, paddingVertical: 2 },
  text: { fontWeight: '700' },
});
