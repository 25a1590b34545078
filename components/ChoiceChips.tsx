import { Pressable, StyleSheet, View } from 'react-native';
import { layout, radius, space, useTheme } from '../theme';
import { AppText } from './AppText';

export type ChoiceOption<V extends string> = { value: V; label: string; /** Spoken instead of the label. */ spoken?: string };

export type ChoiceChipsProps<V extends string> = {
  /** Names the group for screen readers, and is shown above it unless `hideLabel`. */
  label: string;
  hideLabel?: boolean;
  options: readonly ChoiceOption<V>[];
  /** The chosen values; with `multiple` false exactly one is expected. */
  selected: readonly V[];
  /** Toggle chips (any number) or one-of-a-kind chips (radio buttons). */
  multiple?: boolean;
  onChange: (selected: V[]) => void;
  disabled?: boolean;
  error?: string;
};

/** Pill-shaped choices: toggles for "any of these", radio buttons for "one of these". */
export function ChoiceChips<V extends string>(props: ChoiceChipsProps<V>) {
  const { label, hideLabel, options, selected, multiple, onChange, disabled, error } = props;
  const { colors } = useTheme();
  const press = (value: V) => {
    if (!multiple) {
      if (!selected.includes(value)) onChange([value]);
      return;
    }
    onChange(selected.includes(value) ? selected.filter((v) => v !== value) : [...selected, value]);
  };
  return (
    <View style={styles.group}>
      {hideLabel ? null : <AppText style={styles.label}>{label}</AppText>}
      <View role={multiple ? 'group' : 'radiogroup'} aria-label={label} style={styles.row}>
        {options.map((option) => {
          const on = selected.includes(option.value);
          return (
            <Pressable
              key={option.value}
              role={multiple ? 'checkbox' : 'radio'}
              aria-checked={on}
              aria-label={option.spoken ?? option.label}
              aria-disabled={disabled}
              disabled={disabled}
              onPress={() => press(option.value)}
              style={({ pressed }) => [
                styles.chip,
                {
                  backgroundColor: on ? colors.accent : colors.surface,
                  borderColor: on ? colors.accent : colors.border,
                  opacity: disabled ? 0.5 : pressed ? 0.85 : 1,
                },
              ]}
            >
              <AppText style={{ color: on ? colors.accentText : colors.text, fontWeight: on ? '700' : '400' }}>
                {on && multiple ? '✓ ' : ''}
                {option.label}
              </AppText>
            </Pressable>
          );
        })}
      </View>
      {error ? (
        <AppText variant="caption" tone="danger" role="alert">
          {error}
        </AppText>
      ) : null}
    </View>
  );
}

const styles = StyleSheet.create({
  group: { gap: space.xs },
  label: { fontWeight: '700' },
  row: { flexDirection: 'row', flexWrap: 'wrap', gap: space.sm },
  chip: {
    minHeight: layout.minTouchTarget,
    minWidth: layout.minTouchTarget,
    paddingHorizontal: space.lg,
    borderRadius: radius.pill,
    borderWidth: 1,
    alignItems: 'center',
    justifyContent: 'center',
  },
});
