import { StyleSheet, View } from 'react-native';
import type { FeedItem } from '../shared/types/community';
import { vehicleClassLabel } from '../shared/types/vehicleClasses';
import { space, useTheme } from '../theme';
import { AppText } from './AppText';
import { Card } from './Card';
import { formatCommentTime } from './CommentItem';
import { TextLink } from './TextLink';

export type FeedEntryProps = {
  item: FeedItem;
  /** The time "3 h ago" is measured against, in ms since 1970. */
  now: number;
};

/** What happened, in a few words after the racer's handle. */
export function feedSummary(item: FeedItem): string {
  if (item.kind === 'revision') return `saved revision ${item.revision.number} of a setup`;
  if (item.kind === 'fork') return 'forked your setup';
  return 'published a new setup';
}

/** The comparison of a revision with the one before it: what the change changed. */
export function revisionChangeHref(setupId: number, number: number): string {
  return `/compare?a=${setupId}&ar=${number - 1}&b=${setupId}&br=${number}`;
}

function ForkLinks({ item }: { item: Extract<FeedItem, { kind: 'fork' }> }) {
  return (
    <View style={styles.links}>
      <TextLink href={`/setups/${item.original.id}`} label={item.original.title} />
      <AppText tone="muted">into</AppText>
      <TextLink href={`/setups/${item.setup.id}`} label={item.setup.title} />
    </View>
  );
}

/** One thing in the activity feed: who, what, which setup, and the change note for a revision. */
export function FeedEntry({ item, now }: FeedEntryProps) {
  const { colors } = useTheme();
  return (
    <Card role="article">
      <View style={styles.header}>
        <TextLink href={`/racers/${item.actor.handle}`} label={`@${item.actor.handle}`} />
        <AppText>{feedSummary(item)}</AppText>
      </View>
      {item.kind === 'fork' ? <ForkLinks item={item} /> : <TextLink href={`/setups/${item.setup.id}`} label={item.setup.title} />}
      <AppText variant="caption" tone="muted">
        {vehicleClassLabel(item.setup.vehicleClass)} · {formatCommentTime(item.createdAt, now)}
      </AppText>
      {item.kind === 'revision' ? (
        <>
          {item.revision.changeNote ? (
            <View style={[styles.note, { borderColor: colors.border }]}>
              <AppText numberOfLines={4}>{item.revision.changeNote}</AppText>
            </View>
          ) : (
            <AppText tone="muted">No change note.</AppText>
          )}
          <TextLink href={revisionChangeHref(item.setup.id, item.revision.number)} label={`What changed in revision ${item.revision.number}`} />
        </>
      ) : null}
    </Card>
  );
}

const styles = StyleSheet.create({
  header: { flexDirection: 'row', flexWrap: 'wrap', alignItems: 'center', columnGap: space.sm },
  links: { flexDirection: 'row', flexWrap: 'wrap', alignItems: 'center', columnGap: space.sm },
  note: { borderLeftWidth: 3, paddingLeft: space.md },
});
