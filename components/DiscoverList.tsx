import type { ReactElement } from 'react';
import { FlatList, StyleSheet, View } from 'react-native';
import type { UnitPreferences } from '../shared/types/auth';
import type { DiscoverSetup } from '../shared/types/community';
import { layout, space, useTheme } from '../theme';
import { AppText } from './AppText';
import { Button } from './Button';
import { DiscoverSetupCard } from './DiscoverSetupCard';
import { ErrorState, LoadingState } from './StatusViews';

export type DiscoverListProps = {
  setups: DiscoverSetup[];
  units: UnitPreferences;
  /** Above the results, scrolling with them: title, search, filters, order. */
  header: ReactElement;
  /** Instead of results while there are none: loading, error or empty state. */
  empty: ReactElement;
  /** Below the results (and the "more" controls): the kits and tracks. */
  footer: ReactElement;
  hasMore: boolean;
  loadingMore: boolean;
  /** Why the last "more" failed, shown with a retry at the foot of the list. */
  moreError: string | null;
  onMore: () => void;
};

function More({ hasMore, loadingMore, moreError, onMore, count }: Pick<DiscoverListProps, 'hasMore' | 'loadingMore' | 'moreError' | 'onMore'> & { count: number }) {
  if (count === 0) return null;
  if (moreError) return <ErrorState title="More setups could not load" message={moreError} onRetry={onMore} />;
  if (loadingMore) return <LoadingState label="Loading more setups…" />;
  // The button is for keyboards and screen readers; scrolling near the end loads more by itself.
  if (hasMore) return <Button label="Show more setups" variant="secondary" onPress={onMore} />;
  return (
    <AppText tone="muted" style={styles.end}>
      That is every setup that matches.
    </AppText>
  );
}

/**
 * Discover's results as one virtualised list: the next page loads as the end comes near. Results
 * sit in the same centred column as every screen.
 */
export function DiscoverList({ setups, units, header, empty, footer, hasMore, loadingMore, moreError, onMore }: DiscoverListProps) {
  const { colors } = useTheme();
  return (
    <FlatList
      style={{ backgroundColor: colors.background }}
      contentContainerStyle={styles.content}
      keyboardShouldPersistTaps="handled"
      data={setups}
      keyExtractor={(setup) => String(setup.id)}
      renderItem={({ item }) => (
        <View style={styles.column}>
          <DiscoverSetupCard setup={item} units={units} />
        </View>
      )}
      ItemSeparatorComponent={() => <View style={styles.gap} />}
      ListHeaderComponent={<View style={[styles.column, styles.header]}>{header}</View>}
      ListEmptyComponent={<View style={[styles.column, styles.emptyGap]}>{empty}</View>}
      ListFooterComponent={
        <View style={[styles.column, styles.footer]}>
          <More hasMore={hasMore} loadingMore={loadingMore} moreError={moreError} onMore={onMore} count={setups.length} />
          {footer}
        </View>
      }
      onEndReached={() => {
        if (hasMore && !loadingMore && !moreError) onMore();
      }}
      onEndReachedThreshold={0.5}
    />
  );
}

const styles = StyleSheet.create({
  content: { flexGrow: 1, paddingHorizontal: space.lg, paddingVertical: space.xl },
  // Each cell stretches across the list; the column inside it centres itself, as on every screen.
  column: { width: '100%', maxWidth: layout.contentMaxWidth, alignSelf: 'center' },
  header: { marginBottom: space.lg, gap: space.lg },
  emptyGap: { gap: space.lg },
  gap: { height: space.md },
  footer: { marginTop: space.lg, gap: space.lg },
  end: { textAlign: 'center' },
});
