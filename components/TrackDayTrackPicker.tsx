import { useState } from 'react';
import { StyleSheet, View } from 'react-native';
import type { TrackSummary } from '../shared/types/catalog';
import type { TrackCreate } from '../shared/types/trackdays';
import { trackTypeLabel } from '../shared/types/trackTypes';
import { space } from '../theme';
import { AppText } from './AppText';
import { Button } from './Button';
import { SetupRadioList } from './SetupRadioList';
import { TrackDayNewTrackForm } from './TrackDayNewTrackForm';

export type TrackDayTrackPickerProps = {
  tracks: readonly TrackSummary[];
  value: number | null;
  onChange: (trackId: number) => void;
  error?: string;
  disabled?: boolean;
  /** Adds a track; resolves with it so it can be picked at once. */
  onAddTrack: (track: TrackCreate) => Promise<TrackSummary>;
  adding: boolean;
  addError: unknown;
};

/** The track of the day, from the shared list, or a new one added on the spot. */
export function TrackDayTrackPicker({ tracks, value, onChange, error, disabled, onAddTrack, adding, addError }: TrackDayTrackPickerProps) {
  const [open, setOpen] = useState(false);
  const options = [...tracks]
    .sort((a, b) => a.name.localeCompare(b.name))
    .map((t) => ({ value: t.id, label: t.name, description: `${trackTypeLabel(t.surface)} · ${t.indoor ? 'indoor' : 'outdoor'}` }));
  const add = (track: TrackCreate) =>
    onAddTrack(track).then((created) => {
      onChange(created.id);
      setOpen(false);
    });
  return (
    <View style={styles.group}>
      {options.length > 0 ? (
        <SetupRadioList label="Track" options={options} value={value} onChange={onChange} error={open ? undefined : error} disabled={disabled} />
      ) : (
        <AppText tone={error ? 'danger' : 'muted'} role={error ? 'alert' : undefined}>
          No tracks in the list yet: add the one you race at.
        </AppText>
      )}
      {open ? (
        <TrackDayNewTrackForm onSubmit={add} onCancel={() => setOpen(false)} pending={adding} error={addError} />
      ) : (
        <Button label="Add a track" variant="secondary" accessibilityLabel="Add a track that is not in the list" onPress={() => setOpen(true)} disabled={disabled} />
      )}
    </View>
  );
}

const styles = StyleSheet.create({
  group: { gap: space.md },
});
