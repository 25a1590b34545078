import { StyleSheet, TextInput, View } from 'react-native';
import { layout, radius, space, type as typeScale, useTheme } from '../theme';
import { AppText } from './AppText';

export type FieldTextInputProps = {
  label: string;
  value: string;
  maxLength: number;
  onChangeText: (text: string) => void;
  invalid?: boolean;
};

/** A short free-text setting (spring marking, tire insert), with a count toward its limit. */
export function FieldTextInput({ label, value, maxLength, onChangeText, invalid }: FieldTextInputProps) {
  const { colors } = useTheme();
  return (
    <View style={styles.field}>
      <TextInput
        aria-label={label}
        aria-invalid={invalid}
        value={value}
        maxLength={maxLength}
        onChangeText={onChangeText}
        style={[
          styles.input,
          typeScale.body,
          { color: colors.text, backgroundColor: colors.surface, borderColor: invalid ? colors.danger : colors.border },
        ]}
      />
      <AppText variant="caption" tone="muted" style={styles.count}>
        {value.length} of {maxLength} characters
      </AppText>
    </View>
  );
}

const styles = StyleSheet.create({
  field: { gap: space.xs },
  input: { minHeight: layout.minTouchTarget, borderWidth: 1, borderRadius: radius.md, paddingHorizontal: space.md },
  count: { alignSelf: 'flex-end' },
});
