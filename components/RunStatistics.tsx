import { StyleSheet, View } from 'react-native';
import { formatLapTime, type RunAnalysis } from '../shared/compute/trackday';
import { space, useTheme } from '../theme';
import { AppText } from './AppText';

export type RunStatisticsProps = { analysis: RunAnalysis };

type Line = { label: string; value: string; note?: string };

/** The figures racers read off a run, from the laps that count. */
export function statisticLines({ keptLaps: s, allLaps, setAsideIndices }: RunAnalysis): Line[] {
  const three = s.bestThreeConsecutive;
  return [
    {
      label: 'Laps',
      value: setAsideIndices.length > 0 ? `${s.lapCount} of ${allLaps.lapCount}` : String(s.lapCount),
      note: setAsideIndices.length > 0 ? 'Slow laps set aside are left out of every figure below.' : undefined,
    },
    { label: 'Best lap', value: `${formatLapTime(s.bestLapSeconds)} (lap ${s.bestLapIndex + 1})` },
    { label: 'Mean', value: formatLapTime(s.meanSeconds) },
    { label: 'Median', value: formatLapTime(s.medianSeconds) },
    {
      label: 'Standard deviation',
      value: s.standardDeviationSeconds === null ? 'Needs 2 laps' : `${s.standardDeviationSeconds.toFixed(3)} s`,
    },
    {
      label: 'Consistency',
      value: s.consistencyPercent === null ? 'Needs 2 laps' : `${s.consistencyPercent.toFixed(1)} %`,
      note: '100 % would be every lap in the same time; each point below is 1 % of the mean lap in lap-to-lap spread.',
    },
    {
      label: 'Best three in a row',
      value: three ? `${formatLapTime(three.totalSeconds)} (laps ${three.startIndex + 1}–${three.startIndex + three.lapCount})` : 'Needs 3 laps in a row',
    },
  ];
}

/** A run's statistics as a list of figure and value. */
export function RunStatistics({ analysis }: RunStatisticsProps) {
  const { colors } = useTheme();
  return (
    <View role="list" aria-label="Run statistics">
      {statisticLines(analysis).map((line, i) => (
        <View key={line.label} role="listitem" style={[styles.line, i > 0 ? { borderTopWidth: 1, borderColor: colors.border } : null]}>
          <View style={styles.pair}>
            <AppText style={styles.label}>{line.label}</AppText>
            <AppText style={styles.value}>{line.value}</AppText>
          </View>
          {line.note ? (
            <AppText variant="caption" tone="muted">
              {line.note}
            </AppText>
          ) : null}
        </View>
      ))}
    </View>
  );
}

const styles = StyleSheet.create({
  line: { paddingVertical: space.sm, gap: 2 },
  pair: { flexDirection: 'row', flexWrap: 'wrap', justifyContent: 'space-between', columnGap: space.md },
  label: { fontWeight: '700' },
  value: { fontVariant: ['tabular-nums'], textAlign: 'right' },
});
