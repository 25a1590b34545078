import { StyleSheet, View } from 'react-native';
import { formatLapTime } from '../shared/compute/trackday';
import { space, useTheme } from '../theme';
import { AppText } from './AppText';

export type RunLapColumn = { name: string; laps: readonly number[]; setAside: readonly number[] };

export type RunLapTableProps = { columns: readonly RunLapColumn[]; label: string };

function cell(column: RunLapColumn, index: number): string {
  if (index >= column.laps.length) return '–';
  const time = formatLapTime(column.laps[index]);
  return column.setAside.includes(index) ? `${time} (set aside)` : time;
}

/** Every lap of one or more runs as text, lap by lap: the numbers behind the charts. */
export function RunLapTable({ columns, label }: RunLapTableProps) {
  const { colors } = useTheme();
  const rows = Math.max(0, ...columns.map((c) => c.laps.length));
  return (
    <View role="table" aria-label={label}>
      <View role="row" style={styles.row}>
        {['Lap', ...columns.map((c) => c.name)].map((heading, i) => (
          <View key={`${i}-${heading}`} role="columnheader" style={i === 0 ? styles.lapCell : styles.cell}>
            <AppText variant="caption" tone="muted" style={styles.bold}>
              {heading}
            </AppText>
          </View>
        ))}
      </View>
      {Array.from({ length: rows }, (_, index) => (
        <View key={index} role="row" style={[styles.row, { borderTopWidth: 1, borderColor: colors.border }]}>
          <View role="rowheader" style={styles.lapCell}>
            <AppText tone="muted">{index + 1}</AppText>
          </View>
          {columns.map((column) => (
            <View key={column.name} role="cell" style={styles.cell}>
              <AppText style={styles.numbers} tone={column.setAside.includes(index) ? 'muted' : 'default'}>
                {cell(column, index)}
              </AppText>
            </View>
          ))}
        </View>
      ))}
    </View>
  );
}

const styles = StyleSheet.create({
  row: { flexDirection: 'row', gap: space.sm, paddingVertical: space.xs },
  lapCell: { width: space.xxl + space.md },
  cell: { flex: 1 },
  bold: { fontWeight: '700' },
  numbers: { fontVariant: ['tabular-nums'] },
});
