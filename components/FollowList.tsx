import { StyleSheet, View } from 'react-native';
import type { FollowList as FollowListPage } from '../shared/types/community';
import { space, useTheme } from '../theme';
import { AppText } from './AppText';
import { Button } from './Button';
import { ErrorState, LoadingState } from './StatusViews';
import { TextLink } from './TextLink';

export type FollowListProps = {
  /** "Followers" or "Following": what the list is, for its heading and messages. */
  title: string;
  pages: FollowListPage[] | undefined;
  loading: boolean;
  error: Error | null;
  hasMore: boolean;
  loadingMore: boolean;
  onMore: () => void;
  onRetry: () => void;
};

/** Followers or followed racers of a profile, newest first, with more on request. */
export function FollowList({ title, pages, loading, error, hasMore, loadingMore, onMore, onRetry }: FollowListProps) {
  const { colors } = useTheme();
  if (loading) return <LoadingState label={`Loading ${title.toLowerCase()}…`} />;
  if (error && !pages) return <ErrorState title={`${title} could not load`} message={error.message} onRetry={onRetry} />;
  const racers = pages?.flatMap((page) => page.racers) ?? [];
  if (racers.length === 0) return <AppText tone="muted">{title === 'Followers' ? 'No followers yet.' : 'Not following anyone yet.'}</AppText>;
  return (
    <View style={styles.list}>
      <View role="list" aria-label={title}>
        {racers.map((racer, i) => (
          <View key={racer.handle} role="listitem" style={[styles.row, i > 0 ? { borderTopWidth: 1, borderColor: colors.border } : null]}>
            <TextLink href={`/racers/${racer.handle}`} label={`@${racer.handle}`} />
            <AppText tone="muted" style={styles.name}>
              {racer.displayName}
            </AppText>
          </View>
        ))}
      </View>
      {hasMore ? <Button label="Show more" variant="secondary" onPress={onMore} busy={loadingMore} busyLabel="Loading more…" /> : null}
    </View>
  );
}

const styles = StyleSheet.create({
  list: { gap: space.sm },
  row: { flexDirection: 'row', alignItems: 'center', gap: space.md },
  name: { flexShrink: 1 },
});
