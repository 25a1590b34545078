import { useRef } from 'react';
import { StyleSheet, View, type TextInput } from 'react-native';
import { useForm } from '../hooks/form';
import { signInRequestSchema, type SignInRequest } from '../shared/types/auth';
import { space } from '../theme';
import { Button } from './Button';
import { FormErrorBanner } from './FormErrorBanner';
import { PasswordField } from './PasswordField';
import { TextField } from './TextField';

export type SignInFormProps = {
  onSubmit: (values: SignInRequest) => unknown;
  pending: boolean;
  /** The last failed attempt; field details show beside the fields, the rest in the banner. */
  error: unknown;
  /** A message that arrived in the address, such as a GitHub sign-in that did not complete. */
  notice?: string | null;
};

const INITIAL: SignInRequest = { login: '', password: '' };

/** E-mail or handle plus password. */
export function SignInForm({ onSubmit, pending, error, notice }: SignInFormProps) {
  const form = useForm({ initial: INITIAL, schema: signInRequestSchema, onSubmit, serverError: error, pending });
  const passwordRef = useRef<TextInput>(null);
  const submit = () => void form.submit();
  return (
    <View style={styles.form}>
      <FormErrorBanner message={form.formError ?? notice} />
      <TextField
        label="E-mail or handle"
        value={form.values.login}
        onChangeText={(text) => form.setField('login', text)}
        error={form.fieldErrors.login}
        autoComplete="username"
        textContentType="username"
        autoCapitalize="none"
        autoCorrect={false}
        returnKeyType="next"
        // Enter moves on to the password while it is empty, and signs in once it is filled.
        onSubmitEditing={() => (form.values.password ? submit() : passwordRef.current?.focus())}
      />
      <PasswordField
        label="Password"
        purpose="current"
        inputRef={passwordRef}
        value={form.values.password}
        onChangeText={(text) => form.setField('password', text)}
        error={form.fieldErrors.password}
        returnKeyType="go"
        onSubmitEditing={submit}
      />
      <Button label="Sign in" busyLabel="Signing in…" busy={pending} onPress={submit} />
    </View>
  );
}

const styles = StyleSheet.create({ form: { gap: space.lg } });
