import { Pressable, StyleSheet, View } from 'react-native';
import type { ChoiceOption } from '../shared/types/templates';
import { layout, radius, space, useTheme } from '../theme';
import { AppText } from './AppText';

export type FieldChoicePickerProps = {
  /** Names the group for screen readers; the field row shows it on screen. */
  label: string;
  options: readonly ChoiceOption[];
  value: string | undefined;
  onChange: (value: string) => void;
};

/**
 * The template's options as one-of-a-kind chips, shown by their labels. Unlike ChoiceChips a chip
 * never grows wider than its column, so long labels ("Emulsion (oil and air mixed)") wrap instead
 * of spilling over the rear half of a pair.
 */
export function FieldChoicePicker({ label, options, value, onChange }: FieldChoicePickerProps) {
  const { colors } = useTheme();
  return (
    <View role="radiogroup" aria-label={label} style={styles.row}>
      {options.map((option) => {
        const on = option.value === value;
        return (
          <Pressable
            key={option.value}
            role="radio"
            aria-checked={on}
            aria-label={option.label}
            onPress={() => onChange(option.value)}
            style={({ pressed }) => [
              styles.chip,
              { backgroundColor: on ? colors.accent : colors.surface, borderColor: on ? colors.accent : colors.border, opacity: pressed ? 0.85 : 1 },
            ]}
          >
            <AppText style={{ color: on ? colors.accentText : colors.text, fontWeight: on ? '700' : '400', textAlign: 'center' }}>
              {option.label}
            </AppText>
          </Pressable>
        );
      })}
    </View>
  );
}

const styles = StyleSheet.create({
  row: { flexDirection: 'row', flexWrap: 'wrap', gap: space.sm },
  chip: {
    minHeight: layout.minTouchTarget,
    minWidth: layout.minTouchTarget,
    maxWidth: '100%',
    paddingHorizontal: space.lg,
    paddingVertical: space.xs,
    borderRadius: radius.lg,
    borderWidth: 1,
    alignItems: 'center',
    justifyContent: 'center',
  },
});
