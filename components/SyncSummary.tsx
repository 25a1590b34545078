import { StyleSheet, View } from 'react-native';
import type { UpstreamRow } from '../shared/types/forks';
import { space } from '../theme';
import { AppText } from './AppText';

export type SyncSummaryProps = {
  rows: readonly UpstreamRow[];
  payload: { take: readonly string[]; dismiss: readonly string[] };
};

function fields(n: number): string {
  return `${n} field${n === 1 ? '' : 's'}`;
}

function labels(rows: readonly UpstreamRow[]): string {
  return rows.map((row) => row.label).join(', ');
}

/** In words, what pressing Apply will do to the fork, before anything is sent. */
export function SyncSummary({ rows, payload }: SyncSummaryProps) {
  const taken = rows.filter((row) => payload.take.includes(row.key));
  const dismissed = rows.filter((row) => payload.dismiss.includes(row.key));
  const untouched = rows.filter((row) => !payload.take.includes(row.key) && !payload.dismiss.includes(row.key));
  const keptConflicts = untouched.filter((row) => row.status === 'conflict');
  const later = untouched.filter((row) => row.status === 'theirs-only');
  const lines = [
    taken.length > 0 ? `Takes the original’s value for ${fields(taken.length)}: ${labels(taken)}. Your fork gets a new revision with them.` : null,
    keptConflicts.length > 0 ? `Keeps your value for ${fields(keptConflicts.length)} you both changed: ${labels(keptConflicts)}.` : null,
    later.length > 0 ? `Leaves ${fields(later.length)} to decide later: ${labels(later)}.` : null,
    dismissed.length > 0 ? `Stops offering ${fields(dismissed.length)} until the original changes them again: ${labels(dismissed)}.` : null,
  ].filter((line): line is string => line !== null);
  return (
    <View role="region" aria-label="What will happen" style={styles.summary}>
      <AppText style={styles.bold}>What will happen</AppText>
      {taken.length === 0 && dismissed.length === 0 ? (
        <AppText tone="muted">Nothing yet: tick “Take” or choose “Take theirs” for the values you want, or stop offering a field.</AppText>
      ) : null}
      {lines.map((line) => (
        <AppText key={line}>• {line}</AppText>
      ))}
    </View>
  );
}

const styles = StyleSheet.create({
  summary: { gap: space.xs },
  bold: { fontWeight: '700' },
});
