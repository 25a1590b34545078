import { Pressable, StyleSheet, View } from 'react-native';
import { layout, radius, space, useTheme } from '../theme';
import { AppText } from './AppText';

export type CarStockCheckboxProps = { checked: boolean; onChange: (checked: boolean) => void; disabled?: boolean };

/** The "as it came in the box" flag, explained, since it changes what others can copy from you. */
export function CarStockCheckbox({ checked, onChange, disabled }: CarStockCheckboxProps) {
  const { colors } = useTheme();
  return (
    <Pressable
      role="checkbox"
      aria-checked={checked}
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
      <View style={styles.text}>
        <AppText style={styles.label}>Stock: no option parts fitted</AppText>
        <AppText variant="caption" tone="muted">
          Tick this if the car is just as it came in the box. Its setups then show that anyone with the same kit can copy
          them without buying extra parts.
        </AppText>
      </View>
    </Pressable>
  );
}

const BOX = space.xl;

const styles = StyleSheet.create({
  row: { minHeight: layout.minTouchTarget, flexDirection: 'row', alignItems: 'center', gap: space.md, paddingVertical: space.xs },
  box: { width: BOX, height: BOX, borderWidth: 2, borderRadius: radius.sm, alignItems: 'center', justifyContent: 'center' },
  tick: { fontWeight: '700' },
  text: { flex: 1, gap: 2 },
  label: { fontWeight: '700' },
});
