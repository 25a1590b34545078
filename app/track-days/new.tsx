import { router, useLocalSearchParams } from 'expo-router';
import { useState } from 'react';
import { Screen } from '../../components/Screen';
import { SignedInGate } from '../../components/SignedInGate';
import { ErrorState, LoadingState } from '../../components/StatusViews';
import { TrackDayForm } from '../../components/TrackDayForm';
import { TrackDayTrackPicker } from '../../components/TrackDayTrackPicker';
import { signInHref, useMeQuery } from '../../hooks/auth';
import { useTracksQuery } from '../../hooks/catalog';
import { useDisplayUnits } from '../../hooks/garageUi';
import { idParam, todayIsoDate, trackDaysHref, useCreateTrack, useCreateTrackDay } from '../../hooks/trackDays';

function NewTrackDay({ carId }: { carId: number | null }) {
  const tracks = useTracksQuery();
  const addTrack = useCreateTrack();
  const create = useCreateTrackDay();
  const units = useDisplayUnits();
  const [trackId, setTrackId] = useState<number | null>(null);
  const [today] = useState(todayIsoDate);
  if (tracks.isPending) return <LoadingState label="Loading the tracks…" />;
  if (tracks.isError) return <ErrorState title="The tracks could not load" message={tracks.error.message} onRetry={() => void tracks.refetch()} />;
  return (
    <TrackDayForm
      initialDate={today}
      trackId={trackId}
      units={units}
      renderTrackPicker={(error) => (
        <TrackDayTrackPicker
          tracks={tracks.data}
          value={trackId}
          onChange={setTrackId}
          error={error}
          disabled={create.isPending}
          onAddTrack={(track) => addTrack.mutateAsync(track)}
          adding={addTrack.isPending}
          addError={addTrack.error}
        />
      )}
      pending={create.isPending}
      error={create.error}
      // The car the racer came from is carried on, so "Add a run" starts with it picked.
      onSubmit={(day) => create.mutateAsync(day).then((saved) => router.replace(`/track-days/${saved.id}${carId ? `?carId=${carId}` : ''}`))}
    />
  );
}

export default function NewTrackDayScreen() {
  const me = useMeQuery();
  const carId = idParam(useLocalSearchParams<{ carId?: string }>().carId);
  const here = carId ? `/track-days/new?carId=${carId}` : '/track-days/new';
  return (
    <Screen title="Log a track day" subtitle="Where you ran and what the track was like; runs and lap times come next." back={{ href: trackDaysHref(carId), label: 'Back to Track days' }}>
      <SignedInGate me={me} signInHref={signInHref(here)}>
        {() => <NewTrackDay carId={carId} />}
      </SignedInGate>
    </Screen>
  );
}
