import { StyleSheet, View } from 'react-native';
import type { AuditEntry } from '../shared/types/moderation';
import { space, useTheme } from '../theme';
import { AppText } from './AppText';

export type AuditEntryRowProps = { entry: AuditEntry; first?: boolean };

function show(value: unknown): string {
  if (value === undefined) return '—';
  if (value === null) return 'none';
  if (typeof value === 'string') return value;
  return JSON.stringify(value);
}

/** The fields that changed, as "hidden: no → yes"; unchanged ones are left out. */
export function stateChanges(previous: Record<string, unknown>, next: Record<string, unknown>): string[] {
  const keys = [...new Set([...Object.keys(previous), ...Object.keys(next)])];
  return keys
    .filter((key) => JSON.stringify(previous[key]) !== JSON.stringify(next[key]))
    .map((key) => `${key}: ${show(previous[key])} → ${show(next[key])}`);
}

function when(iso: string): string {
  const date = new Date(iso);
  return Number.isNaN(date.getTime()) ? iso : date.toLocaleString(undefined, { day: 'numeric', month: 'short', year: 'numeric', hour: '2-digit', minute: '2-digit' });
}

/** One line of the audit log: who did what to which thing, why, and what changed. */
export function AuditEntryRow({ entry, first }: AuditEntryRowProps) {
  const { colors } = useTheme();
  const changes = stateChanges(entry.previousState, entry.newState);
  const target = `${entry.targetType}${entry.targetId !== null ? ` #${entry.targetId}` : ''}${entry.subjectHandle ? ` · @${entry.subjectHandle}` : ''}`;
  return (
    <View role="listitem" style={[styles.item, first ? null : { borderTopWidth: 1, borderColor: colors.border }]}>
      <View style={styles.row}>
        <AppText style={styles.bold}>{entry.action}</AppText>
        <AppText variant="caption" tone="muted">
          {when(entry.createdAt)}
        </AppText>
      </View>
      <AppText variant="caption" tone="muted">
        {entry.actorHandle ? `by @${entry.actorHandle}${entry.actorRole ? ` (${entry.actorRole})` : ''}` : 'by the system'} · on {target}
      </AppText>
      {entry.reason ? <AppText>“{entry.reason}”</AppText> : null}
      {changes.map((change) => (
        <AppText key={change} variant="caption">
          {change}
        </AppText>
      ))}
    </View>
  );
}

const styles = StyleSheet.create({
  item: { paddingVertical: space.md, gap: 2 },
  row: { flexDirection: 'row', flexWrap: 'wrap', alignItems: 'baseline', columnGap: space.sm },
  bold: { fontWeight: '700' },
});
