import { StyleSheet, View } from 'react-native';
import { useForm } from '../hooks/form';
import { emailOnlyRequestSchema } from '../shared/types/auth';
import { space } from '../theme';
import { Button } from './Button';
import { FormErrorBanner } from './FormErrorBanner';
import { TextField } from './TextField';

export type EmailRequestFormProps = {
  onSubmit: (values: { email: string }) => unknown;
  pending: boolean;
  error: unknown;
  submitLabel: string;
  busyLabel: string;
  initialEmail?: string;
  hint?: string;
};

/** One e-mail address and a button: for reset links and fresh verification links. */
export function EmailRequestForm(props: EmailRequestFormProps) {
  const { onSubmit, pending, error, submitLabel, busyLabel, initialEmail = '', hint } = props;
  const form = useForm({
    initial: { email: initialEmail },
    schema: emailOnlyRequestSchema,
    onSubmit,
    serverError: error,
    pending,
  });
  const submit = () => void form.submit();
  return (
    <View style={styles.form}>
      <FormErrorBanner message={form.formError} />
      <TextField
        label="E-mail address"
        hint={hint}
        value={form.values.email}
        onChangeText={(text) => form.setField('email', text)}
        error={form.fieldErrors.email}
        autoComplete="email"
        textContentType="emailAddress"
        keyboardType="email-address"
        autoCapitalize="none"
        autoCorrect={false}
        returnKeyType="send"
        onSubmitEditing={submit}
      />
      <Button label={submitLabel} busyLabel={busyLabel} busy={pending} onPress={submit} />
    </View>
  );
}

const styles = StyleSheet.create({ form: { gap: space.lg } });
