import { Pressable, StyleSheet, View } from 'react-native';
import { layout, radius, space, useTheme } from '../theme';
import { AppText } from './AppText';

export type SetupRadioOption<V extends string | number> = { value: V; label: string; description?: string };

export type SetupRadioListProps<V extends string | number> = {
  /** Shown above the choices and used as the group's name. */
  label: string;
  options: readonly SetupRadioOption<V>[];
  value: V | null;
  onChange: (value: V) => void;
  disabled?: boolean;
  error?: string;
};

/**
 * One-of-several choices as full-width rows, each with a line of explanation: for choices whose
 * names alone do not say enough (who can see a setup, which sheet to start from).
 */
export function SetupRadioList<V extends string | number>({ label, options, value, onChange, disabled, error }: SetupRadioListProps<V>) {
  const { colors } = useTheme();
  return (
    <View style={styles.group}>
      <AppText style={styles.bold}>{label}</AppText>
      <View role="radiogroup" aria-label={label} style={styles.options}>
        {options.map((option) => {
          const on = option.value === value;
          return (
            <Pressable
              key={String(option.value)}
              role="radio"
              aria-checked={on}
              aria-disabled={disabled}
              disabled={disabled}
              onPress={() => (on ? undefined : onChange(option.value))}
              style={({ pressed }) => [
                styles.option,
                {
                  borderColor: on ? colors.accent : error ? colors.danger : colors.border,
                  backgroundColor: on ? colors.accentSoft : colors.surface,
                  opacity: disabled ? 0.5 : pressed ? 0.85 : 1,
                },
              ]}
            >
              <View style={[styles.dot, { borderColor: on ? colors.accent : colors.textMuted }]}>
                {on ? <View style={[styles.dotFill, { backgroundColor: colors.accent }]} /> : null}
              </View>
              <View style={styles.text}>
                <AppText style={styles.bold}>{option.label}</AppText>
                {option.description ? (
                  <AppText variant="caption" tone="muted">
                    {option.description}
                  </AppText>
                ) : null}
              </View>
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

const DOT = space.lg + space.xs;

const styles = StyleSheet.create({
  group: { gap: space.xs },
  bold: { fontWeight: '700' },
  options: { gap: space.sm },
  option: {
    minHeight: layout.minTouchTarget,
    flexDirection: 'row',
    alignItems: 'center',
    gap: space.md,
    borderWidth: 1,
    borderRadius: radius.md,
    paddingHorizontal: space.md,
    paddingVertical: space.sm,
  },
  dot: { width: DOT, height: DOT, borderRadius: radius.pill, borderWidth: 2, alignItems: 'center', justifyContent: 'center' },
  dotFill: { width: space.md, height: space.md, borderRadius: radius.pill },
  text: { flex: 1, gap: 2 },
});
