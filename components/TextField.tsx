import { useState, type ReactNode, type Ref } from 'react';
import { StyleSheet, TextInput, View, type TextInputProps } from 'react-native';
import { layout, radius, space, type as typeScale, useTheme } from '../theme';
import { AppText } from './AppText';

export type TextFieldProps = Omit<TextInputProps, 'style' | 'onChange'> & {
  /** Shown above the input and used as its accessible name. */
  label: string;
  /** A line of guidance under the input, shown while there is no error. */
  hint?: string;
  /** What is wrong with the value; replaces the hint and is announced. */
  error?: string;
  /** Something inside the right edge of the input, such as a show/hide toggle. */
  accessory?: ReactNode;
  /** For moving focus here, e.g. from the field above when Enter is pressed. */
  inputRef?: Ref<TextInput>;
};

/** A labelled text input with its hint or error underneath. */
export function TextField({ label, hint, error, accessory, inputRef, multiline, ...input }: TextFieldProps) {
  const { colors } = useTheme();
  const [focused, setFocused] = useState(false);
  const borderColor = error ? colors.danger : focused ? colors.focus : colors.border;
  return (
    <View style={styles.field}>
      <AppText style={styles.label}>{label}</AppText>
      <View style={[styles.box, { borderColor, backgroundColor: colors.surface }, focused || error ? styles.boxEmphasis : null]}>
        <TextInput
          ref={inputRef}
          aria-label={label}
          accessibilityLabel={label}
          placeholderTextColor={colors.textMuted}
          multiline={multiline}
          {...input}
          onFocus={(e) => {
            setFocused(true);
            input.onFocus?.(e);
          }}
          onBlur={(e) => {
            setFocused(false);
            input.onBlur?.(e);
          }}
          style={[styles.input, typeScale.body, { color: colors.text }, multiline ? styles.multiline : null]}
        />
        {accessory}
      </View>
      {error ? (
        <AppText variant="caption" tone="danger" role="alert">
          {error}
        </AppText>
      ) : hint ? (
        <AppText variant="caption" tone="muted">
          {hint}
        </AppText>
      ) : null}
    </View>
  );
}

const styles = StyleSheet.create({
  field: { gap: space.xs },
  label: { fontWeight: '700' },
  box: { flexDirection: 'row', alignItems: 'center', borderWidth: 1, borderRadius: radius.md },
  // A thicker edge marks focus and errors by more than colour alone.
  boxEmphasis: { borderWidth: 2 },
  input: { flex: 1, minHeight: layout.minTouchTarget, paddingHorizontal: space.md, paddingVertical: space.sm },
  multiline: { minHeight: layout.minTouchTarget * 3, textAlignVertical: 'top' },
});
