import { useState } from 'react';
import { StyleSheet, View } from 'react-native';
import { describeError } from '../hooks/form';
import { APPEAL_TEXT_MAX, appealCreateSchema } from '../shared/types/moderation';
import { space } from '../theme';
import { AppText } from './AppText';
import { Button } from './Button';
import { FormErrorBanner } from './FormErrorBanner';
import { TextField } from './TextField';

export type AppealFormProps = {
  /** Resolves once the server took the appeal; rejects with its error. */
  onSubmit: (text: string) => Promise<unknown>;
  /** Why no appeal is possible (already appealed, window closed); the form is then closed for input. */
  disabledReason?: string | null;
  /** Last moment an appeal is accepted, as ISO, for "until …". */
  appealUntil?: string | null;
  onCancel?: () => void;
  /** Names the text box, e.g. "Why should the hide of “Cheap tyres” change?". */
  label?: string;
};

function untilText(iso: string): string {
  const date = new Date(iso);
  return Number.isNaN(date.getTime()) ? '' : date.toLocaleDateString(undefined, { day: 'numeric', month: 'long', year: 'numeric' });
}

// The schema's actionId is the caller's business; only the text is checked here.
const textSchema = appealCreateSchema.shape.text;

/** One appeal, in the author's words: sent once, read by a moderator who did not take the action. */
export function AppealForm({ onSubmit, disabledReason, appealUntil, onCancel, label = 'Why should the decision change?' }: AppealFormProps) {
  const [text, setText] = useState('');
  const [busy, setBusy] = useState(false);
  const [error, setError] = useState<{ field?: string; form: string | null }>({ form: null });
  const closed = Boolean(disabledReason);

  const submit = async () => {
    if (busy || closed) return;
    const parsed = textSchema.safeParse(text);
    if (!parsed.success) {
      setError({ field: parsed.error.issues[0]?.message, form: null });
      return;
    }
    setBusy(true);
    setError({ form: null });
    try {
      await onSubmit(parsed.data);
    } catch (err) {
      const described = describeError(err, ['text']);
      setError({ field: described.fieldErrors.text, form: described.formError });
    } finally {
      setBusy(false);
    }
  };

  return (
    <View style={styles.form}>
      {closed ? (
        <AppText tone="muted" role="note">
          {disabledReason}
        </AppText>
      ) : (
        <AppText variant="caption" tone="muted">
          You can appeal once{appealUntil ? `, until ${untilText(appealUntil)}` : ''}. Another moderator reads it and decides; you will be told the outcome.
        </AppText>
      )}
      <TextField
        label={label}
        hint={`Say what the moderators missed. Up to ${APPEAL_TEXT_MAX.toLocaleString('en-GB')} characters.`}
        value={text}
        onChangeText={(next) => {
          setText(next);
          if (error.field) setError({ ...error, field: undefined });
        }}
        error={error.field}
        multiline
        maxLength={APPEAL_TEXT_MAX}
        editable={!busy && !closed}
      />
      <FormErrorBanner message={error.form} />
      <View style={styles.row}>
        <Button label="Send appeal" busy={busy} busyLabel="Sending…" disabled={closed} onPress={() => void submit()} />
        {onCancel ? <Button label="Cancel" variant="secondary" disabled={busy} onPress={onCancel} /> : null}
      </View>
    </View>
  );
}

const styles = StyleSheet.create({
  form: { gap: space.sm },
  row: { flexDirection: 'row', flexWrap: 'wrap', alignItems: 'center', gap: space.md },
});
