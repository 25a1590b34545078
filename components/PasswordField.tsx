import { useState } from 'react';
import { Pressable, StyleSheet } from 'react-native';
import { layout, space } from '../theme';
import { AppText } from './AppText';
import { TextField, type TextFieldProps } from './TextField';

export type PasswordFieldProps = Omit<TextFieldProps, 'secureTextEntry' | 'accessory' | 'autoComplete' | 'textContentType'> & {
  /** "new" for choosing a password (managers offer to generate one), "current" for typing one. */
  purpose: 'new' | 'current';
};

/** A password input whose characters can be shown to check for typos. */
export function PasswordField({ purpose, label, ...rest }: PasswordFieldProps) {
  const [visible, setVisible] = useState(false);
  const toggle = (
    <Pressable
      role="button"
      aria-label={visible ? `Hide ${label.toLowerCase()}` : `Show ${label.toLowerCase()}`}
      onPress={() => setVisible((v) => !v)}
      style={styles.toggle}
      hitSlop={space.xs}
    >
      <AppText tone="accent" style={styles.toggleText}>
        {visible ? 'Hide' : 'Show'}
      </AppText>
    </Pressable>
  );
  return (
    <TextField
      {...rest}
      label={label}
      secureTextEntry={!visible}
      autoCapitalize="none"
      autoCorrect={false}
      autoComplete={purpose === 'new' ? 'new-password' : 'current-password'}
      textContentType={purpose === 'new' ? 'newPassword' : 'password'}
      accessory={toggle}
    />
  );
}

const styles = StyleSheet.create({
  toggle: {
    minHeight: layout.minTouchTarget,
    minWidth: layout.minTouchTarget + space.lg,
    paddingHorizontal: space.md,
    alignItems: 'center',
    justifyContent: 'center',
  },
  toggleText: { fontWeight: '700' },
});
