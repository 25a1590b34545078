import { useState } from 'react';
import { StyleSheet, View } from 'react-native';
import { describeError } from '../hooks/form';
import { ACTION_REASON_MAX, type ModerationActionRequest, type QueueAction } from '../shared/types/moderation';
import { space } from '../theme';
import { Button } from './Button';
import { ChoiceChips } from './ChoiceChips';
import { FormErrorBanner } from './FormErrorBanner';
import { TextField } from './TextField';

export type SuspendLength = '1' | '7' | '30' | '90' | 'indefinite';

export type QueueActionFormProps = {
  action: QueueAction;
  /** The author's handle, for labels such as "Suspend @spoke_deals". */
  authorHandle: string;
  /** Where the reason starts: a sensible default the moderator can change. */
  initialReason: string;
  /** Builds and sends the request; resolves when done, rejects with the server's refusal. */
  onSubmit: (values: Pick<ModerationActionRequest, 'reason' | 'suspendDays' | 'hideContent'>) => Promise<unknown>;
  onCancel: () => void;
};

const LENGTHS: { value: SuspendLength; label: string }[] = [
  { value: '1', label: '1 day' },
  { value: '7', label: '7 days' },
  { value: '30', label: '30 days' },
  { value: '90', label: '90 days' },
  { value: 'indefinite', label: 'Until lifted' },
];

export function confirmLabel(action: QueueAction, handle: string): string {
  switch (action) {
    case 'hide':
      return 'Hide it';
    case 'restore':
      return 'Restore it';
    case 'dismiss':
      return 'Dismiss the reports';
    case 'warn':
      return `Warn @${handle}`;
    case 'suspend':
      return `Suspend @${handle}`;
    case 'hide-all':
      return `Hide everything by @${handle}`;
  }
}

/** The second step of an action: the reason the author will read and, for suspensions, how long. */
export function QueueActionForm({ action, authorHandle, initialReason, onSubmit, onCancel }: QueueActionFormProps) {
  const [reason, setReason] = useState(initialReason);
  const [length, setLength] = useState<SuspendLength>('7');
  const [hideContent, setHideContent] = useState(false);
  const [busy, setBusy] = useState(false);
  const [error, setError] = useState<{ reason?: string; form: string | null }>({ form: null });

  const submit = async () => {
    if (busy) return;
    if (!reason.trim()) {
      setError({ reason: 'Give a reason; the author will see it.', form: null });
      return;
    }
    setBusy(true);
    setError({ form: null });
    try {
      const suspend = action === 'suspend' ? { suspendDays: length === 'indefinite' ? null : Number(length), hideContent } : {};
      await onSubmit({ reason: reason.trim(), ...suspend });
    } catch (err) {
      const described = describeError(err, ['reason']);
      setError({ reason: described.fieldErrors.reason, form: described.formError });
      setBusy(false);
    }
  };

  const danger = action === 'suspend' || action === 'hide-all';
  return (
    <View style={styles.form}>
      <TextField
        label="Reason (the author sees it)"
        value={reason}
        onChangeText={(text) => {
          setReason(text);
          setError((e) => ({ ...e, reason: undefined }));
        }}
        error={error.reason}
        multiline
        maxLength={ACTION_REASON_MAX}
        editable={!busy}
      />
      {action === 'suspend' ? (
        <>
          <ChoiceChips label="How long" options={LENGTHS} selected={[length]} onChange={([next]) => setLength(next ?? length)} disabled={busy} />
          <ChoiceChips
            label="Their posts"
            options={[{ value: 'hide', label: 'Also hide everything they posted' }]}
            selected={hideContent ? ['hide'] : []}
            multiple
            onChange={(selected) => setHideContent(selected.includes('hide'))}
            disabled={busy}
          />
        </>
      ) : null}
      <FormErrorBanner message={error.form} />
      <View style={styles.row}>
        <Button label={confirmLabel(action, authorHandle)} variant={danger ? 'danger' : 'primary'} busy={busy} busyLabel="Working…" onPress={() => void submit()} />
        <Button label="Cancel" variant="secondary" disabled={busy} onPress={onCancel} />
      </View>
    </View>
  );
}

const styles = StyleSheet.create({
  form: { gap: space.md },
  row: { flexDirection: 'row', flexWrap: 'wrap', alignItems: 'center', gap: space.md },
});
