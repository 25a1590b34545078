import { useRef } from 'react';
import { StyleSheet, View, type TextInput } from 'react-native';
import { useForm } from '../hooks/form';
import { PASSWORD_MIN_LENGTH, signUpRequestSchema, type SignUpRequest } from '../shared/types/auth';
import { space } from '../theme';
import { Button } from './Button';
import { FormErrorBanner } from './FormErrorBanner';
import { PasswordField } from './PasswordField';
import { TextField } from './TextField';

export type SignUpFormProps = {
  onSubmit: (values: SignUpRequest) => unknown;
  pending: boolean;
  error: unknown;
};

const INITIAL: SignUpRequest = { handle: '', displayName: '', email: '', password: '' };

/** Handle, display name, e-mail address and password for a new account. */
export function SignUpForm({ onSubmit, pending, error }: SignUpFormProps) {
  const form = useForm({ initial: INITIAL, schema: signUpRequestSchema, onSubmit, serverError: error, pending });
  const nameRef = useRef<TextInput>(null);
  const emailRef = useRef<TextInput>(null);
  const passwordRef = useRef<TextInput>(null);
  const submit = () => void form.submit();
  return (
    <View style={styles.form}>
      <FormErrorBanner message={form.formError} />
      <TextField
        label="Handle"
        hint="Your page's address: 3–30 letters, digits, - or _."
        value={form.values.handle}
        onChangeText={(text) => form.setField('handle', text)}
        error={form.fieldErrors.handle}
        autoComplete="username"
        textContentType="username"
        autoCapitalize="none"
        autoCorrect={false}
        returnKeyType="next"
        onSubmitEditing={() => nameRef.current?.focus()}
      />
      <TextField
        label="Display name"
        hint="How other racers see you, e.g. your name or club nickname."
        inputRef={nameRef}
        value={form.values.displayName}
        onChangeText={(text) => form.setField('displayName', text)}
        error={form.fieldErrors.displayName}
        autoComplete="nickname"
        textContentType="nickname"
        returnKeyType="next"
        onSubmitEditing={() => emailRef.current?.focus()}
      />
      <TextField
        label="E-mail address"
        hint="We send a link to check it is yours."
        inputRef={emailRef}
        value={form.values.email}
        onChangeText={(text) => form.setField('email', text)}
        error={form.fieldErrors.email}
        autoComplete="email"
        textContentType="emailAddress"
        keyboardType="email-address"
        autoCapitalize="none"
        autoCorrect={false}
        returnKeyType="next"
        onSubmitEditing={() => passwordRef.current?.focus()}
      />
      <PasswordField
        label="Password"
        purpose="new"
        hint={`At least ${PASSWORD_MIN_LENGTH} characters; a short sentence is easy to remember.`}
        inputRef={passwordRef}
        value={form.values.password}
        onChangeText={(text) => form.setField('password', text)}
        error={form.fieldErrors.password}
        returnKeyType="go"
        onSubmitEditing={submit}
      />
      <Button label="Create account" busyLabel="Creating your account…" busy={pending} onPress={submit} />
    </View>
  );
}

const styles = StyleSheet.create({ form: { gap: space.lg } });
