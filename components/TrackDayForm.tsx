import { useState, type ReactNode } from 'react';
import { StyleSheet, View } from 'react-native';
import { describeError, issuesToFieldErrors, type FieldErrors } from '../hooks/form';
import { parseIsoDate } from '../hooks/trackDays';
import type { UnitPreferences } from '../shared/types/auth';
import { TRACK_DAY_NOTES_MAX, trackDayCreateSchema, type TrackDayCreate } from '../shared/types/trackdays';
import { space } from '../theme';
import { AppText } from './AppText';
import { Button } from './Button';
import { FormErrorBanner } from './FormErrorBanner';
import { TextField } from './TextField';
import {
  EMPTY_TRACK_DAY_CONDITIONS,
  TrackDayConditionsFields,
  conditionsFromTrackDayDraft,
  type ConditionsErrors,
  type TrackDayConditionsDraft,
} from './TrackDayConditionsFields';

export type TrackDayFormProps = {
  /** YYYY-MM-DD the date field starts at: the racer's today. */
  initialDate: string;
  trackId: number | null;
  /** The track picker, given the message for "no track picked". */
  renderTrackPicker: (error: string | undefined) => ReactNode;
  units: UnitPreferences;
  onSubmit: (day: TrackDayCreate) => unknown;
  pending: boolean;
  error: unknown;
};

const FIELDS = ['date', 'trackId', 'conditions', 'notes'];

/** A day at the track: when, where and what the weather and surface were like. */
export function TrackDayForm({ initialDate, trackId, renderTrackPicker, units, onSubmit, pending, error }: TrackDayFormProps) {
  const [date, setDate] = useState(initialDate);
  const [conditions, setConditions] = useState<TrackDayConditionsDraft>(EMPTY_TRACK_DAY_CONDITIONS);
  const [notes, setNotes] = useState('');
  const [clientErrors, setClientErrors] = useState<FieldErrors>({});
  const [conditionErrors, setConditionErrors] = useState<ConditionsErrors>({});
  const server = describeError(error, FIELDS);
  const errors = { ...server.fieldErrors, ...clientErrors };

  const submit = () => {
    if (pending) return;
    const read = conditionsFromTrackDayDraft(conditions, units);
    const dateError = parseIsoDate(date) ? undefined : 'Type the date as YYYY-MM-DD, such as 2026-12-05.';
    const parsed = trackDayCreateSchema.safeParse({ date: date.trim(), trackId: trackId ?? 0, conditions: 'conditions' in read ? read.conditions : undefined, notes });
    const fieldErrors = parsed.success ? {} : issuesToFieldErrors(parsed.error.issues);
    setConditionErrors('errors' in read ? read.errors : {});
    if (dateError || 'errors' in read || !parsed.success) {
      setClientErrors({ ...fieldErrors, conditions: undefined, ...(dateError ? { date: dateError } : {}) });
      return;
    }
    setClientErrors({});
    Promise.resolve(onSubmit(parsed.data)).catch(() => undefined);
  };

  return (
    <View style={styles.form}>
      <FormErrorBanner message={server.formError} />
      <TextField
        label="Date"
        hint="YYYY-MM-DD; today unless you are logging an earlier day."
        value={date}
        onChangeText={setDate}
        error={errors.date}
        maxLength={10}
        inputMode="numeric"
        keyboardType="numbers-and-punctuation"
        editable={!pending}
      />
      {renderTrackPicker(errors.trackId)}
      <View style={styles.section}>
        <AppText variant="heading" aria-level={3}>
          Conditions
        </AppText>
        <AppText variant="caption" tone="muted">
          All optional. The track temperature is what the oil helper compares with later.
        </AppText>
        <TrackDayConditionsFields
          value={conditions}
          onChange={(field, value) => setConditions((prev) => ({ ...prev, [field]: value }))}
          units={units}
          errors={conditionErrors}
          disabled={pending}
        />
        {errors.conditions ? (
          <AppText variant="caption" tone="danger" role="alert">
            {errors.conditions}
          </AppText>
        ) : null}
      </View>
      <TextField
        label="Notes on the day (optional)"
        hint="Layout changes, what the track did through the day."
        value={notes}
        onChangeText={setNotes}
        error={errors.notes}
        maxLength={TRACK_DAY_NOTES_MAX}
        multiline
        editable={!pending}
      />
      <Button label="Save the day" busy={pending} busyLabel="Saving the day…" onPress={submit} />
    </View>
  );
}

const styles = StyleSheet.create({
  form: { gap: space.lg },
  section: { gap: space.sm },
});
