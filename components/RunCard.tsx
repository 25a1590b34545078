import { StyleSheet, View } from 'react-native';
import { analyzeRunLaps, runHref, runName } from '../hooks/trackDays';
import { formatLapTime } from '../shared/compute/trackday';
import type { Run } from '../shared/types/trackdays';
import { space } from '../theme';
import { AppText } from './AppText';
import { Card } from './Card';
import { TextLink } from './TextLink';

export type RunCardProps = { run: Run; /** 0-based place in the day, for unnamed runs. */ position: number };

/** "14 laps · best 31.902 · mean 32.511 · 1 set aside" from the laps that count. */
export function runFacts(run: Pick<Run, 'laps' | 'includedSlowLaps'>): string {
  const analysis = analyzeRunLaps(run);
  if (!analysis) return 'No laps';
  const kept = analysis.keptLaps;
  const parts = [
    `${run.laps.length} lap${run.laps.length === 1 ? '' : 's'}`,
    `best ${formatLapTime(kept.bestLapSeconds)}`,
    `mean ${formatLapTime(kept.meanSeconds)}`,
  ];
  if (analysis.setAsideIndices.length > 0) parts.push(`${analysis.setAsideIndices.length} slow set aside`);
  return parts.join(' · ');
}

/** One run of the day: what ran and how fast, and the way to its statistics. */
export function RunCard({ run, position }: RunCardProps) {
  const name = runName(run, position);
  return (
    <Card role="article" aria-label={name}>
      <AppText variant="heading" aria-level={3}>
        {name}
      </AppText>
      <AppText tone="muted">
        {run.car.nickname} · {run.setup.title} · revision {run.revision.number}
      </AppText>
      <AppText style={styles.facts}>{runFacts(run)}</AppText>
      {run.feelNotes ? (
        <AppText numberOfLines={3} tone="muted">
          “{run.feelNotes}”
        </AppText>
      ) : null}
      <View style={styles.links}>
        <TextLink href={runHref(run)} label={`Statistics and laps of ${name}`} />
      </View>
    </Card>
  );
}

const styles = StyleSheet.create({
  facts: { fontWeight: '700', fontVariant: ['tabular-nums'] },
  links: { flexDirection: 'row', flexWrap: 'wrap', gap: space.md },
});
