import { StyleSheet, View } from 'react-native';
import { SYNC_UNDECIDED, type SyncChoice } from '../hooks/forks';
import type { UnitPreferences } from '../shared/types/auth';
import type { UpstreamRow } from '../shared/types/forks';
import type { VehicleClassKey } from '../shared/types/vehicleClasses';
import { space, useTheme } from '../theme';
import { AppText } from './AppText';
import { LineageValue } from './LineageValue';
import { statusText, type SyncColumnLabels } from './SyncRowCard';
import { SyncRowChoice } from './SyncRowChoice';

export type SyncTableProps = {
  rows: readonly UpstreamRow[];
  choices: Readonly<Record<string, SyncChoice>>;
  onChange: (key: string, change: Partial<SyncChoice>) => void;
  vehicleClass: VehicleClassKey;
  units: UnitPreferences;
  labels: SyncColumnLabels;
  disabled?: boolean;
};

/** Every offered field in one table, for wide screens: field, the three values, the choice. */
export function SyncTable({ rows, choices, onChange, vehicleClass, units, labels, disabled }: SyncTableProps) {
  const { colors } = useTheme();
  const line = { borderTopWidth: 1, borderColor: colors.border };
  const header = (text: string, style: object) => (
    <View role="columnheader" style={style}>
      <AppText variant="caption" style={styles.bold}>
        {text}
      </AppText>
    </View>
  );
  return (
    <View role="table" aria-label="Fields the original changed">
      <View role="row" style={styles.row}>
        {header('Field', styles.field)}
        {header(labels.base, styles.value)}
        {header(labels.theirs, styles.value)}
        {header(labels.mine, styles.value)}
        {header('Your choice', styles.choice)}
      </View>
      {rows.map((row) => (
        <View key={row.key} role="row" style={[styles.row, line]}>
          <View role="rowheader" style={styles.field}>
            <AppText style={styles.bold}>{row.label}</AppText>
            <AppText variant="caption" tone={row.status === 'conflict' ? 'caution' : 'muted'}>
              {row.section} · {statusText(row)}
            </AppText>
          </View>
          {(['base', 'theirs', 'mine'] as const).map((side) => (
            <View key={side} role="cell" style={styles.value}>
              <LineageValue vehicleClass={vehicleClass} fieldKey={row.key} value={row[side]} units={units} style={side === 'theirs' ? styles.bold : undefined} />
            </View>
          ))}
          <View role="cell" style={styles.choice}>
            <SyncRowChoice row={row} choice={choices[row.key] ?? SYNC_UNDECIDED} onChange={(change) => onChange(row.key, change)} disabled={disabled} />
          </View>
        </View>
      ))}
    </View>
  );
}

const styles = StyleSheet.create({
  row: { flexDirection: 'row', alignItems: 'flex-start', gap: space.md, paddingVertical: space.sm },
  field: { flex: 2, gap: 2 },
  value: { flex: 1.2 },
  choice: { flex: 2.2 },
  bold: { fontWeight: '700' },
});
