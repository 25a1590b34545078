import type { ReactNode } from 'react';
import { StyleSheet, View } from 'react-native';
import { ACTION_OUTCOME_TEXT, REPORT_REASON_LABELS, REPORT_TARGET_LABELS, type QueueItem } from '../shared/types/moderation';
import { space } from '../theme';
import { AppText } from './AppText';
import { Card } from './Card';
import { ModerationPill } from './ModerationPill';
import { QueueAuthorFacts } from './QueueAuthorFacts';
import { QueueContentPreview } from './QueueContentPreview';
import { formatDay } from './SetupSheetFormat';

export type QueueItemCardProps = {
  item: QueueItem;
  now: number;
  /** The row's actions (or appeal decision), below the facts. */
  children: ReactNode;
};

const NOTES_SHOWN = 3;

/** "Spam or advertising ×3 · Abusive ×1". */
export function reasonsText(reasons: QueueItem['reasons']): string {
  return reasons.map((r) => `${REPORT_REASON_LABELS[r.reason].label} ×${r.count}`).join(' · ');
}

export function queueItemKey(item: Pick<QueueItem, 'targetType' | 'targetId' | 'appeal'>): string {
  return item.appeal ? `appeal:${item.appeal.id}` : `${item.targetType}:${item.targetId}`;
}

function Header({ item }: { item: QueueItem }) {
  const { content } = item;
  return (
    <View style={styles.row}>
      {item.appeal ? <ModerationPill label="Appeal" tone="waiting" /> : null}
      <ModerationPill label={REPORT_TARGET_LABELS[item.targetType]} />
      {content.hiddenAt ? <ModerationPill label={content.autoHidden ? 'Hidden automatically' : 'Hidden'} tone="waiting" /> : null}
      <AppText variant="caption" tone="muted">
        {item.reportCount > 0 ? `${item.reportCount} report${item.reportCount === 1 ? '' : 's'}` : 'No open reports'}
        {item.firstReportedAt ? ` · first ${formatDay(item.firstReportedAt)}` : ''}
      </AppText>
    </View>
  );
}

function Reports({ item }: { item: QueueItem }) {
  if (item.reportCount === 0) return null;
  const more = item.notes.length - NOTES_SHOWN;
  return (
    <View style={styles.stack}>
      <AppText style={styles.bold}>{reasonsText(item.reasons)}</AppText>
      {item.notes.slice(0, NOTES_SHOWN).map((note, i) => (
        <AppText key={i} tone="muted">
          “{note}”
        </AppText>
      ))}
      {more > 0 ? (
        <AppText variant="caption" tone="muted">
          and {more} more note{more === 1 ? '' : 's'}
        </AppText>
      ) : null}
    </View>
  );
}

function Appeal({ appeal }: { appeal: NonNullable<QueueItem['appeal']> }) {
  return (
    <View style={styles.stack}>
      <AppText>
        <AppText style={styles.bold}>Appealed: </AppText>
        {ACTION_OUTCOME_TEXT[appeal.action.action]} ({formatDay(appeal.action.createdAt)}) “{appeal.action.reason}”
      </AppText>
      <AppText>
        <AppText style={styles.bold}>The author says: </AppText>“{appeal.text}”
      </AppText>
    </View>
  );
}

/** One row of the review queue: what was reported and why, the thing itself, who posted it. */
export function QueueItemCard({ item, now, children }: QueueItemCardProps) {
  const title = `${REPORT_TARGET_LABELS[item.targetType]}: ${item.content.title}`;
  return (
    <Card role="article" aria-label={item.appeal ? `Appeal about ${title}` : title}>
      <Header item={item} />
      {item.appeal ? <Appeal appeal={item.appeal} /> : null}
      <Reports item={item} />
      <QueueContentPreview content={item.content} />
      <QueueAuthorFacts author={item.author} now={now} />
      {children}
    </Card>
  );
}

const styles = StyleSheet.create({
  row: { flexDirection: 'row', flexWrap: 'wrap', alignItems: 'center', gap: space.sm },
  stack: { gap: space.xs },
  bold: { fontWeight: '700' },
});
