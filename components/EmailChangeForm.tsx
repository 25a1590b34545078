import { StyleSheet, View } from 'react-native';
import { useForm } from '../hooks/form';
import { emailChangeRequestSchema } from '../shared/types/auth';
import { space } from '../theme';
import { AppText } from './AppText';
import { Button } from './Button';
import { FormErrorBanner } from './FormErrorBanner';
import { PasswordField } from './PasswordField';
import { StatusNote } from './StatusNote';
import { TextField } from './TextField';

export type EmailChangeFormProps = {
  currentEmail: string | null;
  /** An earlier change still waiting for its link. */
  pendingEmail: string | null;
  /** Racers with a password confirm the change with it; GitHub-only racers have none to give. */
  askPassword: boolean;
  onSubmit: (values: { email: string; password?: string }) => unknown;
  pending: boolean;
  error: unknown;
  sentMessage?: string | null;
};

/** Moving the account to a new e-mail address, which only takes effect once confirmed. */
export function EmailChangeForm(props: EmailChangeFormProps) {
  const { currentEmail, pendingEmail, askPassword, onSubmit, pending, error, sentMessage } = props;
  const form = useForm({
    initial: { email: '', password: '' },
    schema: emailChangeRequestSchema,
    onSubmit: ({ email, password }) => onSubmit({ email, password: password ? password : undefined }),
    serverError: error,
    pending,
    clearOnSuccess: true,
  });
  const submit = () => void form.submit();
  return (
    <View style={styles.form}>
      <AppText>
        {currentEmail ? `Now: ${currentEmail}` : 'No e-mail address on this account yet.'}
      </AppText>
      {pendingEmail ? <StatusNote tone="caution" message={`Waiting for you to open the link we sent to ${pendingEmail}.`} /> : null}
      <StatusNote message={sentMessage} />
      <FormErrorBanner message={form.formError} />
      <TextField
        label="New e-mail address"
        value={form.values.email}
        onChangeText={(text) => form.setField('email', text)}
        error={form.fieldErrors.email}
        autoComplete="email"
        textContentType="emailAddress"
        keyboardType="email-address"
        autoCapitalize="none"
        autoCorrect={false}
        onSubmitEditing={submit}
      />
      {askPassword ? (
        <PasswordField
          label="Your password"
          purpose="current"
          hint="To make sure it is really you."
          value={form.values.password}
          onChangeText={(text) => form.setField('password', text)}
          error={form.fieldErrors.password}
          onSubmitEditing={submit}
        />
      ) : null}
      <Button label="Change e-mail address" busyLabel="Sending the link…" busy={pending} onPress={submit} />
    </View>
  );
}

const styles = StyleSheet.create({ form: { gap: space.lg } });
