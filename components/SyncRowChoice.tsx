import { StyleSheet, View } from 'react-native';
import type { SyncChoice } from '../hooks/forks';
import type { UpstreamRow } from '../shared/types/forks';
import { space } from '../theme';
import { ChoiceChips } from './ChoiceChips';
import { SyncCheckbox } from './SyncCheckbox';

export type SyncRowChoiceProps = {
  row: UpstreamRow;
  choice: SyncChoice;
  onChange: (change: Partial<SyncChoice>) => void;
  disabled?: boolean;
};

/**
 * What to do with one field the original changed: a "Take" box when only the original changed it,
 * "Take theirs" or "Keep mine" when both did; and "Don't offer again" for either.
 */
export function SyncRowChoice({ row, choice, onChange, disabled }: SyncRowChoiceProps) {
  return (
    <View style={styles.controls}>
      {row.status === 'theirs-only' ? (
        <SyncCheckbox
          label="Take"
          accessibilityLabel={`Take the original’s ${row.label}`}
          checked={choice.take}
          onChange={(take) => onChange({ take })}
          disabled={disabled}
        />
      ) : (
        <ChoiceChips
          label={`${row.label}: which value to keep`}
          hideLabel
          options={[
            { value: 'theirs', label: 'Take theirs', spoken: `${row.label}: take theirs` },
            { value: 'mine', label: 'Keep mine', spoken: `${row.label}: keep mine` },
          ]}
          selected={[choice.take ? 'theirs' : 'mine']}
          onChange={([picked]) => onChange({ take: picked === 'theirs' })}
          disabled={disabled}
        />
      )}
      <SyncCheckbox
        label="Don’t offer again"
        accessibilityLabel={`Don’t offer ${row.label} again`}
        checked={choice.dismiss}
        onChange={(dismiss) => onChange({ dismiss })}
        disabled={disabled}
      />
    </View>
  );
}

const styles = StyleSheet.create({
  controls: { gap: space.xs },
});
