import { Pressable, StyleSheet, View } from 'react-native';
import { layout, radius, space, useTheme } from '../theme';
import { AppText } from './AppText';

export type SyncCheckboxProps = {
  /** Shown beside the box. */
  label: string;
  /** Spoken instead of the label, to say which field the box is for. */
  accessibilityLabel?: string;
  checked: boolean;
  onChange: (checked: boolean) => void;
  disabled?: boolean;
};

/** A labelled tick box with a full-size touch target. */
export function SyncCheckbox({ label, accessibilityLabel, checked, onChange, disabled }: SyncCheckboxProps) {
  const { colors } = useTheme();
  return (
    <Pressable
      role="checkbox"
      aria-checked={checked}
      aria-label={accessibilityLabel ?? label}
      aria-disabled={disabled}
      disabled={disabled}
      onPress={() => onChange(!checked)}
      style={({ pressed }) => [styles.row, { opacity: disabled ? 0.5 : pressed ? 0.85 : 1 }]}
    >
      <View style={[styles.box, { borderColor: checked ? colors.accent : colors.textMuted, backgroundColor: checked ? colors.accent : colors.surface }]}>
        {checked ? (
          <AppText aria-hidden style={[styles.tick, { color: colors.accentText }]}>
            ✓
          </AppText>
        ) : null}
      </View>
      <AppText>{label}</AppText>
    </Pressable>
  );
}

const BOX = space.xl;

const styles = StyleSheet.create({
  row: { minHeight: layout.minTouchTarget, flexDirection: 'row', alignItems: 'center', gap: space.sm, alignSelf: 'flex-start' },
  box: { width: BOX, height: BOX, borderWidth: 2, borderRadius: radius.sm, alignItems: 'center', justifyContent: 'center' },
  tick: { fontWeight: '700' },
});
