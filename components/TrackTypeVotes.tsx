import { StyleSheet, View } from 'react-native';
import { useMeQuery } from '../hooks/auth';
import { useSetupVotesQuery, useVoteMutation } from '../hooks/votes';
import type { SetupVotes } from '../shared/types/community';
import { space } from '../theme';
import { AppText } from './AppText';
import { Card } from './Card';
import { ErrorState, LoadingState } from './StatusViews';
import { TextLink } from './TextLink';
import { TrackTypeVotesRow } from './TrackTypeVotesRow';

export type TrackTypeVotesProps = {
  setupId: number;
  /** The viewer owns the setup: they see the counts and cannot vote. */
  isOwner: boolean;
  /** The share token an unlisted setup was opened with. */
  share?: string;
};

function intro(isOwner: boolean): string {
  return isOwner
    ? 'What other racers say about this setup on each track surface.'
    : 'Say where this setup worked for you: one vote per surface, which you can change or withdraw.';
}

/** Why there are no vote buttons, with the way to sign in when that is the reason. */
function VotingNote({ votes, isOwner, signedIn }: { votes: SetupVotes; isOwner: boolean; signedIn: boolean }) {
  if (votes.canVote || isOwner) return null;
  return (
    <View style={styles.note}>
      <AppText tone="muted">{votes.cannotVoteReason}</AppText>
      {signedIn ? null : <TextLink href={`/sign-in?next=${encodeURIComponent(`/setups/${votes.setupId}`)}`} label="Sign in to vote" />}
    </View>
  );
}

/**
 * The setup page's "where it works": per track type of the fixed list, how many racers say the
 * setup works or doesn't work there, a bar chart of those counts, and my own vote on each.
 * Standalone: it fetches the votes and sends my changes itself.
 */
export function TrackTypeVotes({ setupId, isOwner, share }: TrackTypeVotesProps) {
  const votes = useSetupVotesQuery(setupId, share);
  const me = useMeQuery();
  const vote = useVoteMutation(setupId);
  const busyTrackType = vote.isPending ? vote.variables?.trackType : undefined;
  let body;
  if (votes.isPending) body = <LoadingState label="Loading votes…" />;
  else if (votes.isError) body = <ErrorState title="Votes could not load" message={votes.error.message} onRetry={() => void votes.refetch()} />;
  else {
    const scale = Math.max(0, ...votes.data.trackTypes.map((t) => t.works + t.fails));
    const canVote = votes.data.canVote && !isOwner;
    body = (
      <>
        <VotingNote votes={votes.data} isOwner={isOwner} signedIn={Boolean(me.data)} />
        <View role="list" aria-label="Votes by track surface">
          {votes.data.trackTypes.map((tally) => (
            <TrackTypeVotesRow
              key={tally.trackType}
              tally={tally}
              scale={scale}
              canVote={canVote}
              busy={busyTrackType === tally.trackType}
              onVote={(choice) => vote.mutate({ trackType: tally.trackType, vote: choice })}
            />
          ))}
        </View>
        {vote.isError ? (
          <AppText tone="danger" role="alert">
            {vote.error.message}
          </AppText>
        ) : null}
      </>
    );
  }
  return (
    <Card aria-label="Where it works">
      <AppText variant="heading">Where it works</AppText>
      <AppText variant="caption" tone="muted">
        {intro(isOwner)}
      </AppText>
      <Legend />
      {body}
    </Card>
  );
}

/** What the two colours of the bars mean (the counts are written out as well). */
function Legend() {
  return (
    <AppText variant="caption" tone="muted" aria-hidden>
      <AppText variant="caption" tone="success">
        ■
      </AppText>{' '}
      works here{'  '}
      <AppText variant="caption" tone="danger">
        ■
      </AppText>{' '}
      doesn't work here
    </AppText>
  );
}

const styles = StyleSheet.create({
  note: { gap: space.xs },
});
