import { useState } from 'react';
import { StyleSheet, View } from 'react-native';
import { useDisplayUnits } from '../hooks/garageUi';
import { displayUnitLabel, formatForDisplay } from '../shared/compute/setup';
import { DEFAULT_COMPENSATION_FRACTION, TYPICAL_SILICONE_VTC, siliconeViscosityAt } from '../shared/compute/trackday';
import type { StoredSetupValues } from '../shared/types/setups';
import type { VehicleClassKey } from '../shared/types/vehicleClasses';
import { radius, space, useTheme } from '../theme';
import { AppText } from './AppText';
import { Card } from './Card';
import { ChartOilCurve } from './ChartOilCurve';
import { ChoiceChips } from './ChoiceChips';
import { OilRecommendationList, adviseOils, sheetOils, type OilAdvice } from './OilRecommendationList';
import { TextField } from './TextField';
import { temperatureFromText } from './TrackDayConditionsFields';

export type OilsForTodayProps = {
  vehicleClass: VehicleClassKey;
  values: StoredSetupValues;
  /** The track temperature the setup was tuned at (its conditions), °C; null asks the racer for it. */
  referenceTempC: number | null;
};

/** The track temperatures the oil model answers for, °C. */
const MODEL_RANGE_C = { min: -30, max: 70 };

const FRACTIONS = [
  { value: '0', label: 'None' },
  { value: '0.25', label: 'A quarter' },
  { value: '0.5', label: 'Half (usual)' },
  { value: '0.75', label: 'Three quarters' },
  { value: '1', label: 'Full' },
] as const;

function fractionLabel(fraction: number): string {
  return `${Math.round(fraction * 100)} % of the way`;
}

function Cautions() {
  const { colors } = useTheme();
  const lines = [
    'A starting point, not an answer: run it in practice and go back toward the sheet’s oil if the car feels wrong.',
    'Shocks heat up while they work, so the oil inside runs warmer than the air and the track.',
    'Grades from different makers are not always alike; a change of brand can matter as much as a step of oil.',
  ];
  return (
    <View role="note" aria-label="Before you change oil" style={[styles.note, { backgroundColor: colors.cautionSoft, borderColor: colors.caution }]}>
      <AppText variant="heading" aria-level={3} style={{ color: colors.caution }}>
        Before you change oil
      </AppText>
      <View role="list">
        {lines.map((line) => (
          <AppText key={line} role="listitem" style={{ color: colors.text }}>
            • {line}
          </AppText>
        ))}
      </View>
    </View>
  );
}

function OilChart({ advice, referenceC, todayC, units }: { advice: OilAdvice[]; referenceC: number; todayC: number; units: ReturnType<typeof useDisplayUnits> }) {
  const [picked, setPicked] = useState<string | null>(null);
  const usable = advice.filter((a): a is Extract<OilAdvice, { recommendation: unknown }> => 'recommendation' in a);
  if (usable.length === 0) return null;
  const shown = usable.find((a) => a.oil.key === picked) ?? usable[0];
  const practice = shown.recommendation.partialCompensation.nearestGradeCst;
  const fromC = Math.max(MODEL_RANGE_C.min, Math.min(referenceC, todayC, 0) - 5);
  const toC = Math.min(MODEL_RANGE_C.max, Math.max(referenceC, todayC, 40) + 5);
  const temperature = (c: number) => formatForDisplay(c, 'temperature', units).text;
  const curves = [{ name: `${shown.oil.label}, ${shown.oil.gradeCst} cSt (the sheet)`, gradeCst: shown.oil.gradeCst }];
  if (practice !== shown.oil.gradeCst) curves.push({ name: `${practice} cSt (racers’ practice today)`, gradeCst: practice });
  const markers = [
    { label: `The sheet’s oil at ${temperature(referenceC)}`, temperatureC: referenceC, viscosityCst: shown.recommendation.setupViscosityThenCst },
    { label: `The sheet’s oil today at ${temperature(todayC)}`, temperatureC: todayC, viscosityCst: shown.recommendation.setupViscosityTodayCst },
    { label: `${practice} cSt today`, temperatureC: todayC, viscosityCst: siliconeViscosityAt(practice, todayC) },
  ];
  return (
    <View style={styles.group}>
      <AppText variant="heading" aria-level={3}>
        How the oil thins as it warms
      </AppText>
      {usable.length > 1 ? (
        <ChoiceChips label="Oil to draw" options={usable.map((a) => ({ value: a.oil.key, label: a.oil.label }))} selected={[shown.oil.key]} onChange={([key]) => setPicked(key)} />
      ) : null}
      <ChartOilCurve curves={curves} fromC={fromC} toC={toC} markers={markers} units={units} />
      <AppText variant="caption" tone="muted">
        The model: the ASTM D341 (Walther) viscosity–temperature line, log log(ν + 0.7) = A − B log T, with each grade rated at 25 °C and
        the slope of a silicone oil whose viscosity-temperature coefficient is {TYPICAL_SILICONE_VTC} (a typical data-sheet figure for
        silicone fluids, quoted from memory rather than from a named source).
      </AppText>
    </View>
  );
}

/**
 * "Oils for today": the sheet's shock and diff oils moved to today's track temperature, with the
 * full-compensation answer and the racers' part-way answer side by side, and the model's curve.
 */
export function OilsForToday({ vehicleClass, values, referenceTempC }: OilsForTodayProps) {
  const units = useDisplayUnits();
  const unit = displayUnitLabel('temperature', units);
  const [todayText, setTodayText] = useState('');
  // null shows the setup's own temperature in whatever unit the racer reads (units may load after the first render).
  const [editedReference, setReferenceText] = useState<string | null>(null);
  const referenceText = editedReference ?? (referenceTempC === null ? '' : String(formatForDisplay(referenceTempC, 'temperature', units).value));
  const [fraction, setFraction] = useState(DEFAULT_COMPENSATION_FRACTION);
  const oils = sheetOils(vehicleClass, values);
  const today = temperatureFromText(todayText, units, MODEL_RANGE_C);
  // Untouched, the setup's own °C is used as stored rather than read back from its rounded display.
  const reference = editedReference === null && referenceTempC !== null ? { celsius: referenceTempC } : temperatureFromText(referenceText, units, MODEL_RANGE_C);
  const ready = 'celsius' in today && today.celsius !== null && 'celsius' in reference && reference.celsius !== null;
  const advice = ready ? adviseOils(oils, reference.celsius!, today.celsius!, fraction) : [];
  return (
    <Card role="region" aria-label="Oils for today">
      <AppText variant="heading">Oils for today</AppText>
      <AppText tone="muted">Silicone oil thins as it warms. Type today’s track temperature for the oils that keep the car feeling the way this sheet does.</AppText>
      {oils.length === 0 ? (
        <AppText>This sheet has no shock or diff oil filled in: fill in the oils to see what to run today.</AppText>
      ) : (
        <>
          <View style={styles.fields}>
            <View style={styles.field}>
              <TextField label={`Today’s track temperature (${unit})`} value={todayText} onChangeText={setTodayText} error={'error' in today ? today.error : undefined} keyboardType="numbers-and-punctuation" inputMode="decimal" maxLength={6} />
            </View>
            <View style={styles.field}>
              <TextField
                label={`Track temperature the sheet was tuned at (${unit})`}
                hint={referenceTempC === null ? 'The setup has no temperature in its conditions: type the one it worked at.' : 'From the setup’s conditions.'}
                value={referenceText}
                onChangeText={setReferenceText}
                error={'error' in reference ? reference.error : undefined}
                keyboardType="numbers-and-punctuation"
                inputMode="decimal"
                maxLength={6}
              />
            </View>
          </View>
          <ChoiceChips label="How far to compensate" options={FRACTIONS} selected={[String(fraction)]} onChange={([f]) => setFraction(Number(f))} />
          <AppText variant="caption" tone="muted">
            Full compensation picks the grade that is as thick today as the sheet’s oil was when the setup worked. Racers usually go only part of
            the way — half by default, measured in log viscosity — because shocks warm up as they work and a little more damping in the cold is
            accepted.
          </AppText>
          {ready ? <OilRecommendationList advice={advice} fractionLabel={fractionLabel(fraction)} /> : <AppText tone="muted">Type both temperatures to see the oils.</AppText>}
          {ready ? <OilChart advice={advice} referenceC={reference.celsius!} todayC={today.celsius!} units={units} /> : null}
        </>
      )}
      <Cautions />
    </Card>
  );
}

const styles = StyleSheet.create({
  group: { gap: space.sm },
  fields: { flexDirection: 'row', flexWrap: 'wrap', gap: space.md },
  field: { flexGrow: 1, flexBasis: 220 },
  note: { borderWidth: 1, borderLeftWidth: space.xs, borderRadius: radius.md, padding: space.md, gap: space.sm },
});
