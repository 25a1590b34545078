import { StyleSheet, View } from 'react-native';
import type { UnitPreferences } from '../shared/types/auth';
import type { SetupDetail } from '../shared/types/setups';
import { vehicleClassLabel } from '../shared/types/vehicleClasses';
import { space, useTheme } from '../theme';
import { AppText } from './AppText';
import { conditionParts, formatDay } from './SetupSheetFormat';
import { summaryLines } from './SummaryFigures';

export type PrintHeaderProps = { setup: SetupDetail; units: UnitPreferences };

/** Title, car, conditions, revision and the computed figures, at the top of the pit sheet. */
export function PrintHeader({ setup, units }: PrintHeaderProps) {
  const { colors } = useTheme();
  const conditions = conditionParts(setup.conditions, units);
  const figures = summaryLines(setup.vehicleClass, setup.currentRevision.values, units);
  const unitsLine = `Lengths in ${units.length === 'in' ? 'inches' : 'mm'}, temperatures in °${units.temperature}`;
  return (
    <View style={styles.header}>
      <AppText variant="title" aria-level={1}>
        {setup.title}
      </AppText>
      <AppText>
        {setup.car.nickname} · {setup.car.makerName} {setup.car.kitName} · {vehicleClassLabel(setup.vehicleClass)}
        {setup.car.stock ? ' · stock, no option parts' : ''}
      </AppText>
      <AppText variant="caption">
        Revision {setup.currentRevision.number}, saved {formatDay(setup.currentRevision.createdAt)} · by @{setup.owner.handle} ·{' '}
        {conditions.length > 0 ? conditions.join(' · ') : 'any track and weather'} · {unitsLine}
      </AppText>
      <View style={[styles.figures, { borderColor: colors.border }]} role="list" aria-label="Worked out from this sheet">
        {figures.map((f) =>
          f.state === 'unavailable' ? null : (
            <AppText key={f.key} variant="caption" role="listitem">
              <AppText variant="caption" style={styles.bold}>
                {f.label}:{' '}
              </AppText>
              {f.state === 'value' ? f.text : '—'}
            </AppText>
          ),
        )}
      </View>
    </View>
  );
}

const styles = StyleSheet.create({
  header: { gap: space.xs },
  figures: { flexDirection: 'row', flexWrap: 'wrap', columnGap: space.lg, rowGap: space.xs, borderWidth: 1, padding: space.sm },
  bold: { fontWeight: '700' },
});
