import { StyleSheet, View } from 'react-native';
import { radius, space, useTheme } from '../theme';
import { AppText } from './AppText';

export type HealthBadgeProps = {
  state: 'checking' | 'ok' | 'down';
  /** Shown when the state is "down": what the server said, or that it could not be reached. */
  detail?: string;
};

const LABELS: Record<HealthBadgeProps['state'], string> = {
  checking: 'Checking the server…',
  ok: 'Server and database reachable',
  down: 'Server unreachable',
};

/** A small status line: is the Tunefork server (and its database) answering? */
export function HealthBadge({ state, detail }: HealthBadgeProps) {
  const { colors } = useTheme();
  const dot = state === 'ok' ? colors.success : state === 'down' ? colors.danger : colors.textMuted;
  return (
    <View style={styles.row} role="status" aria-live="polite" testID="health-badge">
      <View style={[styles.dot, { backgroundColor: dot }]} aria-hidden />
      <AppText variant="caption" tone={state === 'down' ? 'danger' : 'muted'}>
        {LABELS[state]}
        {state === 'down' && detail ? ` — ${detail}` : ''}
      </AppText>
    </View>
  );
}

const styles = StyleSheet.create({
  row: { flexDirection: 'row', alignItems: 'center', gap: space.sm },
  dot: { width: 10, height: 10, borderRadius: radius.pill },
});
