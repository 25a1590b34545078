import { useState, type RefObject } from 'react';
import { StyleSheet, View } from 'react-native';
import { describeError } from '../hooks/form';
import { formatForDisplay } from '../shared/compute/setup';
import type { UnitPreferences } from '../shared/types/auth';
import type { SetupConditions, SetupMetaUpdate } from '../shared/types/setups';
import { space } from '../theme';
import { AppText } from './AppText';
import { Button } from './Button';
import { ConditionsFields, conditionsFromDraft, type ConditionsDraft } from './ConditionsFields';
import { FormErrorBanner } from './FormErrorBanner';
import { NOTES_MAX_LENGTH, NotesEditor } from './NotesEditor';
import type { NotesPreviewState } from './NotesEditorPreview';
import { TextField } from './TextField';
import { UnsavedChangesGuard } from './UnsavedChangesGuard';
import { UnsavedLeaveLink } from './UnsavedLeaveLink';

export type SetupDetailsFormProps = {
  setupId: number;
  /** The setup as saved: where the fields start and what "changed" is measured against. */
  saved: { title: string; conditions: SetupConditions; notesMarkdown: string };
  units: UnitPreferences;
  /** Receives only the fields that differ from `saved`. */
  onSubmit: (changes: SetupMetaUpdate) => unknown;
  pending: boolean;
  /** The last failed save; its field details land under the fields. */
  error: unknown;
  preview: NotesPreviewState;
  onPreview: (markdown: string) => void;
  /** Set once leaving is settled (a save went through), so no warning follows. */
  leaveApproved: RefObject<boolean>;
};

type Draft = { title: string; conditions: ConditionsDraft; notes: string };
type Field = 'title' | 'conditions' | 'notesMarkdown';
const SERVER_FIELDS: readonly Field[] = ['title', 'conditions', 'notesMarkdown'];

function draftFrom(saved: SetupDetailsFormProps['saved'], units: UnitPreferences): Draft {
  const { trackType, temperatureC, grip } = saved.conditions;
  return {
    title: saved.title,
    conditions: {
      trackType: trackType ?? 'any',
      temperature: temperatureC === null ? '' : String(formatForDisplay(temperatureC, 'temperature', units).value),
      grip: grip ?? 'any',
    },
    notes: saved.notesMarkdown,
  };
}

function sameConditions(a: ConditionsDraft, b: ConditionsDraft): boolean {
  return a.trackType === b.trackType && a.grip === b.grip && a.temperature.trim() === b.temperature.trim();
}

/** Which fields differ from where the form started; untouched ones are never sent. */
function changedFields(draft: Draft, initial: Draft): Set<Field> {
  const changed = new Set<Field>();
  if (draft.title.trim() !== initial.title.trim()) changed.add('title');
  // Compared as typed: a °F round trip could otherwise nudge an untouched temperature.
  if (!sameConditions(draft.conditions, initial.conditions)) changed.add('conditions');
  if (draft.notes !== initial.notes) changed.add('notesMarkdown');
  return changed;
}

/** Title, conditions and markdown notes of one of my setups; saves only what changed. */
export function SetupDetailsForm(props: SetupDetailsFormProps) {
  const { setupId, saved, units, onSubmit, pending, error, preview, onPreview, leaveApproved } = props;
  const [initial] = useState(() => draftFrom(saved, units));
  const [draft, setDraft] = useState<Draft>(initial);
  const [local, setLocal] = useState<Partial<Record<Field | 'form', string>>>({});
  // A server message goes once its field is edited after that failure.
  const [edited, setEdited] = useState<{ error: unknown; fields: Field[] }>({ error: null, fields: [] });
  const server = describeError(error, SERVER_FIELDS);
  const changed = changedFields(draft, initial);
  const dirty = changed.size > 0;
  const editedNow = edited.error === error ? edited.fields : [];
  const messageFor = (field: Field) => local[field] ?? (editedNow.includes(field) ? undefined : server.fieldErrors[field]);

  const edit = (field: Field, next: Partial<Draft>) => {
    setDraft((prev) => ({ ...prev, ...next }));
    setLocal((prev) => ({ ...prev, [field]: undefined, form: undefined }));
    setEdited((prev) => ({ error, fields: [...(prev.error === error ? prev.fields : []), field] }));
  };

  const submit = () => {
    if (pending) return;
    const converted = conditionsFromDraft(draft.conditions, units);
    const errors = {
      title: draft.title.trim() ? undefined : 'Give the setup a title, such as the track and the day.',
      conditions: 'error' in converted ? converted.error : undefined,
      notesMarkdown: draft.notes.length > NOTES_MAX_LENGTH ? 'Notes are at most 20,000 characters.' : undefined,
      form: dirty ? undefined : 'Nothing has changed yet, so there is nothing to save.',
    };
    setLocal(errors);
    if (errors.title || errors.notesMarkdown || errors.form || 'error' in converted) return;
    const changes: SetupMetaUpdate = {};
    if (changed.has('title')) changes.title = draft.title.trim();
    if (changed.has('conditions')) changes.conditions = converted.conditions;
    if (changed.has('notesMarkdown')) changes.notesMarkdown = draft.notes;
    // The caller's mutation keeps the failure and hands it back as `error`; the fields keep their words.
    Promise.resolve(onSubmit(changes)).catch(() => undefined);
  };

  return (
    <View style={styles.form}>
      <View style={styles.header}>
        <UnsavedLeaveLink href={`/setups/${setupId}`} label="Back to the setup" dirty={dirty} leaveApproved={leaveApproved} />
        <AppText variant="title">Edit details</AppText>
        <AppText tone="muted">The title, what the setup is for, and your notes. The sheet itself has its own editor.</AppText>
      </View>
      <FormErrorBanner message={local.form ?? server.formError} />
      <TextField
        label="Title"
        hint="Say where and when it works, such as “Dusty summer evenings”."
        value={draft.title}
        onChangeText={(title) => edit('title', { title })}
        error={messageFor('title')}
        maxLength={120}
        editable={!pending}
      />
      <ConditionsFields
        value={draft.conditions}
        onChange={(field, value) => edit('conditions', { conditions: { ...draft.conditions, [field]: value } })}
        units={units}
        // The temperature is the only condition a racer can get wrong, so the server's word lands there.
        temperatureError={messageFor('conditions')}
        disabled={pending}
      />
      <NotesEditor
        value={draft.notes}
        onChangeText={(notes) => edit('notesMarkdown', { notes })}
        error={messageFor('notesMarkdown')}
        disabled={pending}
        preview={preview}
        onPreview={onPreview}
      />
      <Button label="Save details" busy={pending} busyLabel="Saving…" onPress={submit} />
      <UnsavedChangesGuard active={dirty} leaveApproved={leaveApproved} />
    </View>
  );
}

const styles = StyleSheet.create({
  form: { gap: space.xl },
  header: { gap: space.xs },
});
