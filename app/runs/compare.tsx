import { router, useLocalSearchParams } from 'expo-router';
import { StyleSheet, View } from 'react-native';
import { AppText } from '../../components/AppText';
import { Button } from '../../components/Button';
import { Card } from '../../components/Card';
import { ChartLapDistribution } from '../../components/ChartLapDistribution';
import { ChartLapTimes } from '../../components/ChartLapTimes';
import { RunLapTable } from '../../components/RunLapTable';
import { RunRevisionDiff, type RunSheet } from '../../components/RunRevisionDiff';
import { RunVerdict } from '../../components/RunVerdict';
import { SetupPageFrame } from '../../components/SetupPageFrame';
import { SignedInGate } from '../../components/SignedInGate';
import { EmptyState, ErrorState, LoadingState } from '../../components/StatusViews';
import { TextLink } from '../../components/TextLink';
import { ApiRequestError } from '../../hooks/api';
import { signInHref, useMeQuery } from '../../hooks/auth';
import { useDisplayUnits } from '../../hooks/garageUi';
import { analyzeRunLaps, compareRunsHref, idParam, runHref, useRunPairQuery } from '../../hooks/trackDays';
import { compareRuns } from '../../shared/compute/trackday';
import type { RunPair } from '../../shared/types/trackdays';
import { space, useTheme } from '../../theme';

type PairRun = RunPair['a'];

/** A run's own name, or what it ran when it has none. */
function nameOf(run: PairRun): string {
  return run.label.trim() || `${run.setup.title}, revision ${run.revision.number}`;
}

function sheetOf(run: PairRun): RunSheet {
  return { setupId: run.setup.id, setupTitle: run.setup.title, revisionId: run.revision.id, revisionNumber: run.revision.number, vehicleClass: run.vehicleClass, values: run.values };
}

/** The laps that count and those the slow-lap rule set aside. */
function lapsOf(run: PairRun) {
  const analysis = analyzeRunLaps(run);
  const setAside = analysis?.setAsideIndices ?? [];
  return { all: run.laps, setAside, counted: run.laps.filter((_, i) => !setAside.includes(i)) };
}

function Side({ position, run }: { position: 'A' | 'B'; run: PairRun }) {
  return (
    <Card>
      <AppText variant="heading" aria-level={3}>
        {position}: {nameOf(run)}
      </AppText>
      <AppText tone="muted">
        {run.car.nickname} · {run.setup.title} · revision {run.revision.number}
      </AppText>
      <TextLink href={runHref(run)} label={`Statistics of run ${position}`} />
    </Card>
  );
}

function Comparison({ pair }: { pair: RunPair }) {
  const { isWide } = useTheme();
  const units = useDisplayUnits();
  const [a, b] = [lapsOf(pair.a), lapsOf(pair.b)];
  const comparison = compareRuns(a.counted, b.counted);
  const names = { a: `A: ${nameOf(pair.a)}`, b: `B: ${nameOf(pair.b)}` };
  return (
    <>
      <View style={isWide ? styles.sides : styles.stack}>
        <View style={isWide ? styles.side : null}>
          <Side position="A" run={pair.a} />
        </View>
        <View style={isWide ? styles.side : null}>
          <Side position="B" run={pair.b} />
        </View>
      </View>
      <View style={styles.actions}>
        <Button label="Swap A and B" variant="secondary" accessibilityLabel="Swap the baseline and the change" onPress={() => router.replace(compareRunsHref(pair.b.id, pair.a.id))} />
      </View>
      <RunVerdict comparison={comparison} laps={{ a: { used: a.counted.length, setAside: a.setAside.length }, b: { used: b.counted.length, setAside: b.setAside.length } }} />
      <RunRevisionDiff a={sheetOf(pair.a)} b={sheetOf(pair.b)} units={units} wide={isWide} />
      <View style={isWide ? styles.sides : styles.stack}>
        <Card style={isWide ? styles.side : null}>
          <AppText variant="heading">Lap by lap</AppText>
          <ChartLapTimes series={[{ name: names.a, laps: a.all, setAside: a.setAside }, { name: names.b, laps: b.all, setAside: b.setAside }]} />
        </Card>
        <Card style={isWide ? styles.side : null}>
          <AppText variant="heading">How the laps spread</AppText>
          <ChartLapDistribution series={[{ name: names.a, laps: a.counted }, { name: names.b, laps: b.counted }]} />
        </Card>
      </View>
      <Card>
        <AppText variant="heading">Every lap</AppText>
        <RunLapTable label="Lap times of run A and run B" columns={[{ name: 'A', laps: a.all, setAside: a.setAside }, { name: 'B', laps: b.all, setAside: b.setAside }]} />
      </Card>
    </>
  );
}

function CompareBody({ a, b }: { a: number | null; b: number | null }) {
  const pair = useRunPairQuery(a ?? 0, b ?? 0);
  if (a === null || b === null || a === b) {
    return (
      <EmptyState
        title="Pick two runs to compare"
        message="Open a track day and choose a run before the change as A and one with it as B."
        actionLabel="Your track days"
        onAction={() => router.replace('/track-days')}
      />
    );
  }
  if (pair.isPending) return <LoadingState label="Loading the two runs…" />;
  if (pair.isError && pair.error instanceof ApiRequestError && pair.error.status === 404) {
    return <ErrorState title="These runs cannot be compared" message="One of them was deleted or is not in your garage. Pick the runs again from the track day." />;
  }
  if (pair.isError) return <ErrorState title="The runs could not load" message={pair.error.message} onRetry={() => void pair.refetch()} />;
  return <Comparison pair={pair.data} />;
}

export default function RunCompareScreen() {
  const me = useMeQuery();
  const params = useLocalSearchParams<{ a?: string; b?: string }>();
  const [a, b] = [idParam(params.a), idParam(params.b)];
  // The same query the body reads (shared through the cache): once loaded, "back" goes to B's day.
  const pair = useRunPairQuery(a ?? 0, b ?? 0);
  const back = pair.data ? { href: `/track-days/${pair.data.b.trackDayId}`, label: 'Back to the track day' } : { href: '/track-days', label: 'Back to Track days' };
  return (
    <SetupPageFrame title="Compare runs" back={back}>
      <SignedInGate me={me} signInHref={signInHref(a && b ? compareRunsHref(a, b) : '/track-days')}>
        {() => <CompareBody a={a} b={b} />}
      </SignedInGate>
    </SetupPageFrame>
  );
}

const styles = StyleSheet.create({
  sides: { flexDirection: 'row', alignItems: 'stretch', gap: space.lg },
  side: { flex: 1, minWidth: 0 },
  stack: { gap: space.lg },
  actions: { flexDirection: 'row', flexWrap: 'wrap', gap: space.md },
});
