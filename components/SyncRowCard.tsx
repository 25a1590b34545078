import { StyleSheet, View } from 'react-native';
import type { SyncChoice } from '../hooks/forks';
import type { UnitPreferences } from '../shared/types/auth';
import type { UpstreamRow } from '../shared/types/forks';
import type { VehicleClassKey } from '../shared/types/vehicleClasses';
import { radius, space, useTheme } from '../theme';
import { AppText } from './AppText';
import { LineageValue } from './LineageValue';
import { SyncRowChoice } from './SyncRowChoice';

/** Names of the three values, with the revisions they come from. */
export type SyncColumnLabels = { base: string; theirs: string; mine: string };

export type SyncRowCardProps = {
  row: UpstreamRow;
  choice: SyncChoice;
  onChange: (change: Partial<SyncChoice>) => void;
  vehicleClass: VehicleClassKey;
  units: UnitPreferences;
  labels: SyncColumnLabels;
  disabled?: boolean;
};

export function statusText(row: UpstreamRow): string {
  return row.status === 'conflict' ? 'You both changed it' : 'Only the original changed it';
}

/** One field as a card, for phones: the three values one under another, then the choice. */
export function SyncRowCard({ row, choice, onChange, vehicleClass, units, labels, disabled }: SyncRowCardProps) {
  const { colors } = useTheme();
  const conflict = row.status === 'conflict';
  const value = (label: string, v: UpstreamRow['base'], strong?: boolean) => (
    <View style={styles.value}>
      <AppText variant="caption" tone="muted">
        {label}
      </AppText>
      <LineageValue vehicleClass={vehicleClass} fieldKey={row.key} value={v} units={units} style={strong ? styles.bold : undefined} />
    </View>
  );
  return (
    <View
      role="group"
      aria-label={row.label}
      style={[styles.card, { borderColor: conflict ? colors.caution : colors.border, backgroundColor: colors.surface }]}
    >
      <AppText variant="heading" aria-level={3}>
        {row.label}
      </AppText>
      <AppText variant="caption" tone={conflict ? 'caution' : 'muted'}>
        {row.section} · {statusText(row)}
      </AppText>
      {value(labels.base, row.base)}
      {value(labels.theirs, row.theirs, true)}
      {value(labels.mine, row.mine, conflict)}
      <SyncRowChoice row={row} choice={choice} onChange={onChange} disabled={disabled} />
    </View>
  );
}

const styles = StyleSheet.create({
  card: { borderWidth: 1, borderRadius: radius.md, padding: space.md, gap: space.xs },
  value: { gap: 0 },
  bold: { fontWeight: '700' },
});
