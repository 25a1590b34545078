import { StyleSheet, View } from 'react-native';
import { useForm } from '../hooks/form';
import { suspendRequestSchema } from '../shared/types/auth';
import { z } from '../shared/types/zod';
import { space } from '../theme';
import { Button } from './Button';
import { FormErrorBanner } from './FormErrorBanner';
import { TextField } from './TextField';

export type SuspendFormProps = {
  handle: string;
  onSubmit: (values: { until: string | null; reason: string }) => unknown;
  onCancel: () => void;
  pending: boolean;
  error: unknown;
};

/**
 * The suspension runs through the whole of the given (local) day: it ends at the next midnight.
 * Returns undefined for anything that is not a real calendar date.
 */
export function suspensionEnd(lastDay: string): string | undefined {
  const match = /^(\d{4})-(\d{2})-(\d{2})$/.exec(lastDay.trim());
  if (!match) return undefined;
  const [year, month, day] = match.slice(1).map(Number);
  // Date rolls 2030-02-31 over into March; a rolled-over date was not a real one.
  if (new Date(year, month - 1, day).getDate() !== day) return undefined;
  return new Date(year, month - 1, day + 1).toISOString();
}

const schema = z
  .object({ reason: suspendRequestSchema.shape.reason, lastDay: z.string() })
  .superRefine(({ lastDay }, ctx) => {
    if (!lastDay.trim()) return;
    const end = suspensionEnd(lastDay);
    if (!end) ctx.addIssue({ code: 'custom', path: ['lastDay'], message: 'Write the date as YYYY-MM-DD, e.g. 2030-06-30.' });
    else if (new Date(end) <= new Date()) ctx.addIssue({ code: 'custom', path: ['lastDay'], message: 'Pick today or a later day.' });
  })
  .transform(({ reason, lastDay }) => ({ reason, until: lastDay.trim() ? (suspensionEnd(lastDay) ?? null) : null }));

/** Why a racer is suspended and, optionally, the last day it lasts. */
export function SuspendForm({ handle, onSubmit, onCancel, pending, error }: SuspendFormProps) {
  const form = useForm({ initial: { reason: '', lastDay: '' }, schema, onSubmit, serverError: error, pending });
  const submit = () => void form.submit();
  return (
    <View style={styles.form}>
      <FormErrorBanner message={form.formError} />
      <TextField
        label={`Reason for suspending @${handle}`}
        hint="The racer sees this when they try to sign in."
        value={form.values.reason}
        onChangeText={(text) => form.setField('reason', text)}
        error={form.fieldErrors.reason}
        multiline
      />
      <TextField
        label="Last day (optional)"
        hint="YYYY-MM-DD. Leave empty to suspend until an admin lifts it."
        value={form.values.lastDay}
        onChangeText={(text) => form.setField('lastDay', text)}
        error={form.fieldErrors.lastDay}
        autoCapitalize="none"
        autoCorrect={false}
        onSubmitEditing={submit}
      />
      <View style={styles.row}>
        <Button label="Suspend" accessibilityLabel={`Suspend @${handle}`} busyLabel="Suspending…" busy={pending} variant="danger" onPress={submit} />
        <Button label="Cancel" variant="secondary" onPress={onCancel} />
      </View>
    </View>
  );
}

const styles = StyleSheet.create({
  form: { gap: space.md },
  row: { flexDirection: 'row', flexWrap: 'wrap', gap: space.md },
});
