import { StyleSheet, View } from 'react-native';
import { formatLapTime, type RunAnalysis } from '../shared/compute/trackday';
import { space, useTheme } from '../theme';
import { AppText } from './AppText';
import { Button } from './Button';
import { FormErrorBanner } from './FormErrorBanner';

export type RunSlowLapsProps = {
  laps: readonly number[];
  analysis: RunAnalysis;
  /** The racer's put-backs after the change: 0-based lap indexes. */
  onChangeIncluded: (includedSlowLaps: number[]) => void;
  pending: boolean;
  error: string | null;
};

function SlowLap({ index, seconds, back, onToggle, pending, first }: { index: number; seconds: number; back: boolean; onToggle: () => void; pending: boolean; first: boolean }) {
  const { colors } = useTheme();
  const lap = `Lap ${index + 1}`;
  return (
    <View role="listitem" style={[styles.lap, first ? null : { borderTopWidth: 1, borderColor: colors.border }]}>
      <AppText style={styles.text}>
        {lap}: {formatLapTime(seconds)} — {back ? 'counted: you put it back in' : 'set aside'}
      </AppText>
      <Button
        label={back ? 'Set aside again' : 'Put back in'}
        accessibilityLabel={back ? `Set ${lap.toLowerCase()} aside again` : `Put ${lap.toLowerCase()} back in`}
        variant="secondary"
        disabled={pending}
        onPress={onToggle}
      />
    </View>
  );
}

/**
 * The laps the slow-lap rule took for crashes or pit stops, the rule in words with this run's
 * numbers, and a way to count any of them after all (a slow lap that was just a slow lap).
 */
export function RunSlowLaps({ laps, analysis, onChangeIncluded, pending, error }: RunSlowLapsProps) {
  const flagged = analysis.rule.flaggedIndices;
  const included = analysis.includedBackIndices;
  const toggle = (index: number) =>
    onChangeIncluded(included.includes(index) ? included.filter((i) => i !== index) : [...included, index].sort((x, y) => x - y));
  return (
    <View style={styles.group}>
      <AppText tone="muted">{analysis.rule.ruleDescription}</AppText>
      {flagged.length === 0 ? (
        <AppText>No lap was slow enough to set aside: every lap counts.</AppText>
      ) : (
        <View role="list" aria-label="Slow laps">
          {flagged.map((index, i) => (
            <SlowLap key={index} index={index} seconds={laps[index]} back={included.includes(index)} onToggle={() => toggle(index)} pending={pending} first={i === 0} />
          ))}
        </View>
      )}
      <FormErrorBanner message={error} />
    </View>
  );
}

const styles = StyleSheet.create({
  group: { gap: space.sm },
  lap: { flexDirection: 'row', flexWrap: 'wrap', alignItems: 'center', justifyContent: 'space-between', gap: space.sm, paddingVertical: space.sm },
  text: { flexShrink: 1, fontVariant: ['tabular-nums'] },
});
