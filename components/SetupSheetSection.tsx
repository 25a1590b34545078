import { Pressable, StyleSheet, View } from 'react-native';
import type { UnitPreferences } from '../shared/types/auth';
import type { StoredSetupValues } from '../shared/types/setups';
import type { TemplateSection } from '../shared/types/templates';
import { layout, space, useTheme } from '../theme';
import { AppText } from './AppText';
import { sheetRuns } from './SetupSheetFormat';
import { SetupValueTable } from './SetupValueTable';

export type SetupSheetSectionProps = {
  section: TemplateSection;
  values: StoredSetupValues;
  units: UnitPreferences;
  open: boolean;
  onToggle: () => void;
  first?: boolean;
};

function filledCount(section: TemplateSection, values: StoredSetupValues): number {
  return section.fields.filter((f) => values[f.key] !== undefined && values[f.key] !== '').length;
}

/** One section of the sheet that opens and closes, so a phone shows the sheet a section at a time. */
export function SetupSheetSection({ section, values, units, open, onToggle, first }: SetupSheetSectionProps) {
  const { colors } = useTheme();
  const filled = filledCount(section, values);
  const runs = sheetRuns(section);
  return (
    <View style={[styles.section, first ? null : { borderTopWidth: 1, borderColor: colors.border }]}>
      {/* The button sits inside the heading (not the other way round) so the heading stays a heading. */}
      <View role="heading" aria-level={3}>
        <Pressable
          role="button"
          aria-expanded={open}
          onPress={onToggle}
          style={({ pressed }) => [styles.header, { opacity: pressed ? 0.85 : 1 }]}
        >
          <AppText style={styles.title}>{section.label}</AppText>
          <AppText variant="caption" tone="muted">
            {filled} of {section.fields.length} set
          </AppText>
          <AppText tone="accent" aria-hidden style={styles.chevron}>
            {open ? '▴' : '▾'}
          </AppText>
        </Pressable>
      </View>
      {open ? (
        <View style={styles.body}>
          {runs.map((run, i) => (
            <SetupValueTable
              key={i}
              run={run}
              continued={i > 0}
              values={values}
              units={units}
              label={run.kind === 'pairs' ? `${section.label}: front and rear` : section.label}
            />
          ))}
        </View>
      ) : null}
    </View>
  );
}

const styles = StyleSheet.create({
  section: { paddingVertical: space.xs },
  header: { minHeight: layout.minTouchTarget, flexDirection: 'row', alignItems: 'center', gap: space.sm },
  title: { flex: 1, fontWeight: '700' },
  chevron: { width: space.lg, textAlign: 'center' },
  body: { paddingBottom: space.sm },
});
