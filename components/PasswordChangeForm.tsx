import { StyleSheet, View } from 'react-native';
import { useForm } from '../hooks/form';
import { PASSWORD_MIN_LENGTH, passwordChangeRequestSchema } from '../shared/types/auth';
import { space } from '../theme';
import { Button } from './Button';
import { FormErrorBanner } from './FormErrorBanner';
import { PasswordField } from './PasswordField';
import { StatusNote } from './StatusNote';

export type PasswordChangeFormProps = {
  /** Without a password yet (GitHub only), the racer sets one instead of changing it. */
  hasPassword: boolean;
  onSubmit: (values: { currentPassword?: string; newPassword: string }) => unknown;
  pending: boolean;
  error: unknown;
  savedMessage?: string | null;
};

/** Changing (or first setting) the account password; other devices are signed out by the server. */
export function PasswordChangeForm({ hasPassword, onSubmit, pending, error, savedMessage }: PasswordChangeFormProps) {
  const form = useForm({
    initial: { currentPassword: '', newPassword: '' },
    schema: passwordChangeRequestSchema,
    onSubmit: ({ currentPassword, newPassword }) =>
      onSubmit({ currentPassword: currentPassword ? currentPassword : undefined, newPassword }),
    serverError: error,
    pending,
    clearOnSuccess: true,
  });
  const submit = () => void form.submit();
  return (
    <View style={styles.form}>
      <StatusNote message={savedMessage} />
      <FormErrorBanner message={form.formError} />
      {hasPassword ? (
        <PasswordField
          label="Current password"
          purpose="current"
          value={form.values.currentPassword}
          onChangeText={(text) => form.setField('currentPassword', text)}
          error={form.fieldErrors.currentPassword}
          onSubmitEditing={submit}
        />
      ) : null}
      <PasswordField
        label="New password"
        purpose="new"
        hint={`At least ${PASSWORD_MIN_LENGTH} characters. Your other devices will be signed out.`}
        value={form.values.newPassword}
        onChangeText={(text) => form.setField('newPassword', text)}
        error={form.fieldErrors.newPassword}
        onSubmitEditing={submit}
      />
      <Button
        label={hasPassword ? 'Change password' : 'Set a password'}
        busyLabel="Saving…"
        busy={pending}
        onPress={submit}
      />
    </View>
  );
}

const styles = StyleSheet.create({ form: { gap: space.lg } });
