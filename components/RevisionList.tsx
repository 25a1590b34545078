import { useState } from 'react';
import { StyleSheet, View } from 'react-native';
import type { RevisionSummary } from '../shared/types/setups';
import { space, useTheme } from '../theme';
import { AppText } from './AppText';
import { Button } from './Button';
import { Card } from './Card';
import { ModerationPill } from './ModerationPill';
import { formatDay } from './SetupSheetFormat';
import { TextLink } from './TextLink';

export type RevisionListProps = {
  /** Newest first, as the API returns them. */
  revisions: RevisionSummary[];
};

// Enough to see the recent story of a setup without a long scroll on a phone.
const FIRST_SHOWN = 5;

function changedText(revision: RevisionSummary): string {
  if (revision.number === 1) return 'Starting sheet';
  const n = revision.changedFieldCount;
  return n === 0 ? 'No values changed' : `${n} field${n === 1 ? '' : 's'} changed`;
}

function RevisionItem({ revision, first }: { revision: RevisionSummary; first: boolean }) {
  const { colors } = useTheme();
  return (
    <View role="listitem" style={[styles.item, first ? null : { borderTopWidth: 1, borderColor: colors.border }]}>
      <AppText style={styles.bold}>
        Revision {revision.number} · {changedText(revision)}
      </AppText>
      {revision.noteHidden ? <ModerationPill label="Change note hidden by moderators" tone="waiting" /> : null}
      {revision.noteHidden && !revision.changeNote ? null : <AppText>{revision.changeNote || 'No change note.'}</AppText>}
      <View style={styles.meta}>
        <AppText variant="caption" tone="muted">
          {formatDay(revision.createdAt)} by
        </AppText>
        <TextLink href={`/racers/${revision.authorHandle}`} label={`@${revision.authorHandle}`} />
      </View>
    </View>
  );
}

/** Every saved revision with why it was made, newest first. */
export function RevisionList({ revisions }: RevisionListProps) {
  const [showAll, setShowAll] = useState(false);
  const shown = showAll ? revisions : revisions.slice(0, FIRST_SHOWN);
  return (
    <Card>
      <AppText variant="heading">History</AppText>
      <View role="list" aria-label="Revisions">
        {shown.map((revision, i) => (
          <RevisionItem key={revision.id} revision={revision} first={i === 0} />
        ))}
      </View>
      {revisions.length > FIRST_SHOWN ? (
        <Button
          label={showAll ? 'Show only the latest' : `Show all ${revisions.length} revisions`}
          variant="secondary"
          onPress={() => setShowAll((s) => !s)}
        />
      ) : null}
    </Card>
  );
}

const styles = StyleSheet.create({
  item: { paddingVertical: space.sm, gap: space.xs },
  bold: { fontWeight: '700' },
  meta: { flexDirection: 'row', flexWrap: 'wrap', alignItems: 'center', gap: space.xs },
});
