import { useState } from 'react';
import { StyleSheet, View } from 'react-native';
import { describeError, issuesToFieldErrors, type FieldErrors } from '../hooks/form';
import { trackCreateSchema, type TrackCreate } from '../shared/types/trackdays';
import { TRACK_TYPES, type TrackTypeKey } from '../shared/types/trackTypes';
import { space } from '../theme';
import { AppText } from './AppText';
import { Button } from './Button';
import { Card } from './Card';
import { ChoiceChips } from './ChoiceChips';
import { FormErrorBanner } from './FormErrorBanner';
import { TextField } from './TextField';

export type TrackDayNewTrackFormProps = {
  onSubmit: (track: TrackCreate) => unknown;
  onCancel: () => void;
  pending: boolean;
  error: unknown;
};

const SURFACE_OPTIONS = TRACK_TYPES.map((t) => ({ value: t.key, label: t.label }));
const SETTING_OPTIONS = [
  { value: 'outdoor', label: 'Outdoor' },
  { value: 'indoor', label: 'Indoor' },
] as const;
const FIELDS = ['name', 'surface', 'indoor', 'notes'];

/** A track that is not in the list yet: its name, surface and whether it has a roof. */
export function TrackDayNewTrackForm({ onSubmit, onCancel, pending, error }: TrackDayNewTrackFormProps) {
  const [name, setName] = useState('');
  const [surface, setSurface] = useState<TrackTypeKey | null>(null);
  const [indoor, setIndoor] = useState(false);
  const [notes, setNotes] = useState('');
  const [clientErrors, setClientErrors] = useState<FieldErrors>({});
  const server = describeError(error, FIELDS);
  const errors = { ...server.fieldErrors, ...clientErrors };
  const submit = () => {
    if (pending) return;
    if (!surface) {
      setClientErrors({ surface: 'Pick the surface the track has most of the year.' });
      return;
    }
    const parsed = trackCreateSchema.safeParse({ name, surface, indoor, notes });
    if (!parsed.success) {
      setClientErrors(issuesToFieldErrors(parsed.error.issues));
      return;
    }
    setClientErrors({});
    Promise.resolve(onSubmit(parsed.data)).catch(() => undefined);
  };
  return (
    <Card role="region" aria-label="Add a track">
      <AppText variant="heading" aria-level={3}>
        Add a track
      </AppText>
      <AppText variant="caption" tone="muted">
        Tracks are shared: other racers can pick it too. Check the list above for it first.
      </AppText>
      <View style={styles.form}>
        <FormErrorBanner message={server.formError} />
        <TextField label="Track name" value={name} onChangeText={setName} error={errors.name} maxLength={80} editable={!pending} />
        <ChoiceChips label="Surface" options={SURFACE_OPTIONS} selected={surface ? [surface] : []} onChange={([s]) => setSurface(s)} error={errors.surface} disabled={pending} />
        <ChoiceChips
          label="Indoor or outdoor"
          options={SETTING_OPTIONS}
          selected={[indoor ? 'indoor' : 'outdoor']}
          onChange={([s]) => setIndoor(s === 'indoor')}
          disabled={pending}
        />
        <TextField label="Notes about the track (optional)" value={notes} onChangeText={setNotes} error={errors.notes} maxLength={2000} multiline editable={!pending} />
        <View style={styles.buttons}>
          <Button label="Add the track" busy={pending} busyLabel="Adding the track…" onPress={submit} />
          <Button label="Cancel" variant="secondary" onPress={onCancel} disabled={pending} />
        </View>
      </View>
    </Card>
  );
}

const styles = StyleSheet.create({
  form: { gap: space.lg },
  buttons: { flexDirection: 'row', flexWrap: 'wrap', gap: space.sm },
});
