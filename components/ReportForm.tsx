import { useState } from 'react';
import { StyleSheet, View } from 'react-native';
import { ApiRequestError } from '../hooks/api';
import { describeError } from '../hooks/form';
import {
  REPORT_NOTE_MAX,
  REPORT_REASON_LABELS,
  REPORT_REASONS,
  reportCreateSchema,
  type ReportCreate,
  type ReportReason,
  type ReportTargetType,
} from '../shared/types/moderation';
import { space } from '../theme';
import { AppText } from './AppText';
import { Button } from './Button';
import { FormErrorBanner } from './FormErrorBanner';
import { SetupRadioList } from './SetupRadioList';
import { StatusNote } from './StatusNote';
import { TextField } from './TextField';
import { TextLink } from './TextLink';

export type ReportFormProps = {
  target: { type: ReportTargetType; id: number };
  /** What is being reported, in words: "this setup", "the comment by @pell-strand". */
  what: string;
  /** Resolves once the server took the report; rejects with its error. */
  onSubmit: (report: ReportCreate) => Promise<unknown>;
  onClose: () => void;
};

const REASON_OPTIONS = REPORT_REASONS.map((value) => ({
  value,
  label: REPORT_REASON_LABELS[value].label,
  description: REPORT_REASON_LABELS[value].hint,
}));

type Problems = { reason?: string; note?: string; form: string | null; alreadyReported: boolean };
const NONE: Problems = { form: null, alreadyReported: false };

/**
 * The server's refusal as words beside the right field. A repeat report names the open one, so
 * the form can link to it; the report limit's own wording says when the next report is possible.
 */
function describeRefusal(err: unknown): Problems {
  const api = err instanceof ApiRequestError ? err : null;
  if (api?.code === 'rate_limited') return { form: api.message, alreadyReported: false };
  const described = describeError(err, ['reason', 'note']);
  const alreadyReported = api?.status === 409 && api.details?.reportId !== undefined;
  return { ...described.fieldErrors, form: described.formError, alreadyReported };
}

function Sent({ onClose }: { onClose: () => void }) {
  return (
    <View style={styles.form}>
      <StatusNote message="Thanks — moderators will look at it; follow it in My reports." />
      <View style={styles.row}>
        <TextLink href="/reports" label="Open My reports" />
        <Button label="Close" variant="secondary" onPress={onClose} />
      </View>
    </View>
  );
}

/** Why something should be looked at: a reason from the short list, a note, and the answer. */
export function ReportForm({ target, what, onSubmit, onClose }: ReportFormProps) {
  const [reason, setReason] = useState<ReportReason | null>(null);
  const [note, setNote] = useState('');
  const [busy, setBusy] = useState(false);
  const [sent, setSent] = useState(false);
  const [problems, setProblems] = useState<Problems>(NONE);
  if (sent) return <Sent onClose={onClose} />;
  const noteRequired = reason === 'other';

  const submit = async () => {
    if (busy) return;
    if (!reason) {
      setProblems({ ...NONE, reason: 'Choose the reason that fits best.' });
      return;
    }
    const parsed = reportCreateSchema.safeParse({ targetType: target.type, targetId: target.id, reason, note });
    if (!parsed.success) {
      const issue = parsed.error.issues[0];
      setProblems({ ...NONE, [issue?.path[0] === 'note' ? 'note' : 'form']: issue?.message ?? 'Check the report.' });
      return;
    }
    setBusy(true);
    setProblems(NONE);
    try {
      await onSubmit(parsed.data);
      setSent(true);
    } catch (err) {
      setProblems(describeRefusal(err));
    } finally {
      setBusy(false);
    }
  };

  return (
    <View style={styles.form}>
      <AppText tone="muted">Moderators see your reason and note; the author never learns who reported {what}.</AppText>
      <SetupRadioList
        label="What is wrong?"
        options={REASON_OPTIONS}
        value={reason}
        onChange={(value) => {
          setReason(value);
          setProblems((p) => ({ ...p, reason: undefined }));
        }}
        disabled={busy}
        error={problems.reason}
      />
      <TextField
        label={noteRequired ? 'Note for the moderators (needed for “Something else”)' : 'Note for the moderators (optional)'}
        hint={`What should they look at? Up to ${REPORT_NOTE_MAX.toLocaleString('en-GB')} characters.`}
        value={note}
        onChangeText={(text) => {
          setNote(text);
          setProblems((p) => ({ ...p, note: undefined }));
        }}
        error={problems.note}
        multiline
        maxLength={REPORT_NOTE_MAX}
        editable={!busy}
      />
      <FormErrorBanner message={problems.form} />
      {problems.alreadyReported ? <TextLink href="/reports" label="See it in My reports" /> : null}
      <View style={styles.row}>
        <Button label="Send report" busy={busy} busyLabel="Sending…" onPress={() => void submit()} />
        <Button label="Cancel" variant="secondary" disabled={busy} onPress={onClose} />
      </View>
    </View>
  );
}

const styles = StyleSheet.create({
  form: { gap: space.md },
  row: { flexDirection: 'row', flexWrap: 'wrap', alignItems: 'center', gap: space.md },
});
