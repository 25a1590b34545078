import { StyleSheet, View } from 'react-native';
import { displayUnitLabel, formatForDisplay, parseFromDisplay } from '../shared/compute/setup';
import type { UnitPreferences } from '../shared/types/auth';
import { GRIP_LEVELS, type SetupConditions } from '../shared/types/setups';
import { TRACK_TYPES, type TrackTypeKey } from '../shared/types/trackTypes';
import { space } from '../theme';
import { ChoiceChips, type ChoiceOption } from './ChoiceChips';
import { TextField } from './TextField';

/** "any" stands for "not set": a setup need not be tied to one surface or grip level. */
export type ConditionsDraft = { trackType: string; temperature: string; grip: string };
export const EMPTY_CONDITIONS: ConditionsDraft = { trackType: 'any', temperature: '', grip: 'any' };

const TRACK_OPTIONS: ChoiceOption<string>[] = [{ value: 'any', label: 'Any surface' }, ...TRACK_TYPES.map((t) => ({ value: t.key, label: t.label }))];
const GRIP_NAMES: Record<(typeof GRIP_LEVELS)[number], string> = { low: 'Low', medium: 'Medium', high: 'High' };
const GRIP_OPTIONS: ChoiceOption<string>[] = [
  { value: 'any', label: 'Not set' },
  ...GRIP_LEVELS.map((g) => ({ value: g, label: GRIP_NAMES[g], spoken: `${GRIP_NAMES[g]} grip` })),
];

// The same bounds as the server's conditions schema, in °C.
const TEMPERATURE_RANGE_C = { min: -30, max: 60 };

/**
 * The draft as the API stores it: temperature converted from the racer's unit to °C (one decimal),
 * or a message for the temperature field when it is not a usable number.
 */
export function conditionsFromDraft(draft: ConditionsDraft, units: UnitPreferences): { conditions: SetupConditions } | { error: string } {
  const text = draft.temperature.trim();
  let temperatureC: number | null = null;
  if (text) {
    const low = formatForDisplay(TEMPERATURE_RANGE_C.min, 'temperature', units).text;
    const high = formatForDisplay(TEMPERATURE_RANGE_C.max, 'temperature', units).text;
    try {
      temperatureC = Math.round(parseFromDisplay(text.replace(',', '.'), 'temperature', units) * 10) / 10;
    } catch {
      return { error: `Type the temperature as a number, such as ${units.temperature === 'F' ? '75' : '24'}.` };
    }
    if (temperatureC < TEMPERATURE_RANGE_C.min || temperatureC > TEMPERATURE_RANGE_C.max) {
      return { error: `Track temperatures go from ${low} to ${high}.` };
    }
  }
  return {
    conditions: {
      trackType: draft.trackType === 'any' ? null : (draft.trackType as TrackTypeKey),
      temperatureC,
      grip: draft.grip === 'any' ? null : (draft.grip as SetupConditions['grip']),
    },
  };
}

export type ConditionsFieldsProps = {
  value: ConditionsDraft;
  onChange: <K extends keyof ConditionsDraft>(field: K, value: ConditionsDraft[K]) => void;
  units: UnitPreferences;
  temperatureError?: string;
  disabled?: boolean;
};

/** Track surface, track temperature in the racer's unit, and grip: what the setup was built for. */
export function ConditionsFields({ value, onChange, units, temperatureError, disabled }: ConditionsFieldsProps) {
  const unit = displayUnitLabel('temperature', units);
  return (
    <View style={styles.group}>
      <ChoiceChips
        label="Track surface"
        options={TRACK_OPTIONS}
        selected={[value.trackType]}
        onChange={([trackType]) => onChange('trackType', trackType)}
        disabled={disabled}
      />
      <TextField
        label={`Track temperature (${unit})`}
        hint="Leave it empty if the setup is not tied to a temperature."
        value={value.temperature}
        onChangeText={(text) => onChange('temperature', text)}
        error={temperatureError}
        keyboardType="numbers-and-punctuation"
        inputMode="decimal"
        editable={!disabled}
        maxLength={6}
      />
      <ChoiceChips
        label="Grip"
        options={GRIP_OPTIONS}
        selected={[value.grip]}
        onChange={([grip]) => onChange('grip', grip)}
        disabled={disabled}
      />
    </View>
  );
}

const styles = StyleSheet.create({
  group: { gap: space.lg },
});
