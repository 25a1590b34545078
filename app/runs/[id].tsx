import { router, useLocalSearchParams } from 'expo-router';
import { View } from 'react-native';
import { AppText } from '../../components/AppText';
import { Card } from '../../components/Card';
import { ChartLapTimes } from '../../components/ChartLapTimes';
import { FormErrorBanner } from '../../components/FormErrorBanner';
import { RunLapTable } from '../../components/RunLapTable';
import { RunSlowLaps } from '../../components/RunSlowLaps';
import { RunStatistics } from '../../components/RunStatistics';
import { Screen } from '../../components/Screen';
import { SetupConfirmButton } from '../../components/SetupConfirmButton';
import { SignedInGate } from '../../components/SignedInGate';
import { EmptyState, ErrorState, LoadingState } from '../../components/StatusViews';
import { TextLink } from '../../components/TextLink';
import { ApiRequestError } from '../../hooks/api';
import { signInHref, useMeQuery } from '../../hooks/auth';
import { describeError } from '../../hooks/form';
import { analyzeRunLaps, compareRunsHref, idParam, runHref, runName, useDeleteRun, useTrackDayQuery, useUpdateRun } from '../../hooks/trackDays';
import type { Run, TrackDay } from '../../shared/types/trackdays';

function messageOf(error: unknown): string | null {
  return describeError(error, []).formError;
}

/** Links to compare this run with each other run of the day, the earlier run as the baseline. */
function CompareLinks({ day, run }: { day: TrackDay; run: Run }) {
  const others = day.runs.map((other, i) => ({ other, i })).filter(({ other }) => other.id !== run.id);
  if (others.length === 0) return null;
  const position = day.runs.findIndex((r) => r.id === run.id);
  return (
    <Card role="region" aria-label="Compare with another run">
      <AppText variant="heading">Compare with another run</AppText>
      {others.map(({ other, i }) => (
        <TextLink key={other.id} href={i < position ? compareRunsHref(other.id, run.id) : compareRunsHref(run.id, other.id)} label={`Compare with ${runName(other, i)}`} />
      ))}
    </Card>
  );
}

function RunBody({ day, run }: { day: TrackDay; run: Run }) {
  const update = useUpdateRun(day.id);
  const remove = useDeleteRun(day.id);
  const analysis = analyzeRunLaps(run);
  const position = day.runs.findIndex((r) => r.id === run.id);
  const name = runName(run, position);
  return (
    <>
      <Card>
        <AppText variant="heading">{name}</AppText>
        <AppText tone="muted">
          {run.car.nickname} · {run.setup.title} · revision {run.revision.number}
        </AppText>
        <TextLink href={`/setups/${run.setup.id}`} label="Open the setup" />
      </Card>
      {analysis ? (
        <>
          <Card role="region" aria-label="Statistics">
            <AppText variant="heading">Statistics</AppText>
            <RunStatistics analysis={analysis} />
          </Card>
          <Card role="region" aria-label="Slow laps">
            <AppText variant="heading">Slow laps</AppText>
            <RunSlowLaps
              laps={run.laps}
              analysis={analysis}
              onChangeIncluded={(includedSlowLaps) => update.mutate({ runId: run.id, changes: { includedSlowLaps } })}
              pending={update.isPending}
              error={messageOf(update.error)}
            />
          </Card>
          <Card role="region" aria-label="Laps">
            <AppText variant="heading">Laps</AppText>
            <ChartLapTimes series={[{ name, laps: run.laps, setAside: analysis.setAsideIndices }]} />
            <RunLapTable label={`Lap times of ${name}`} columns={[{ name: 'Time', laps: run.laps, setAside: analysis.setAsideIndices }]} />
          </Card>
        </>
      ) : (
        <EmptyState title="No laps in this run" message="Its lap times were not logged. Log the next run with its laps from the track day." />
      )}
      {run.feelNotes ? (
        <Card>
          <AppText variant="heading">How the car felt</AppText>
          <AppText>{run.feelNotes}</AppText>
        </Card>
      ) : null}
      <CompareLinks day={day} run={run} />
      <View>
        <SetupConfirmButton
          label="Delete this run"
          question={`Delete ${name} and its ${run.laps.length} lap times? This cannot be undone.`}
          confirmLabel="Yes, delete the run"
          busyLabel="Deleting…"
          busy={remove.isPending}
          onConfirm={() => remove.mutate(run.id, { onSuccess: () => router.replace(`/track-days/${day.id}`) })}
        />
        <FormErrorBanner message={messageOf(remove.error)} />
      </View>
    </>
  );
}

function RunPage({ runId, dayId }: { runId: number; dayId: number | null }) {
  const day = useTrackDayQuery(dayId ?? 0);
  const missing = (
    <EmptyState title="No run at this address" message="It may have been deleted. Open it again from its track day." actionLabel="Your track days" onAction={() => router.replace('/track-days')} />
  );
  if (dayId === null || (day.isError && day.error instanceof ApiRequestError && day.error.status === 404)) return missing;
  if (day.isPending) return <LoadingState label="Loading the run…" />;
  if (day.isError) return <ErrorState title="This run could not load" message={day.error.message} onRetry={() => void day.refetch()} />;
  const run = day.data.runs.find((r) => r.id === runId);
  if (!run) return missing;
  return <RunBody day={day.data} run={run} />;
}

export default function RunScreen() {
  const me = useMeQuery();
  const params = useLocalSearchParams<{ id: string; day?: string }>();
  const runId = idParam(params.id) ?? 0;
  const dayId = idParam(params.day);
  const back = dayId ? { href: `/track-days/${dayId}`, label: 'Back to the track day' } : { href: '/track-days', label: 'Back to Track days' };
  return (
    <Screen title="Run" back={back}>
      <SignedInGate me={me} signInHref={signInHref(runHref({ id: runId, trackDayId: dayId ?? 0 }))}>
        {() => <RunPage runId={runId} dayId={dayId} />}
      </SignedInGate>
    </Screen>
  );
}
