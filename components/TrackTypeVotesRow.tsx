import { StyleSheet, View } from 'react-native';
import type { TrackTypeVotes, VoteChoice } from '../shared/types/community';
import { trackTypeLabel } from '../shared/types/trackTypes';
import { space } from '../theme';
import { AppText } from './AppText';
import { Button } from './Button';
import { ChoiceChips, type ChoiceOption } from './ChoiceChips';
import { TrackTypeVotesBar } from './TrackTypeVotesBar';

export type TrackTypeVotesRowProps = {
  tally: TrackTypeVotes;
  /** The largest vote total on this setup, so every bar uses the same scale. */
  scale: number;
  canVote: boolean;
  /** A vote on this track type is on its way to the server. */
  busy: boolean;
  /** null withdraws my vote. */
  onVote: (vote: VoteChoice | null) => void;
};

const CHOICES: readonly ChoiceOption<VoteChoice>[] = [
  { value: 'works', label: 'Works here' },
  { value: 'fails', label: "Doesn't work here" },
];

/** "9 say it works · 2 say it doesn't", or that nobody has voted yet. */
export function voteCountsText(works: number, fails: number): string {
  if (works + fails === 0) return 'No votes yet';
  return `${works} say it works · ${fails} say it doesn't`;
}

/** One track type: its counts, its bar, and my vote (change it, or withdraw it). */
export function TrackTypeVotesRow({ tally, scale, canVote, busy, onVote }: TrackTypeVotesRowProps) {
  const label = trackTypeLabel(tally.trackType);
  return (
    <View style={styles.row} role="listitem" aria-label={`${label}: ${voteCountsText(tally.works, tally.fails)}`}>
      <View style={styles.heading}>
        <AppText style={styles.label}>{label}</AppText>
        <AppText variant="caption" tone="muted">
          {voteCountsText(tally.works, tally.fails)}
        </AppText>
      </View>
      <TrackTypeVotesBar works={tally.works} fails={tally.fails} scale={scale} />
      {canVote ? (
        <View style={styles.actions}>
          <ChoiceChips
            label={`Your vote on ${label}`}
            hideLabel
            options={CHOICES.map((c) => ({ ...c, spoken: `${c.label}: ${label}` }))}
            selected={tally.myVote ? [tally.myVote] : []}
            onChange={([vote]) => onVote(vote)}
            disabled={busy}
          />
          {tally.myVote ? (
            <Button label="Withdraw" variant="secondary" accessibilityLabel={`Withdraw my vote on ${label}`} onPress={() => onVote(null)} disabled={busy} />
          ) : null}
        </View>
      ) : null}
    </View>
  );
}

const styles = StyleSheet.create({
  row: { gap: space.xs, paddingVertical: space.sm },
  heading: { flexDirection: 'row', flexWrap: 'wrap', justifyContent: 'space-between', alignItems: 'baseline', gap: space.sm },
  label: { fontWeight: '700' },
  actions: { flexDirection: 'row', flexWrap: 'wrap', alignItems: 'center', gap: space.sm, marginTop: space.xs },
});
