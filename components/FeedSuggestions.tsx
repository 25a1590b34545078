import { StyleSheet, View } from 'react-native';
import type { FeedSuggestions as Suggestions } from '../shared/types/community';
import { vehicleClassLabel } from '../shared/types/vehicleClasses';
import { space, useTheme } from '../theme';
import { AppText } from './AppText';
import { ButtonLink } from './ButtonLink';
import { Card } from './Card';
import { FollowButton } from './FollowButton';
import { TextLink } from './TextLink';

export type FeedSuggestionsProps = {
  suggestions: Suggestions;
  /** Handles I started following from here. */
  followed: ReadonlySet<string>;
  /** The handle whose follow is on its way. */
  busyHandle: string | null;
  onFollow: (handle: string, follow: boolean) => void;
};

function plural(n: number, one: string, many: string): string {
  return `${n} ${n === 1 ? one : many}`;
}

/** "in the 1/8 nitro buggy and 1/10 2WD buggy classes", or "in every class" when I race none yet. */
export function suggestionScope(classes: Suggestions['classes']): string {
  if (classes.length === 0) return 'across every class';
  const labels = classes.map(vehicleClassLabel);
  const list = labels.length === 1 ? labels[0] : `${labels.slice(0, -1).join(', ')} and ${labels[labels.length - 1]}`;
  return `in the ${list} class${labels.length === 1 ? '' : 'es'}`;
}

/** The empty feed's next step: racers whose setups others fork most, in the classes I race. */
export function FeedSuggestions({ suggestions, followed, busyHandle, onFollow }: FeedSuggestionsProps) {
  const { colors } = useTheme();
  if (suggestions.racers.length === 0) {
    return (
      <Card>
        <AppText variant="heading">No racers to suggest yet</AppText>
        <AppText tone="muted">No other racer has published a setup {suggestionScope(suggestions.classes)} yet. Browse Discover and follow racers from their pages.</AppText>
        <ButtonLink href="/" label="Go to Discover" />
      </Card>
    );
  }
  return (
    <Card>
      <AppText variant="heading">Racers to follow</AppText>
      <AppText tone="muted">Their setups are forked most {suggestionScope(suggestions.classes)}.</AppText>
      <View role="list" aria-label="Racers to follow">
        {suggestions.racers.map((racer, i) => (
          <View key={racer.handle} role="listitem" style={[styles.row, i > 0 ? { borderTopWidth: 1, borderColor: colors.border } : null]}>
            <View style={styles.who}>
              <TextLink href={`/racers/${racer.handle}`} label={`@${racer.handle}`} />
              <AppText variant="caption" tone="muted">
                {racer.displayName} · {plural(racer.forkCount, 'fork', 'forks')} · {plural(racer.setupCount, 'public setup', 'public setups')}
              </AppText>
            </View>
            <FollowButton
              handle={racer.handle}
              following={followed.has(racer.handle)}
              busy={busyHandle === racer.handle}
              onPress={() => onFollow(racer.handle, !followed.has(racer.handle))}
            />
          </View>
        ))}
      </View>
    </Card>
  );
}

const styles = StyleSheet.create({
  row: { flexDirection: 'row', flexWrap: 'wrap', alignItems: 'center', justifyContent: 'space-between', gap: space.md, paddingVertical: space.sm },
  who: { flexShrink: 1, gap: 2 },
});
