import { StyleSheet, View } from 'react-native';
import type { UnitPreferences } from '../shared/types/auth';
import type { StoredSetupValues } from '../shared/types/setups';
import type { TemplateSection } from '../shared/types/templates';
import { space, useTheme } from '../theme';
import { AppText } from './AppText';
import { PRINT_IDS } from './PrintStyles';
import { sheetRuns } from './SetupSheetFormat';
import { SetupValueTable } from './SetupValueTable';

export type PrintSectionProps = {
  section: TemplateSection;
  values: StoredSetupValues;
  units: UnitPreferences;
  /** Two sections side by side on wide screens; print always uses two columns. */
  half: boolean;
};

/** One section of the pit sheet, every field shown, kept on one page when printed. */
export function PrintSection({ section, values, units, half }: PrintSectionProps) {
  const { colors } = useTheme();
  return (
    <View testID={PRINT_IDS.section} style={[styles.section, { borderColor: colors.border }, half ? styles.half : styles.full]}>
      <AppText variant="body" role="heading" aria-level={2} style={styles.title}>
        {section.label}
      </AppText>
      {sheetRuns(section).map((run, i) => (
        <SetupValueTable
          key={i}
          run={run}
          continued={i > 0}
          values={values}
          units={units}
          compact
          label={run.kind === 'pairs' ? `${section.label}: front and rear` : section.label}
        />
      ))}
    </View>
  );
}

const styles = StyleSheet.create({
  section: { borderWidth: 1, padding: space.sm, gap: space.xs },
  half: { width: '48%', flexGrow: 1 },
  full: { width: '100%' },
  title: { fontWeight: '700' },
});
