import { StyleSheet, View } from 'react-native';
import type { UnitPreferences } from '../shared/types/auth';
import type { SetupDetail } from '../shared/types/setups';
import { getTemplate } from '../shared/types/templates';
import { layout, space, useTheme } from '../theme';
import { AppText } from './AppText';
import { PrintHeader } from './PrintHeader';
import { PrintSection } from './PrintSection';
import { PRINT_IDS } from './PrintStyles';
import { SafetyNote } from './SafetyNote';

export type PrintSheetProps = { setup: SetupDetail; units: UnitPreferences };

/** The whole setup on one compact page for the pit table: header, figures, every section, safety. */
export function PrintSheet({ setup, units }: PrintSheetProps) {
  const { colors, isWide } = useTheme();
  const template = getTemplate(setup.vehicleClass);
  return (
    <View testID={PRINT_IDS.sheet} style={[styles.sheet, { backgroundColor: colors.surface }]}>
      <PrintHeader setup={setup} units={units} />
      <View testID={PRINT_IDS.columns} style={styles.columns}>
        {template.sections.map((section) => (
          <PrintSection key={section.key} section={section} values={setup.currentRevision.values} units={units} half={isWide} />
        ))}
      </View>
      <SafetyNote vehicleClass={setup.vehicleClass} compact />
      <AppText variant="caption" tone="muted">
        From Tunefork, setup {setup.id}. Values as saved in revision {setup.currentRevision.number}; “—” means not filled in.
      </AppText>
    </View>
  );
}

const styles = StyleSheet.create({
  sheet: { width: '100%', maxWidth: layout.contentMaxWidth * 1.5, alignSelf: 'center', padding: space.lg, gap: space.md },
  columns: { flexDirection: 'row', flexWrap: 'wrap', alignItems: 'flex-start', gap: space.sm },
});
