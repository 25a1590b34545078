import { StyleSheet, View } from 'react-native';
import type { UnitPreferences } from '../shared/types/auth';
import type { ForkPreview, StockChoice } from '../shared/types/forks';
import type { VehicleClassKey } from '../shared/types/vehicleClasses';
import { radius, space, useTheme } from '../theme';
import { AppText } from './AppText';
import { Button } from './Button';
import { ChoiceChips } from './ChoiceChips';
import { formatSheetValue } from './LineageValue';

export type ForkOptionPartsProps = {
  parts: ForkPreview['optionParts'];
  /** The class of the car the copy goes onto: its sheet names and units the values. */
  vehicleClass: VehicleClassKey;
  units: UnitPreferences;
  choices: Readonly<Record<string, StockChoice>>;
  onChange: (key: string, choice: StockChoice) => void;
  onSetAll: (choice: StockChoice) => void;
  /** Whether the car is marked stock; only changes the explanation. */
  carIsStock: boolean;
  disabled?: boolean;
};

function OptionPartRow(props: {
  part: ForkPreview['optionParts'][number];
  original: string;
  stock: string;
  choice: StockChoice;
  onChange: (choice: StockChoice) => void;
  disabled?: boolean;
}) {
  const { part, original, stock, choice, onChange, disabled } = props;
  const { colors } = useTheme();
  return (
    <View role="group" aria-label={part.label} style={[styles.row, { borderColor: colors.border }]}>
      <AppText style={styles.bold}>{part.label}</AppText>
      <AppText variant="caption" tone="muted">
        {part.section}
      </AppText>
      <View style={styles.values}>
        <AppText>Original: {original}</AppText>
        <AppText>Your kit’s stock: {stock}</AppText>
      </View>
      <ChoiceChips
        label={`${part.label}: which value to use`}
        hideLabel
        options={[
          { value: 'keep', label: 'Keep original', spoken: `${part.label}: keep the original’s ${original} (I have or will buy the part)` },
          { value: 'stock', label: 'Take stock', spoken: `${part.label}: take the stock ${stock}` },
        ]}
        selected={[choice]}
        onChange={([next]) => onChange(next)}
        disabled={disabled}
      />
    </View>
  );
}

/**
 * Values of the original that need parts the racer's kit does not have in the box: per row, keep the
 * original's value (fit the part) or take the kit's stock value, plus both choices for every row.
 */
export function ForkOptionParts({ parts, vehicleClass, units, choices, onChange, onSetAll, carIsStock, disabled }: ForkOptionPartsProps) {
  const shown = (key: string, value: ForkPreview['optionParts'][number]['value']) => formatSheetValue(vehicleClass, key, value, units) ?? 'not set';
  const keeping = parts.filter((part) => choices[part.key] !== 'stock').length;
  return (
    <View role="region" aria-label="Option parts" style={styles.section}>
      <AppText variant="heading">Option parts</AppText>
      <AppText tone="muted">
        {carIsStock
          ? 'This setup uses parts that do not come in your kit’s box. Your car is marked stock, so each starts on the stock value; keep the original’s value where you will fit the part.'
          : 'This setup uses parts that do not come in your kit’s box. Each keeps the original’s value; take the stock value for any part you do not have.'}
      </AppText>
      <View style={styles.buttons}>
        <Button label="Keep all" variant="secondary" onPress={() => onSetAll('keep')} disabled={disabled} />
        <Button label="Take all stock values" variant="secondary" onPress={() => onSetAll('stock')} disabled={disabled} />
      </View>
      <AppText variant="caption" tone="muted" role="status" aria-live="polite">
        Keeping {keeping} of {parts.length} · taking stock for {parts.length - keeping}
      </AppText>
      {parts.map((part) => (
        <OptionPartRow
          key={part.key}
          part={part}
          original={shown(part.key, part.value)}
          stock={shown(part.key, part.stockValue)}
          choice={choices[part.key] ?? 'keep'}
          onChange={(choice) => onChange(part.key, choice)}
          disabled={disabled}
        />
      ))}
    </View>
  );
}

const styles = StyleSheet.create({
  section: { gap: space.sm },
  buttons: { flexDirection: 'row', flexWrap: 'wrap', gap: space.sm },
  row: { borderWidth: 1, borderRadius: radius.md, padding: space.md, gap: space.xs },
  values: { gap: 2 },
  bold: { fontWeight: '700' },
});
