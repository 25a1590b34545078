import { router, useLocalSearchParams } from 'expo-router';
import { useState } from 'react';
import { View } from 'react-native';
import { AppText } from '../../components/AppText';
import { Card } from '../../components/Card';
import { FormErrorBanner } from '../../components/FormErrorBanner';
import { RunCard } from '../../components/RunCard';
import { RunComparePicker } from '../../components/RunComparePicker';
import { EMPTY_RUN_DRAFT, RunForm, withRunDefaults, type RunDraft } from '../../components/RunForm';
import type { RevisionChoices } from '../../components/RunSetupPicker';
import { Screen } from '../../components/Screen';
import { SetupConfirmButton } from '../../components/SetupConfirmButton';
import { SignedInGate } from '../../components/SignedInGate';
import { EmptyState, ErrorState, LoadingState } from '../../components/StatusViews';
import { TrackDayHeader } from '../../components/TrackDayHeader';
import { ApiRequestError } from '../../hooks/api';
import { signInHref, useMeQuery } from '../../hooks/auth';
import { describeError } from '../../hooks/form';
import { useDisplayUnits } from '../../hooks/garageUi';
import { useGarageQuery, useSetupQuery } from '../../hooks/setups';
import { idParam, runName, trackDaysHref, useAddRun, useDeleteTrackDay, useTrackDayQuery } from '../../hooks/trackDays';
import type { RunCreate, TrackDay } from '../../shared/types/trackdays';

function revisionChoices(setupId: number | null, setup: ReturnType<typeof useSetupQuery>): RevisionChoices {
  if (setupId === null) return { status: 'idle' };
  if (setup.isPending) return { status: 'loading' };
  if (setup.isError) return { status: 'error', message: setup.error.message, retry: () => void setup.refetch() };
  return { status: 'ready', currentId: setup.data.currentRevision.id, revisions: setup.data.revisions };
}

/** The "Add a run" form with its picks from the garage; keeps car and setup for the next run. */
function AddRun({ day, preferredCarId }: { day: TrackDay; preferredCarId: number | null }) {
  const garage = useGarageQuery();
  const add = useAddRun(day.id);
  const [draft, setDraft] = useState<RunDraft>(EMPTY_RUN_DRAFT);
  const [saved, setSaved] = useState<string | null>(null);
  const cars = garage.data?.cars ?? [];
  const effective = withRunDefaults(draft, cars, preferredCarId);
  const setup = useSetupQuery(effective.setupId ?? 0);
  if (garage.isPending) return <LoadingState label="Opening your garage…" />;
  if (garage.isError) return <ErrorState title="Your garage could not load" message={garage.error.message} onRetry={() => void garage.refetch()} />;
  if (cars.length === 0) {
    return <EmptyState title="No cars in your garage" message="A run is logged on one of your cars and its setup. Add the car first." actionLabel="Add a car" onAction={() => router.push('/garage/add-car')} />;
  }
  const submit = (run: RunCreate) =>
    add.mutateAsync(run).then((created) => {
      setSaved(`${runName(created, day.runs.length)} saved with ${created.laps.length} lap${created.laps.length === 1 ? '' : 's'}.`);
      // The next run is usually the same car and setup on its next revision.
      setDraft({ ...EMPTY_RUN_DRAFT, carId: effective.carId, setupId: effective.setupId });
    });
  return (
    <RunForm
      cars={cars}
      draft={effective}
      onChange={(changes) => {
        setSaved(null);
        setDraft({ ...effective, ...changes });
      }}
      revisions={revisionChoices(effective.setupId, setup)}
      onSubmit={submit}
      pending={add.isPending}
      error={add.error}
      savedMessage={saved}
    />
  );
}

function DeleteDay({ day, carId }: { day: TrackDay; carId: number | null }) {
  const remove = useDeleteTrackDay(day.id);
  const runs = `${day.runs.length} run${day.runs.length === 1 ? '' : 's'}`;
  return (
    <View>
      <SetupConfirmButton
        label="Delete this track day"
        question={`Delete the day at ${day.track.name} with its ${runs} and their lap times? This cannot be undone.`}
        confirmLabel="Yes, delete the day"
        busyLabel="Deleting…"
        busy={remove.isPending}
        onConfirm={() => remove.mutate(undefined, { onSuccess: () => router.replace(trackDaysHref(carId)) })}
      />
      <FormErrorBanner message={describeError(remove.error, []).formError} />
    </View>
  );
}

function TrackDayBody({ id, carId }: { id: number; carId: number | null }) {
  const day = useTrackDayQuery(id);
  const units = useDisplayUnits();
  if (id === 0 || (day.isError && day.error instanceof ApiRequestError && day.error.status === 404)) {
    return (
      <EmptyState
        title="No track day at this address"
        message="It may have been deleted, or it belongs to another racer's garage."
        actionLabel="Your track days"
        onAction={() => router.replace(trackDaysHref(carId))}
      />
    );
  }
  if (day.isPending) return <LoadingState label="Loading the track day…" />;
  if (day.isError) return <ErrorState title="This track day could not load" message={day.error.message} onRetry={() => void day.refetch()} />;
  const runs = day.data.runs;
  return (
    <>
      <TrackDayHeader day={day.data} units={units} />
      <AppText variant="heading">Runs</AppText>
      {runs.length === 0 ? <AppText tone="muted">No runs yet: add the first one below.</AppText> : null}
      {runs.map((run, i) => (
        <RunCard key={run.id} run={run} position={i} />
      ))}
      <RunComparePicker runs={runs} />
      <Card role="region" aria-label="Add a run">
        <AppText variant="heading">Add a run</AppText>
        <AddRun day={day.data} preferredCarId={carId} />
      </Card>
      <DeleteDay day={day.data} carId={carId} />
    </>
  );
}

export default function TrackDayScreen() {
  const me = useMeQuery();
  const params = useLocalSearchParams<{ id: string; carId?: string }>();
  const id = idParam(params.id) ?? 0;
  const carId = idParam(params.carId);
  return (
    <Screen title="Track day" back={{ href: trackDaysHref(carId), label: 'Back to Track days' }}>
      <SignedInGate me={me} signInHref={signInHref(`/track-days/${id}`)}>
        {() => <TrackDayBody id={id} carId={carId} />}
      </SignedInGate>
    </Screen>
  );
}
