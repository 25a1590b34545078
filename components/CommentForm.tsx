import { useState, type Ref } from 'react';
import { StyleSheet, View, type TextInput } from 'react-native';
import { describeError } from '../hooks/form';
import { COMMENT_MAX, commentUpdateSchema } from '../shared/types/forks';
import { radius, space, useTheme } from '../theme';
import { AppText } from './AppText';
import { Button } from './Button';
import { FormErrorBanner } from './FormErrorBanner';
import { LoadingState } from './StatusViews';
import { TextField } from './TextField';
import { TextLink } from './TextLink';

export type CommentFormProps = {
  /** Names the text box, e.g. "Comment on this change" or "Reply to @juno_braithwick". */
  label: string;
  submitLabel: string;
  /** Shown on the button while the request is out. */
  busyLabel?: string;
  /** Resolves once the server accepted the comment (the box then empties); rejects with its error. */
  onSubmit: (bodyMarkdown: string) => Promise<unknown>;
  /** Undefined while the sign-in is being checked; false shows a way to sign in instead of the box. */
  signedIn: boolean | undefined;
  /** Where the sign-in screen sends the racer back to. */
  signInHref: string;
  /** The text to start from, when editing. */
  initialValue?: string;
  onCancel?: () => void;
  /** What the comment is about beyond the change, e.g. "On Rear shock oil", and how to drop that. */
  context?: { label: string; onClear: () => void };
  /** For moving focus here, e.g. after "Comment on this field". */
  inputRef?: Ref<TextInput>;
};

const count = (n: number) => n.toLocaleString('en-GB');

function SignedOut({ signInHref }: { signInHref: string }) {
  return (
    <View style={styles.row}>
      <AppText tone="muted">Signed-in racers can comment.</AppText>
      <TextLink href={signInHref} label="Sign in to comment" />
    </View>
  );
}

function ContextChip({ context }: { context: NonNullable<CommentFormProps['context']> }) {
  const { colors } = useTheme();
  return (
    <View style={[styles.chip, { backgroundColor: colors.accentSoft, borderColor: colors.accent }]}>
      <AppText style={styles.bold}>{context.label}</AppText>
      <Button label="Clear" variant="secondary" accessibilityLabel={`Clear “${context.label}”: comment on the whole change`} onPress={context.onClear} />
    </View>
  );
}

/** A markdown box for a comment or reply, with its count towards the limit, the server's message and a busy state. */
export function CommentForm(props: CommentFormProps) {
  const { label, submitLabel, busyLabel = 'Posting…', onSubmit, signedIn, signInHref, initialValue = '', onCancel, context, inputRef } = props;
  const [text, setText] = useState(initialValue);
  const [busy, setBusy] = useState(false);
  const [error, setError] = useState<{ field?: string; form: string | null }>({ form: null });
  if (signedIn === undefined) return <LoadingState label="Checking who is signed in…" />;
  if (!signedIn) return <SignedOut signInHref={signInHref} />;
  const over = text.length > COMMENT_MAX;

  const submit = async () => {
    if (busy) return;
    const parsed = commentUpdateSchema.safeParse({ bodyMarkdown: text });
    if (!parsed.success) {
      setError({ field: parsed.error.issues[0]?.message, form: null });
      return;
    }
    setBusy(true);
    setError({ form: null });
    try {
      await onSubmit(parsed.data.bodyMarkdown);
      setText('');
    } catch (err) {
      const described = describeError(err, ['bodyMarkdown']);
      setError({ field: described.fieldErrors.bodyMarkdown, form: described.formError });
    } finally {
      setBusy(false);
    }
  };

  return (
    <View style={styles.form}>
      {context ? <ContextChip context={context} /> : null}
      <TextField
        label={label}
        hint="Markdown works: **bold**, *italic*, - lists, [links](https://…)."
        value={text}
        onChangeText={(next) => {
          setText(next);
          if (error.field) setError({ ...error, field: undefined });
        }}
        error={error.field}
        multiline
        editable={!busy}
        inputRef={inputRef}
      />
      <AppText variant="caption" tone={over ? 'danger' : 'muted'}>
        {count(text.length)} of {count(COMMENT_MAX)} characters{over ? ` — ${count(text.length - COMMENT_MAX)} too many` : ''}
      </AppText>
      <FormErrorBanner message={error.form} />
      <View style={styles.row}>
        <Button label={submitLabel} busy={busy} busyLabel={busyLabel} disabled={over} onPress={() => void submit()} />
        {onCancel ? <Button label="Cancel" variant="secondary" disabled={busy} onPress={onCancel} /> : null}
      </View>
    </View>
  );
}

const styles = StyleSheet.create({
  form: { gap: space.sm },
  row: { flexDirection: 'row', flexWrap: 'wrap', alignItems: 'center', gap: space.sm },
  chip: {
    flexDirection: 'row',
    flexWrap: 'wrap',
    alignItems: 'center',
    justifyContent: 'space-between',
    gap: space.sm,
    borderWidth: 1,
    borderRadius: radius.md,
    padding: space.sm,
  },
  bold: { fontWeight: '700', flexShrink: 1 },
});
