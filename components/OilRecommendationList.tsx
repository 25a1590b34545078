import { StyleSheet, View } from 'react-native';
import {
  DIFF_OIL_GRADES_CST,
  SHOCK_OIL_GRADES_CST,
  STANDARD_OIL_GRADES_CST,
  TrackdayInputError,
  recommendOilForTemperature,
  type OilForTemperatureRecommendation,
} from '../shared/compute/trackday';
import type { StoredSetupValues } from '../shared/types/setups';
import { getTemplate, listFields } from '../shared/types/templates';
import type { VehicleClassKey } from '../shared/types/vehicleClasses';
import { space, useTheme } from '../theme';
import { AppText } from './AppText';

/** A silicone oil on the sheet: a shock or diff field in cSt holding a value. */
export type SheetOil = { key: string; label: string; kind: 'shock' | 'diff'; gradeCst: number };

/** The sheet's oils in sheet order. */
export function sheetOils(vehicleClass: VehicleClassKey, values: StoredSetupValues): SheetOil[] {
  return listFields(getTemplate(vehicleClass)).flatMap((field) => {
    const value = Object.prototype.hasOwnProperty.call(values, field.key) ? values[field.key] : undefined;
    if ((field.type !== 'number' && field.type !== 'integer') || field.unit !== 'cSt') return [];
    if (typeof value !== 'number' || !Number.isFinite(value) || value <= 0) return [];
    return [{ key: field.key, label: field.label, kind: field.key.startsWith('shock.') ? 'shock' : 'diff', gradeCst: value }];
  });
}

/**
 * Grades to pick from: shock oils in their 50 cSt steps, diff oils in theirs; an oil outside its
 * usual list (a 1,200 cSt shock oil, a 700 cSt diff) snaps to every standard grade instead.
 */
export function oilGradesFor(oil: SheetOil): readonly number[] {
  const list = oil.kind === 'shock' ? SHOCK_OIL_GRADES_CST : DIFF_OIL_GRADES_CST;
  return oil.gradeCst >= list[0] && oil.gradeCst <= list[list.length - 1] ? list : STANDARD_OIL_GRADES_CST;
}

export type OilAdvice = { oil: SheetOil } & ({ recommendation: OilForTemperatureRecommendation } | { error: string });

/** Both answers for every oil on the sheet; an oil the model cannot place gets its message instead. */
export function adviseOils(oils: readonly SheetOil[], referenceC: number, todayC: number, fraction: number): OilAdvice[] {
  return oils.map((oil) => {
    try {
      const recommendation = recommendOilForTemperature({
        setupGradeCst: oil.gradeCst,
        setupTemperatureC: referenceC,
        todayTemperatureC: todayC,
        compensationFraction: fraction,
        availableGradesCst: oilGradesFor(oil),
      });
      return { oil, recommendation };
    } catch (err) {
      if (!(err instanceof TrackdayInputError)) throw err;
      return { oil, error: err.message.charAt(0).toUpperCase() + err.message.slice(1) + '.' };
    }
  });
}

export function cst(value: number): string {
  return `${Math.round(value).toLocaleString('en')} cSt`;
}

export type OilRecommendationListProps = { advice: readonly OilAdvice[]; fractionLabel: string };

function AdviceRow({ item, fractionLabel, first }: { item: OilAdvice; fractionLabel: string; first: boolean }) {
  const { colors } = useTheme();
  return (
    <View role="listitem" style={[styles.row, first ? null : { borderTopWidth: 1, borderColor: colors.border }]}>
      <AppText style={styles.bold}>
        {item.oil.label}: {cst(item.oil.gradeCst)} on the sheet
      </AppText>
      {'error' in item ? (
        <AppText tone="danger">{item.error}</AppText>
      ) : (
        <>
          <AppText>
            Racers’ practice ({fractionLabel}): <AppText style={styles.bold}>{cst(item.recommendation.partialCompensation.nearestGradeCst)}</AppText>
          </AppText>
          <AppText>
            Full compensation: <AppText style={styles.bold}>{cst(item.recommendation.fullCompensation.nearestGradeCst)}</AppText>
          </AppText>
          <AppText variant="caption" tone="muted">
            The sheet’s oil was {cst(item.recommendation.setupViscosityThenCst)} then and is {cst(item.recommendation.setupViscosityTodayCst)} today. Exact model
            answers: {cst(item.recommendation.partialCompensation.exactGradeCst)} and {cst(item.recommendation.fullCompensation.exactGradeCst)}, rounded to the
            nearest grade sold.
          </AppText>
        </>
      )}
    </View>
  );
}

/** Per oil on the sheet: what it is, the racers' half-way answer and the full-compensation answer. */
export function OilRecommendationList({ advice, fractionLabel }: OilRecommendationListProps) {
  return (
    <View role="list" aria-label="Oils for today">
      {advice.map((item, i) => (
        <AdviceRow key={item.oil.key} item={item} fractionLabel={fractionLabel} first={i === 0} />
      ))}
    </View>
  );
}

const styles = StyleSheet.create({
  row: { paddingVertical: space.sm, gap: space.xs },
  bold: { fontWeight: '700' },
});
