import { StyleSheet, View } from 'react-native';
import type { RunComparison } from '../shared/compute/trackday';
import { space, type as typeScale } from '../theme';
import { AppText } from './AppText';
import { Card } from './Card';

export type RunVerdictProps = {
  comparison: RunComparison;
  /** Laps each run counted, and how many the slow-lap rule set aside. */
  laps: { a: { used: number; setAside: number }; b: { used: number; setAside: number } };
};

/** "−0.210 s": signed, with a real minus sign, three decimals like lap times. */
export function signedSeconds(value: number): string {
  const sign = value < 0 ? '−' : value > 0 ? '+' : '';
  return `${sign}${Math.abs(value).toFixed(3)} s`;
}

const TONE = {
  'real-gain': 'success',
  'real-loss': 'danger',
  'no-clear-difference': 'default',
  identical: 'default',
  'no-spread': 'caution',
  'too-few-laps': 'caution',
} as const;

function lapsLine(name: string, laps: { used: number; setAside: number }): string {
  return `${name}: ${laps.used} lap${laps.used === 1 ? '' : 's'}${laps.setAside > 0 ? ` (${laps.setAside} slow set aside)` : ''}`;
}

/** The A/B answer in plain words first, then the numbers behind it. */
export function RunVerdict({ comparison, laps }: RunVerdictProps) {
  const level = `${Number((comparison.confidenceLevel * 100).toFixed(1))} %`;
  const interval = comparison.confidenceInterval;
  const details = [
    comparison.meanDifferenceSeconds === null ? null : `Mean lap time, B − A: ${signedSeconds(comparison.meanDifferenceSeconds)}`,
    interval ? `${level} confidence interval: ${signedSeconds(interval.lowSeconds)} to ${signedSeconds(interval.highSeconds)}` : null,
    comparison.welch ? `Welch’s t = ${comparison.welch.t.toFixed(2)} with ${comparison.welch.degreesOfFreedom.toFixed(1)} degrees of freedom` : null,
    `Laps counted: ${lapsLine('A', laps.a)}; ${lapsLine('B', laps.b)}`,
  ].filter((line): line is string => line !== null);
  return (
    <Card role="region" aria-label="Verdict">
      <AppText variant="heading">The verdict</AppText>
      <AppText role="status" tone={TONE[comparison.verdict]} style={styles.message}>
        {comparison.message}
      </AppText>
      <View role="list" style={styles.details}>
        {details.map((line) => (
          <AppText key={line} role="listitem" style={styles.numbers}>
            {line}
          </AppText>
        ))}
      </View>
      <AppText variant="caption" tone="muted">
        Welch’s two-sample t-test on the mean lap times, which does not assume the two runs scatter alike. The interval is where the real
        difference most likely lies: when it includes 0 these laps cannot tell the runs apart, and more laps narrow it. Slow laps the rule
        set aside are left out of both runs.
      </AppText>
    </Card>
  );
}

const styles = StyleSheet.create({
  message: { ...typeScale.heading },
  details: { gap: space.xs },
  numbers: { fontVariant: ['tabular-nums'] },
});
