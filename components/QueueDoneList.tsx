import { StyleSheet, View } from 'react-native';
import { REPORT_TARGET_LABELS, type QueueAction, type QueueItem } from '../shared/types/moderation';
import { radius, space, useTheme } from '../theme';
import { AppText } from './AppText';

export type QueueDoneEntry = { key: string; text: string };

/** What was done, in a line: "Hidden: setup “…” — 3 reports resolved." */
export function doneText(item: QueueItem, action: QueueAction | 'appeal-upheld' | 'appeal-overturned', resolved: number): string {
  const what = `${REPORT_TARGET_LABELS[item.targetType].toLowerCase()} “${item.content.title}”`;
  const who = `@${item.author.handle}`;
  const lines: Record<typeof action, string> = {
    hide: `Hidden: ${what}`,
    restore: `Restored: ${what}`,
    dismiss: `Reports dismissed, left as it is: ${what}`,
    warn: `Warned ${who} about ${what}`,
    suspend: `Suspended ${who} (reported for ${what})`,
    'hide-all': `Hid everything by ${who}`,
    'appeal-upheld': `Appeal upheld: ${what}`,
    'appeal-overturned': `Appeal overturned: ${what}`,
  };
  const reports = resolved > 0 ? ` — ${resolved} report${resolved === 1 ? '' : 's'} resolved` : '';
  return `${lines[action]}${reports}.`;
}

export type QueueDoneListProps = { entries: QueueDoneEntry[] };

/** What this moderator just did, newest first: rows leave the queue once acted on, so they are recorded here. */
export function QueueDoneList({ entries }: QueueDoneListProps) {
  const { colors } = useTheme();
  if (entries.length === 0) return null;
  return (
    <View
      role="region"
      aria-label="Done just now"
      style={[styles.box, { backgroundColor: colors.successSoft, borderColor: colors.success }]}
    >
      <AppText style={[styles.bold, { color: colors.success }]}>Done just now</AppText>
      <View role="log" aria-live="polite">
        {entries.map((entry) => (
          <AppText key={entry.key} style={{ color: colors.success }}>
            ✓ {entry.text}
          </AppText>
        ))}
      </View>
    </View>
  );
}

const styles = StyleSheet.create({
  box: { borderWidth: 1, borderLeftWidth: space.xs, borderRadius: radius.md, padding: space.md, gap: space.xs },
  bold: { fontWeight: '700' },
});
