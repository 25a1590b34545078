import { useState } from 'react';
import { StyleSheet, View } from 'react-native';
import { describeError, issuesToFieldErrors, type FieldErrors } from '../hooks/form';
import { FEEL_NOTES_MAX, runCreateSchema, type RunCreate } from '../shared/types/trackdays';
import { space } from '../theme';
import { AppText } from './AppText';
import { Button } from './Button';
import { ChoiceChips } from './ChoiceChips';
import { FormErrorBanner } from './FormErrorBanner';
import { LapCsvImport } from './LapCsvImport';
import { LapEntry } from './LapEntry';
import { RunSetupPicker, type GarageCar, type RevisionChoices } from './RunSetupPicker';
import { StatusNote } from './StatusNote';
import { TextField } from './TextField';

/** A run being logged; null ids are "not picked yet" (a null revision means the setup's current one). */
export type RunDraft = { carId: number | null; setupId: number | null; revisionId: number | null; label: string; laps: number[]; feelNotes: string };
export const EMPTY_RUN_DRAFT: RunDraft = { carId: null, setupId: null, revisionId: null, label: '', laps: [], feelNotes: '' };

/**
 * The draft with the obvious picks filled in: the car the racer came from (or their only car), and
 * that car's setup when it has just one.
 */
export function withRunDefaults(draft: RunDraft, cars: readonly GarageCar[], preferredCarId: number | null): RunDraft {
  const carId = draft.carId ?? cars.find((c) => c.id === preferredCarId)?.id ?? (cars.length === 1 ? cars[0].id : null);
  const setups = cars.find((c) => c.id === carId)?.setups ?? [];
  const setupId = draft.setupId ?? (setups.length === 1 ? setups[0].id : null);
  return { ...draft, carId, setupId };
}

export type RunFormProps = {
  cars: readonly GarageCar[];
  /** The draft with defaults applied (see withRunDefaults). */
  draft: RunDraft;
  onChange: (changes: Partial<RunDraft>) => void;
  revisions: RevisionChoices;
  onSubmit: (run: RunCreate) => unknown;
  pending: boolean;
  error: unknown;
  /** Said once a run is saved, e.g. "Run 2 saved with 14 laps." */
  savedMessage: string | null;
};

type LapSource = 'typed' | 'file';
const SOURCE_OPTIONS = [
  { value: 'typed', label: 'Type the laps' },
  { value: 'file', label: 'From a CSV file' },
] as const;
const FIELDS = ['carId', 'setupId', 'revisionId', 'label', 'laps', 'feelNotes'];

function checkPicks(draft: RunDraft): FieldErrors {
  const errors: FieldErrors = {};
  if (draft.carId === null) errors.carId = 'Pick the car that ran.';
  else if (draft.setupId === null) errors.setupId = 'Pick the setup the car ran.';
  if (draft.laps.length === 0) errors.laps = 'Add at least one lap time, typed or from a lap file.';
  return errors;
}

/** One run: car, setup and revision, lap times typed or read from a file, and how the car felt. */
export function RunForm({ cars, draft, onChange, revisions, onSubmit, pending, error, savedMessage }: RunFormProps) {
  const [source, setSource] = useState<LapSource>('typed');
  const [clientErrors, setClientErrors] = useState<FieldErrors>({});
  const server = describeError(error, FIELDS);
  const errors = { ...server.fieldErrors, ...clientErrors };
  const change = (changes: Partial<RunDraft>) => {
    setClientErrors((prev) => {
      const next = { ...prev };
      for (const key of Object.keys(changes)) delete next[key];
      return next;
    });
    onChange(changes);
  };
  const submit = () => {
    if (pending) return;
    const picks = checkPicks(draft);
    // The revision on screen is sent even when it is the current one, so a revision saved elsewhere meanwhile cannot slip in.
    const revisionId = draft.revisionId ?? (revisions.status === 'ready' ? revisions.currentId : undefined);
    const parsed = runCreateSchema.safeParse({ ...draft, revisionId });
    if (Object.keys(picks).length > 0 || !parsed.success) {
      setClientErrors({ ...(parsed.success ? {} : issuesToFieldErrors(parsed.error.issues)), ...picks });
      return;
    }
    setClientErrors({});
    Promise.resolve(onSubmit(parsed.data)).catch(() => undefined);
  };
  return (
    <View style={styles.form}>
      <RunSetupPicker
        cars={cars}
        carId={draft.carId}
        setupId={draft.setupId}
        revisionId={draft.revisionId}
        revisions={revisions}
        onPick={change}
        errors={errors}
        disabled={pending}
      />
      <TextField label="Run name (optional)" hint="Such as “Heat 2” or “Softer rear springs”." value={draft.label} onChangeText={(label) => change({ label })} error={errors.label} maxLength={60} editable={!pending} />
      <View style={styles.section}>
        <AppText variant="heading" aria-level={3}>
          Lap times
        </AppText>
        <ChoiceChips label="Lap times from" hideLabel options={SOURCE_OPTIONS} selected={[source]} onChange={([s]) => setSource(s)} disabled={pending} />
        {source === 'file' && draft.laps.length > 0 ? (
          <AppText variant="caption" tone="caution">
            Using a file replaces the {draft.laps.length} lap{draft.laps.length === 1 ? '' : 's'} entered so far.
          </AppText>
        ) : null}
        {source === 'file' ? (
          <LapCsvImport
            onUse={(laps) => {
              change({ laps });
              setSource('typed');
            }}
            disabled={pending}
          />
        ) : (
          <LapEntry laps={draft.laps} onChange={(laps) => change({ laps })} disabled={pending} />
        )}
        {errors.laps ? (
          <AppText variant="caption" tone="danger" role="alert">
            {errors.laps}
          </AppText>
        ) : null}
      </View>
      <TextField
        label="How the car felt (optional)"
        hint="“Pushes mid-corner”, “loose on exit”, “better over the rhythm section”."
        value={draft.feelNotes}
        onChangeText={(feelNotes) => change({ feelNotes })}
        error={errors.feelNotes}
        maxLength={FEEL_NOTES_MAX}
        multiline
        editable={!pending}
      />
      <FormErrorBanner message={server.formError} />
      <StatusNote message={savedMessage} />
      <Button label="Save the run" busy={pending} busyLabel="Saving the run…" onPress={submit} />
    </View>
  );
}

const styles = StyleSheet.create({
  form: { gap: space.lg },
  section: { gap: space.sm },
});
