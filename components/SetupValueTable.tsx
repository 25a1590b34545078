import { StyleSheet, View } from 'react-native';
import type { UnitPreferences } from '../shared/types/auth';
import type { StoredSetupValues } from '../shared/types/setups';
import type { TemplateField } from '../shared/types/templates';
import { space, useTheme } from '../theme';
import { AppText } from './AppText';
import { formatFieldValue, type SheetRun } from './SetupSheetFormat';

export type SetupValueTableProps = {
  run: SheetRun;
  values: StoredSetupValues;
  units: UnitPreferences;
  /** Names the table for screen readers, e.g. "Differentials, front and rear". */
  label: string;
  /** Small type and tight rows, for the printed pit sheet. */
  compact?: boolean;
  /** Follows another table of the same section, so its first row is ruled off from the one above. */
  continued?: boolean;
};

type CellProps = { field: TemplateField | null; values: StoredSetupValues; units: UnitPreferences; spansBothEnds?: boolean; compact?: boolean };

function Cell({ field, values, units, spansBothEnds, compact }: CellProps) {
  const variant = compact ? 'caption' : 'body';
  const text = field ? formatFieldValue(field, values[field.key], units) : null;
  return (
    <View role="cell" style={spansBothEnds ? (compact ? styles.value : styles.single) : styles.value} aria-label={text === null ? 'Not set' : undefined}>
      {text === null ? (
        <AppText variant={variant} tone="muted" aria-hidden>
          —
        </AppText>
      ) : (
        <AppText variant={variant}>{text}</AppText>
      )}
    </View>
  );
}

function RowHeader({ label, compact, spansBothEnds }: { label: string; compact?: boolean; spansBothEnds?: boolean }) {
  return (
    <View role="rowheader" style={compact && spansBothEnds ? styles.compactLabel : styles.label}>
      <AppText variant={compact ? 'caption' : 'body'} tone="muted">
        {label}
      </AppText>
    </View>
  );
}

/**
 * Rows are `accessible` so native screen readers read a setting and its values as one line
 * (react-native-web ignores the prop; on web the table roles do that work).
 *
 * Values of one run of a section: front/rear pairs side by side under Front and Rear headings, or
 * single settings beside their labels. A table, so screen readers say which end a value is for.
 */
export function SetupValueTable({ run, values, units, label, compact, continued }: SetupValueTableProps) {
  const { colors } = useTheme();
  const line = { borderTopWidth: 1, borderColor: colors.border };
  const row = compact ? [styles.row, styles.compactRow] : styles.row;
  if (run.kind === 'singles') {
    return (
      <View role="table" aria-label={label}>
        {run.fields.map((field, i) => (
          <View key={field.key} role="row" accessible style={[row, i > 0 || continued ? line : null]}>
            <RowHeader label={field.label} compact={compact} spansBothEnds />
            <Cell field={field} values={values} units={units} spansBothEnds compact={compact} />
          </View>
        ))}
      </View>
    );
  }
  return (
    <View role="table" aria-label={label}>
      <View role="row" accessible style={[row, continued ? line : null]}>
        <View role="columnheader" style={styles.label}>
          <AppText variant="caption" tone="muted">
            Setting
          </AppText>
        </View>
        {(['Front', 'Rear'] as const).map((end) => (
          <View key={end} role="columnheader" style={styles.value}>
            <AppText variant="caption" style={styles.end}>
              {end}
            </AppText>
          </View>
        ))}
      </View>
      {run.pairs.map((pair) => (
        <View key={pair.key} role="row" accessible style={[row, line]}>
          <RowHeader label={pair.label} compact={compact} />
          <Cell field={pair.front} values={values} units={units} compact={compact} />
          <Cell field={pair.rear} values={values} units={units} compact={compact} />
        </View>
      ))}
    </View>
  );
}

const styles = StyleSheet.create({
  row: { flexDirection: 'row', alignItems: 'flex-start', gap: space.sm, paddingVertical: space.sm },
  compactRow: { paddingVertical: space.xs },
  label: { flex: 1.3 },
  value: { flex: 1 },
  // As wide as the Front and Rear columns together, so single values line up under pairs.
  single: { flex: 2 },
  // Printed single settings give the long labels room, so rows do not wrap onto a second line.
  compactLabel: { flex: 2 },
  end: { fontWeight: '700' },
});
