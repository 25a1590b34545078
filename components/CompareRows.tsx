import type { ReactNode } from 'react';
import { StyleSheet, View } from 'react-native';
import type { UnitPreferences } from '../shared/types/auth';
import type { SetupFieldValue, TemplateField } from '../shared/types/templates';
import { space, useTheme } from '../theme';
import { AppText } from './AppText';
import { formatFieldValue } from './SetupSheetFormat';

/** A compared setting with both values already in the viewer's words and units. */
export type CompareDisplayRow = { key: string; label: string; a: string; b: string; changed: boolean };

export type CompareRowsProps = {
  rows: CompareDisplayRow[];
  /** A side-by-side table (wide windows) or one stacked line per setting (phones). */
  wide: boolean;
  /** Column headings of the table, e.g. "Revision 3" and "Revision 5". */
  columns: { a: string; b: string };
  /** Names the list or table for screen readers. */
  label: string;
  /** Something to offer beside a row, such as "Comment on this field". */
  renderAction?: (row: CompareDisplayRow) => ReactNode;
};

/** A stored value as the racer reads it, or "Not set"; a field the sheet does not know shows as stored. */
export function valueText(field: TemplateField | undefined, value: SetupFieldValue | null | undefined, units: UnitPreferences): string {
  if (value === null || value === undefined) return 'Not set';
  if (!field) return String(value);
  return formatFieldValue(field, value, units) ?? 'Not set';
}

function Stacked({ rows, label, renderAction }: CompareRowsProps) {
  const { colors } = useTheme();
  return (
    <View role="list" aria-label={label}>
      {rows.map((row, i) => (
        <View key={row.key} role="listitem" style={[styles.line, i > 0 ? { borderTopWidth: 1, borderColor: colors.border } : null]}>
          <AppText style={styles.bold}>{row.label}</AppText>
          {row.changed ? (
            <AppText>{`${row.a} → ${row.b}`}</AppText>
          ) : (
            <AppText tone="muted">{`${row.a} (unchanged)`}</AppText>
          )}
          {renderAction?.(row)}
        </View>
      ))}
    </View>
  );
}

function Table({ rows, columns, label, renderAction }: CompareRowsProps) {
  const { colors } = useTheme();
  const line = { borderTopWidth: 1, borderColor: colors.border };
  return (
    <View role="table" aria-label={label}>
      <View role="row" accessible style={styles.row}>
        {['Setting', columns.a, columns.b].map((heading, i) => (
          <View key={i} role="columnheader" style={i === 0 ? styles.labelCell : styles.valueCell}>
            <AppText variant="caption" tone="muted" style={styles.bold}>
              {heading}
            </AppText>
          </View>
        ))}
      </View>
      {rows.map((row) => (
        // One accessible line per row, as on the sheet, unless it holds an action of its own.
        <View key={row.key} role="row" accessible={!renderAction} style={[styles.row, line, row.changed ? { backgroundColor: colors.accentSoft } : null]}>
          <View role="rowheader" style={styles.labelCell}>
            <AppText style={row.changed ? styles.bold : null}>{row.label}</AppText>
            {renderAction?.(row)}
          </View>
          <View role="cell" style={styles.valueCell}>
            <AppText tone={row.changed ? 'default' : 'muted'}>{row.a}</AppText>
          </View>
          <View role="cell" style={styles.valueCell}>
            <AppText tone={row.changed ? 'default' : 'muted'} style={row.changed ? styles.bold : null}>
              {row.b}
            </AppText>
          </View>
        </View>
      ))}
    </View>
  );
}

/** Compared settings: "label: before → after" lines on phones, a Setting / A / B table on wide windows. */
export function CompareRows(props: CompareRowsProps) {
  return props.wide ? <Table {...props} /> : <Stacked {...props} />;
}

const styles = StyleSheet.create({
  line: { paddingVertical: space.sm, gap: 2 },
  bold: { fontWeight: '700' },
  row: { flexDirection: 'row', alignItems: 'flex-start', gap: space.sm, paddingVertical: space.sm, paddingHorizontal: space.xs },
  labelCell: { flex: 1.3, gap: space.xs },
  valueCell: { flex: 1 },
});
