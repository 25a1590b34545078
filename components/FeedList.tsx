import type { ReactElement } from 'react';
import { FlatList, RefreshControl, StyleSheet, View } from 'react-native';
import type { FeedItem } from '../shared/types/community';
import { layout, space, useTheme } from '../theme';
import { AppText } from './AppText';
import { Button } from './Button';
import { FeedEntry } from './FeedEntry';
import { ErrorState, LoadingState } from './StatusViews';

export type FeedListProps = {
  items: FeedItem[];
  /** The time entries say "3 h ago" against. */
  now: number;
  /** Shown above the entries, scrolling with them (title, subtitle). */
  header: ReactElement;
  /** Shown instead of entries while there are none: loading, error or empty state. */
  empty: ReactElement;
  hasMore: boolean;
  loadingMore: boolean;
  /** Why the last "more" failed, shown with a retry at the foot of the list. */
  moreError: string | null;
  onMore: () => void;
  refreshing: boolean;
  onRefresh: () => void;
};

const itemKey = (item: FeedItem) => `${item.kind}-${item.id}`;

function Footer({ hasMore, loadingMore, moreError, onMore, count }: Pick<FeedListProps, 'hasMore' | 'loadingMore' | 'moreError' | 'onMore'> & { count: number }) {
  if (count === 0) return null;
  if (moreError) return <ErrorState title="Older activity could not load" message={moreError} onRetry={onMore} />;
  if (loadingMore) return <LoadingState label="Loading older activity…" />;
  // The button is for keyboards and screen readers; scrolling near the end loads more by itself.
  if (hasMore) return <Button label="Show older activity" variant="secondary" onPress={onMore} />;
  return (
    <AppText tone="muted" style={styles.end}>
      That is everything so far. Older changes are in each setup’s history.
    </AppText>
  );
}

/**
 * The activity feed as one virtualised list: loads older pages as the end comes near, and pulls to
 * refresh on phones. Entries sit in the same centred column as every screen.
 */
export function FeedList({ items, now, header, empty, hasMore, loadingMore, moreError, onMore, refreshing, onRefresh }: FeedListProps) {
  const { colors } = useTheme();
  return (
    <FlatList
      style={{ backgroundColor: colors.background }}
      contentContainerStyle={styles.content}
      data={items}
      keyExtractor={itemKey}
      renderItem={({ item }) => (
        <View style={styles.column}>
          <FeedEntry item={item} now={now} />
        </View>
      )}
      ItemSeparatorComponent={() => <View style={styles.gap} />}
      ListHeaderComponent={<View style={[styles.column, styles.header]}>{header}</View>}
      ListEmptyComponent={<View style={[styles.column, styles.emptyGap]}>{empty}</View>}
      ListFooterComponent={
        <View style={[styles.column, styles.footer]}>
          <Footer hasMore={hasMore} loadingMore={loadingMore} moreError={moreError} onMore={onMore} count={items.length} />
        </View>
      }
      onEndReached={() => {
        if (hasMore && !loadingMore && !moreError) onMore();
      }}
      onEndReachedThreshold={0.5}
      refreshControl={<RefreshControl refreshing={refreshing} onRefresh={onRefresh} colors={[colors.accent]} tintColor={colors.accent} />}
    />
  );
}

const styles = StyleSheet.create({
  content: { flexGrow: 1, paddingHorizontal: space.lg, paddingVertical: space.xl },
  // Each cell stretches across the list; the column inside it centres itself, as on every screen.
  column: { width: '100%', maxWidth: layout.contentMaxWidth, alignSelf: 'center' },
  header: { marginBottom: space.xl },
  emptyGap: { gap: space.lg },
  gap: { height: space.lg },
  footer: { marginTop: space.lg },
  end: { textAlign: 'center' },
});
