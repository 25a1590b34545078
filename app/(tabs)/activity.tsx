import { useState } from 'react';
import { StyleSheet, View } from 'react-native';
import { AppText } from '../../components/AppText';
import { Button } from '../../components/Button';
import { FeedList } from '../../components/FeedList';
import { FeedSignedOut } from '../../components/FeedSignedOut';
import { FeedSuggestions } from '../../components/FeedSuggestions';
import { Screen } from '../../components/Screen';
import { EmptyState, ErrorState, LoadingState } from '../../components/StatusViews';
import { useMeQuery } from '../../hooks/auth';
import { useFeedQuery, useFeedSuggestionsQuery } from '../../hooks/feed';
import { useSetFollowing } from '../../hooks/follows';
import { space } from '../../theme';

const TITLE = 'Activity';
const SUBTITLE = 'What the racers you follow changed, and who forked your setups.';

/** Title, what the tab is for, and a refresh for keyboards and wide screens (phones can also pull down). */
function Header({ refreshing, onRefresh }: { refreshing: boolean; onRefresh: () => void }) {
  return (
    <View style={styles.header}>
      <AppText variant="title" aria-level={1}>
        {TITLE}
      </AppText>
      <AppText tone="muted">{SUBTITLE}</AppText>
      <Button label="Check for new activity" variant="secondary" onPress={onRefresh} busy={refreshing} busyLabel="Checking…" />
    </View>
  );
}

/** The empty feed: say so, and offer racers to follow. */
function EmptyFeed() {
  const suggestions = useFeedSuggestionsQuery(true);
  const setFollowing = useSetFollowing();
  const [followed, setFollowed] = useState<ReadonlySet<string>>(new Set());
  const onFollow = (handle: string, follow: boolean) =>
    setFollowing.mutate(
      { handle, follow },
      { onSuccess: () => setFollowed((prev) => new Set([...prev].filter((h) => h !== handle).concat(follow ? [handle] : []))) },
    );
  return (
    <>
      <EmptyState title="Nothing here yet" message="Follow a few racers and their new setups and changes show up here." />
      {suggestions.isPending ? <LoadingState label="Finding racers to follow…" /> : null}
      {suggestions.isError ? (
        <ErrorState title="Suggestions could not load" message={suggestions.error.message} onRetry={() => void suggestions.refetch()} />
      ) : null}
      {suggestions.data ? (
        <FeedSuggestions
          suggestions={suggestions.data}
          followed={followed}
          busyHandle={setFollowing.isPending ? (setFollowing.variables?.handle ?? null) : null}
          onFollow={onFollow}
        />
      ) : null}
    </>
  );
}

function Feed() {
  const feed = useFeedQuery(true);
  const [now, setNow] = useState(Date.now);
  const items = feed.data?.pages.flatMap((page) => page.items) ?? [];
  const refreshing = feed.isRefetching && !feed.isFetchingNextPage;
  const refresh = () => {
    setNow(Date.now());
    void feed.refetch();
  };
  let empty = <EmptyFeed />;
  if (feed.isPending) empty = <LoadingState label="Loading your feed…" />;
  else if (feed.isError) empty = <ErrorState title="Your feed could not load" message={feed.error.message} onRetry={() => void feed.refetch()} />;
  return (
    <View role="main" style={styles.main}>
      <FeedList
        items={items}
        now={now}
        header={<Header refreshing={refreshing} onRefresh={refresh} />}
        empty={empty}
        hasMore={feed.hasNextPage}
        loadingMore={feed.isFetchingNextPage}
        moreError={feed.isFetchNextPageError ? feed.error.message : null}
        onMore={() => void feed.fetchNextPage()}
        refreshing={refreshing}
        onRefresh={refresh}
      />
    </View>
  );
}

export default function ActivityScreen() {
  const me = useMeQuery();
  if (me.data) return <Feed />;
  return (
    <Screen title={TITLE} subtitle={SUBTITLE}>
      {me.isPending ? <LoadingState label="Checking who is signed in…" /> : null}
      {me.isError && me.data === undefined ? (
        <ErrorState title="Could not check your sign-in" message={me.error.message} onRetry={() => void me.refetch()} />
      ) : null}
      {me.data === null ? <FeedSignedOut /> : null}
    </Screen>
  );
}

const styles = StyleSheet.create({
  main: { flex: 1 },
  header: { gap: space.sm },
});
