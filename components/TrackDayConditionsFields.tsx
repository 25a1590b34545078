import { StyleSheet, View } from 'react-native';
import { GRIP_LABELS, MOISTURE_LABELS } from '../hooks/trackDays';
import { displayUnitLabel, formatForDisplay, parseFromDisplay } from '../shared/compute/setup';
import type { UnitPreferences } from '../shared/types/auth';
import { GRIP_LEVELS } from '../shared/types/setups';
import { SURFACE_MOISTURE, type TrackDayConditions } from '../shared/types/trackdays';
import { space } from '../theme';
import { ChoiceChips, type ChoiceOption } from './ChoiceChips';
import { TextField } from './TextField';

/** The conditions as typed: temperatures in the racer's unit; "none" stands for "not noted". */
export type TrackDayConditionsDraft = { airTemp: string; trackTemp: string; humidity: string; moisture: string; grip: string };
export const EMPTY_TRACK_DAY_CONDITIONS: TrackDayConditionsDraft = { airTemp: '', trackTemp: '', humidity: '', moisture: 'none', grip: 'none' };

export type ConditionsErrors = Partial<Record<'airTemp' | 'trackTemp' | 'humidity', string>>;

const NONE = 'none';
const MOISTURE_OPTIONS: ChoiceOption<string>[] = [
  { value: NONE, label: 'Not noted', spoken: 'Surface moisture not noted' },
  ...SURFACE_MOISTURE.map((m) => ({ value: m, label: MOISTURE_LABELS[m] })),
];
const GRIP_OPTIONS: ChoiceOption<string>[] = [
  { value: NONE, label: 'Not noted', spoken: 'Grip not noted' },
  ...GRIP_LEVELS.map((g) => ({ value: g, label: GRIP_LABELS[g] })),
];

// The same bounds as the API's conditions schema, in °C.
const RANGES_C = { airTemp: { min: -30, max: 60 }, trackTemp: { min: -30, max: 80 } } as const;

/** A temperature typed in the racer's unit as °C with one decimal, null when empty, or what is wrong. */
export function temperatureFromText(
  text: string,
  units: UnitPreferences,
  range: { min: number; max: number },
): { celsius: number | null } | { error: string } {
  const trimmed = text.trim();
  if (!trimmed) return { celsius: null };
  let celsius: number;
  try {
    celsius = Math.round(parseFromDisplay(trimmed.replace(',', '.'), 'temperature', units) * 10) / 10;
  } catch {
    return { error: `Type a number, such as ${units.temperature === 'F' ? '68' : '20'}.` };
  }
  if (celsius < range.min || celsius > range.max) {
    const [low, high] = [range.min, range.max].map((c) => formatForDisplay(c, 'temperature', units).text);
    return { error: `Between ${low} and ${high}.` };
  }
  return { celsius };
}

/** The draft as the API stores it (°C), or a message per field that is not usable. */
export function conditionsFromTrackDayDraft(
  draft: TrackDayConditionsDraft,
  units: UnitPreferences,
): { conditions: TrackDayConditions } | { errors: ConditionsErrors } {
  const errors: ConditionsErrors = {};
  const air = temperatureFromText(draft.airTemp, units, RANGES_C.airTemp);
  const track = temperatureFromText(draft.trackTemp, units, RANGES_C.trackTemp);
  if ('error' in air) errors.airTemp = air.error;
  if ('error' in track) errors.trackTemp = track.error;
  const humidityText = draft.humidity.trim().replace(/\s*%$/, '');
  const humidity = humidityText ? Number(humidityText.replace(',', '.')) : null;
  if (humidity !== null && !(Number.isFinite(humidity) && humidity >= 0 && humidity <= 100)) {
    errors.humidity = 'Humidity is a number from 0 to 100 %.';
  }
  if ('error' in air || 'error' in track || errors.humidity) return { errors };
  return {
    conditions: {
      airTempC: air.celsius,
      trackTempC: track.celsius,
      humidityPct: humidity,
      moisture: draft.moisture === NONE ? null : (draft.moisture as TrackDayConditions['moisture']),
      grip: draft.grip === NONE ? null : (draft.grip as TrackDayConditions['grip']),
    },
  };
}

export type TrackDayConditionsFieldsProps = {
  value: TrackDayConditionsDraft;
  onChange: <K extends keyof TrackDayConditionsDraft>(field: K, value: TrackDayConditionsDraft[K]) => void;
  units: UnitPreferences;
  errors: ConditionsErrors;
  disabled?: boolean;
};

/** Air and track temperature in the racer's unit, humidity, surface moisture and grip; every one optional. */
export function TrackDayConditionsFields({ value, onChange, units, errors, disabled }: TrackDayConditionsFieldsProps) {
  const unit = displayUnitLabel('temperature', units);
  const number = { keyboardType: 'numbers-and-punctuation', inputMode: 'decimal', maxLength: 6, editable: !disabled } as const;
  return (
    <View style={styles.group}>
      <View style={styles.row}>
        <View style={styles.cell}>
          <TextField label={`Track temperature (${unit})`} hint="On the surface, if you measure it." value={value.trackTemp} onChangeText={(t) => onChange('trackTemp', t)} error={errors.trackTemp} {...number} />
        </View>
        <View style={styles.cell}>
          <TextField label={`Air temperature (${unit})`} value={value.airTemp} onChangeText={(t) => onChange('airTemp', t)} error={errors.airTemp} {...number} />
        </View>
      </View>
      <TextField label="Humidity (%)" value={value.humidity} onChangeText={(t) => onChange('humidity', t)} error={errors.humidity} {...number} />
      <ChoiceChips label="Surface moisture" options={MOISTURE_OPTIONS} selected={[value.moisture]} onChange={([m]) => onChange('moisture', m)} disabled={disabled} />
      <ChoiceChips label="Grip" options={GRIP_OPTIONS} selected={[value.grip]} onChange={([g]) => onChange('grip', g)} disabled={disabled} />
    </View>
  );
}

const styles = StyleSheet.create({
  group: { gap: space.lg },
  row: { flexDirection: 'row', flexWrap: 'wrap', gap: space.md },
  cell: { flexGrow: 1, flexBasis: 160 },
});
