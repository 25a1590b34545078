import { Pressable, StyleSheet, View } from 'react-native';
import { layout, radius, space, useTheme } from '../theme';
import { AppText } from './AppText';

export type FieldHolePickerProps = {
  /** Names the group ("Front shock tower hole"). */
  label: string;
  min: number;
  max: number;
  value: number | undefined;
  onChange: (hole: number) => void;
};

/** One numbered button per hole, the way the holes sit on the part. */
export function FieldHolePicker({ label, min, max, value, onChange }: FieldHolePickerProps) {
  const { colors } = useTheme();
  const holes = Array.from({ length: max - min + 1 }, (_, i) => min + i);
  return (
    <View role="radiogroup" aria-label={label} style={styles.row}>
      {holes.map((hole) => {
        const on = hole === value;
        return (
          <Pressable
            key={hole}
            role="radio"
            aria-checked={on}
            aria-label={`Hole ${hole}`}
            onPress={() => onChange(hole)}
            style={({ pressed }) => [
              styles.hole,
              {
                backgroundColor: on ? colors.accent : colors.surface,
                borderColor: on ? colors.accent : colors.border,
                opacity: pressed ? 0.85 : 1,
              },
            ]}
          >
            <AppText style={{ color: on ? colors.accentText : colors.text, fontWeight: on ? '700' : '400' }}>{hole}</AppText>
          </Pressable>
        );
      })}
    </View>
  );
}

const styles = StyleSheet.create({
  row: { flexDirection: 'row', flexWrap: 'wrap', gap: space.xs },
  hole: {
    width: layout.minTouchTarget,
    height: layout.minTouchTarget,
    borderRadius: radius.pill,
    borderWidth: 1,
    alignItems: 'center',
    justifyContent: 'center',
  },
});
