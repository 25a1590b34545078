import type { ReactNode } from 'react';
import type { Ref } from 'react';
import { Pressable, StyleSheet, View } from 'react-native';
import type { TemplateField } from '../shared/types/templates';
import { layout, radius, space, useTheme } from '../theme';
import { AppText } from './AppText';

export type EditorSectionProps = {
  label: string;
  fields: readonly TemplateField[];
  expanded: boolean;
  onToggle: () => void;
  changedCount: number;
  problemCount: number;
  renderField: (field: TemplateField) => ReactNode;
  /** Lets the section index scroll here. */
  anchorRef?: Ref<View>;
};

/** Front and rear halves of a setting share a row, so the two ends can be compared at a glance. */
export function groupPairs(fields: readonly TemplateField[]): TemplateField[][] {
  const rows: TemplateField[][] = [];
  for (const field of fields) {
    const last = rows[rows.length - 1];
    if (field.pairKey && last?.length === 1 && last[0].pairKey === field.pairKey) last.push(field);
    else rows.push([field]);
  }
  return rows;
}

export function sectionSummary(fieldCount: number, changedCount: number, problemCount: number): string {
  const parts = [`${fieldCount} ${fieldCount === 1 ? 'setting' : 'settings'}`];
  if (changedCount > 0) parts.push(`${changedCount} changed`);
  if (problemCount > 0) parts.push(`${problemCount} to fix`);
  return parts.join(' · ');
}

/** A collapsible group of the sheet with a level-2 heading that opens and closes it. */
export function EditorSection({ label, fields, expanded, onToggle, changedCount, problemCount, renderField, anchorRef }: EditorSectionProps) {
  const { colors } = useTheme();
  return (
    <View ref={anchorRef} style={[styles.section, { backgroundColor: colors.surface, borderColor: problemCount > 0 ? colors.danger : colors.border }]}>
      <View role="heading" aria-level={2}>
        <Pressable role="button" aria-expanded={expanded} onPress={onToggle} style={styles.header}>
          <View style={styles.titles}>
            <AppText variant="heading">{label}</AppText>
            <AppText variant="caption" tone={problemCount > 0 ? 'danger' : changedCount > 0 ? 'accent' : 'muted'}>
              {sectionSummary(fields.length, changedCount, problemCount)}
            </AppText>
          </View>
          <AppText variant="heading" tone="accent" aria-hidden>
            {expanded ? '−' : '+'}
          </AppText>
        </Pressable>
      </View>
      {expanded ? (
        <View style={styles.body}>
          {groupPairs(fields).map((row) => (
            <View key={row[0].key} style={[styles.row, { borderTopColor: colors.border }]}>
              {row.map(renderField)}
            </View>
          ))}
        </View>
      ) : null}
    </View>
  );
}

const styles = StyleSheet.create({
  section: { borderWidth: 1, borderRadius: radius.md, overflow: 'hidden' },
  header: { minHeight: layout.minTouchTarget, flexDirection: 'row', alignItems: 'center', gap: space.md, padding: space.md },
  titles: { flex: 1, gap: space.xs },
  body: { paddingHorizontal: space.md, paddingBottom: space.md },
  row: { flexDirection: 'row', flexWrap: 'wrap', gap: space.md, paddingTop: space.md, marginTop: space.md, borderTopWidth: 1 },
});
