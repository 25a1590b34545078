import { ActivityIndicator, Pressable, StyleSheet } from 'react-native';
import { pillStyles, space, useTheme } from '../theme';
import { AppText } from './AppText';

export type ButtonProps = {
  label: string;
  onPress: () => void;
  /** Danger is for actions that end sessions or take something away. */
  variant?: 'primary' | 'secondary' | 'danger';
  disabled?: boolean;
  /** While a request is out: shows a spinner and `busyLabel`, and ignores presses. */
  busy?: boolean;
  busyLabel?: string;
  /** Spoken instead of the label when the label alone is ambiguous. */
  accessibilityLabel?: string;
};

export function Button({ label, onPress, variant = 'primary', disabled, busy, busyLabel, accessibilityLabel }: ButtonProps) {
  const { colors } = useTheme();
  const filled = variant === 'primary';
  const tint = variant === 'danger' ? colors.danger : colors.accent;
  const inactive = disabled || busy;
  const shown = busy && busyLabel ? busyLabel : label;
  return (
    <Pressable
      role="button"
      aria-label={busy && busyLabel ? busyLabel : (accessibilityLabel ?? label)}
      aria-disabled={inactive}
      aria-busy={busy}
      disabled={inactive}
      onPress={onPress}
      style={({ pressed }) => [
        styles.button,
        {
          backgroundColor: filled ? tint : colors.surface,
          borderColor: tint,
          opacity: disabled ? 0.5 : pressed ? 0.85 : 1,
        },
      ]}
    >
      {/* The button's name says it is busy (busyLabel); the spinner is decoration. */}
      {busy ? <ActivityIndicator size="small" color={filled ? colors.accentText : tint} aria-hidden /> : null}
      <AppText variant="body" style={[styles.label, { color: filled ? colors.accentText : tint }]}>
        {shown}
      </AppText>
    </Pressable>
  );
}

const styles = StyleSheet.create({
  // A spinner sits beside the label while busy.
  button: { ...pillStyles.button, flexDirection: 'row', gap: space.sm },
  label: pillStyles.label,
});
