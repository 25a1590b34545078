import { StyleSheet, View } from 'react-native';
import { useForm } from '../hooks/form';
import { PASSWORD_MIN_LENGTH, passwordSchema } from '../shared/types/auth';
import { z } from '../shared/types/zod';
import { space } from '../theme';
import { Button } from './Button';
import { FormErrorBanner } from './FormErrorBanner';
import { PasswordField } from './PasswordField';

export type NewPasswordFormProps = {
  onSubmit: (values: { password: string }) => unknown;
  pending: boolean;
  error: unknown;
};

const schema = z.object({ password: passwordSchema });

/** Choosing a new password from a reset link. */
export function NewPasswordForm({ onSubmit, pending, error }: NewPasswordFormProps) {
  const form = useForm({ initial: { password: '' }, schema, onSubmit, serverError: error, pending });
  const submit = () => void form.submit();
  return (
    <View style={styles.form}>
      <FormErrorBanner message={form.formError} />
      <PasswordField
        label="New password"
        purpose="new"
        hint={`At least ${PASSWORD_MIN_LENGTH} characters.`}
        value={form.values.password}
        onChangeText={(text) => form.setField('password', text)}
        error={form.fieldErrors.password}
        returnKeyType="go"
        onSubmitEditing={submit}
      />
      <Button label="Save new password" busyLabel="Saving…" busy={pending} onPress={submit} />
    </View>
  );
}

const styles = StyleSheet.create({ form: { gap: space.lg } });
