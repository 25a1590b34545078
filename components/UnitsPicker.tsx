import { StyleSheet, View } from 'react-native';
import type { UnitPreferences } from '../shared/types/auth';
import { space } from '../theme';
import { ChoiceChips, type ChoiceOption } from './ChoiceChips';

export type UnitsPickerProps = {
  value: UnitPreferences;
  onChange: (value: UnitPreferences) => void;
  disabled?: boolean;
};

const LENGTHS: readonly ChoiceOption<UnitPreferences['length']>[] = [
  { value: 'mm', label: 'mm', spoken: 'Millimetres' },
  { value: 'in', label: 'in', spoken: 'Inches' },
];

const TEMPERATURES: readonly ChoiceOption<UnitPreferences['temperature']>[] = [
  { value: 'C', label: '°C', spoken: 'Degrees Celsius' },
  { value: 'F', label: '°F', spoken: 'Degrees Fahrenheit' },
];

/** Which units setup sheets show lengths and temperatures in. */
export function UnitsPicker({ value, onChange, disabled }: UnitsPickerProps) {
  return (
    <View style={styles.row}>
      <ChoiceChips
        label="Lengths"
        options={LENGTHS}
        selected={[value.length]}
        onChange={([length]) => onChange({ ...value, length })}
        disabled={disabled}
      />
      <ChoiceChips
        label="Temperatures"
        options={TEMPERATURES}
        selected={[value.temperature]}
        onChange={([temperature]) => onChange({ ...value, temperature })}
        disabled={disabled}
      />
    </View>
  );
}

const styles = StyleSheet.create({
  row: { flexDirection: 'row', flexWrap: 'wrap', gap: space.xl },
});
