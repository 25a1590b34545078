import { useState } from 'react';
import { StyleSheet, View } from 'react-native';
import { describeError } from '../hooks/form';
import { ACTION_REASON_MAX } from '../shared/types/moderation';
import { space } from '../theme';
import { AppText } from './AppText';
import { Button } from './Button';
import { ChoiceChips } from './ChoiceChips';
import { FormErrorBanner } from './FormErrorBanner';
import { TextField } from './TextField';

export type AppealDecision = 'uphold' | 'overturn';

export type AppealDecisionFormProps = {
  /** False when this moderator took the action under appeal: another one must decide. */
  canDecide: boolean;
  onDecide: (values: { decision: AppealDecision; reason: string }) => Promise<unknown>;
};

const DECISIONS: { value: AppealDecision; label: string }[] = [
  { value: 'uphold', label: 'Uphold — the action stands' },
  { value: 'overturn', label: 'Overturn — reverse it' },
];

/** A moderator's answer to an appeal, with the reason the author will read. */
export function AppealDecisionForm({ canDecide, onDecide }: AppealDecisionFormProps) {
  const [decision, setDecision] = useState<AppealDecision | null>(null);
  const [reason, setReason] = useState('');
  const [busy, setBusy] = useState(false);
  const [error, setError] = useState<{ decision?: string; reason?: string; form: string | null }>({ form: null });
  const closed = !canDecide;

  const submit = async () => {
    if (busy || closed) return;
    if (!decision || !reason.trim()) {
      setError({
        decision: decision ? undefined : 'Choose to uphold or overturn.',
        reason: reason.trim() ? undefined : 'Give a reason; the author will see it.',
        form: null,
      });
      return;
    }
    setBusy(true);
    setError({ form: null });
    try {
      await onDecide({ decision, reason: reason.trim() });
    } catch (err) {
      const described = describeError(err, ['decision', 'reason']);
      setError({ ...described.fieldErrors, form: described.formError });
    } finally {
      setBusy(false);
    }
  };

  return (
    <View style={styles.form}>
      {closed ? (
        <AppText tone="muted" role="note">
          You took the action under appeal, so another moderator (or an admin) must decide it.
        </AppText>
      ) : null}
      <ChoiceChips label="Decision" options={DECISIONS} selected={decision ? [decision] : []} onChange={([next]) => next && setDecision(next)} disabled={closed || busy} error={error.decision} />
      <TextField
        label="Reason for the decision (the author sees it)"
        value={reason}
        onChangeText={(text) => {
          setReason(text);
          setError((e) => ({ ...e, reason: undefined }));
        }}
        error={error.reason}
        multiline
        maxLength={ACTION_REASON_MAX}
        editable={!closed && !busy}
      />
      <FormErrorBanner message={error.form} />
      <Button label="Decide the appeal" busy={busy} busyLabel="Deciding…" disabled={closed} onPress={() => void submit()} />
    </View>
  );
}

const styles = StyleSheet.create({
  form: { gap: space.md },
});
