import { useLocalSearchParams } from 'expo-router';
import { useState } from 'react';
import { FollowCard, type FollowListChoice } from '../../components/FollowCard';
import { FollowList } from '../../components/FollowList';
import { RacerProfile } from '../../components/RacerProfile';
import { ReportControl } from '../../components/ReportControl';
import { Screen } from '../../components/Screen';
import { EmptyState, ErrorState, LoadingState } from '../../components/StatusViews';
import { ApiRequestError } from '../../hooks/api';
import { signInHref, useMeQuery } from '../../hooks/auth';
import { useFollowListQuery, useFollowStatusQuery, useSetFollowing } from '../../hooks/follows';
import { useRacerQuery } from '../../hooks/profile';

function Follows({ handle }: { handle: string }) {
  const me = useMeQuery();
  const status = useFollowStatusQuery(handle);
  const setFollowing = useSetFollowing();
  const [shown, setShown] = useState<FollowListChoice | null>(null);
  const followers = useFollowListQuery(handle, 'followers', shown === 'followers');
  const following = useFollowListQuery(handle, 'following', shown === 'following');
  if (status.isPending) return <LoadingState label="Loading followers…" />;
  if (status.isError) return <ErrorState title="Followers could not load" message={status.error.message} onRetry={() => void status.refetch()} />;
  const list = shown === 'followers' ? followers : following;
  return (
    <FollowCard
      status={status.data}
      busy={setFollowing.isPending}
      error={setFollowing.error?.message ?? null}
      onFollowChange={(follow) => setFollowing.mutate({ handle, follow })}
      signInHref={me.data === null ? signInHref(`/racers/${handle}`) : null}
      shown={shown}
      onShow={setShown}
    >
      {shown ? (
        <FollowList
          title={shown === 'followers' ? 'Followers' : 'Following'}
          pages={list.data?.pages}
          loading={list.isPending}
          error={list.error}
          hasMore={list.hasNextPage}
          loadingMore={list.isFetchingNextPage}
          onMore={() => void list.fetchNextPage()}
          onRetry={() => void list.refetch()}
        />
      ) : null}
    </FollowCard>
  );
}

export default function RacerScreen() {
  const { handle = '' } = useLocalSearchParams<{ handle: string }>();
  const racer = useRacerQuery(handle);
  const back = { href: '/', label: 'Back to Discover' };
  if (racer.isPending) {
    return (
      <Screen title={`@${handle}`} back={back}>
        <LoadingState label="Loading this racer’s page…" />
      </Screen>
    );
  }
  if (racer.isError) {
    const missing = racer.error instanceof ApiRequestError && racer.error.status === 404;
    return (
      <Screen title={`@${handle}`} back={back}>
        {missing ? (
          <EmptyState title="No racer by that handle" message="Check the spelling of the handle in the address." />
        ) : (
          <ErrorState title="This page could not load" message={racer.error.message} onRetry={() => void racer.refetch()} />
        )}
      </Screen>
    );
  }
  return (
    <Screen title={racer.data.displayName} back={back}>
      <RacerProfile racer={racer.data} />
      <Follows handle={racer.data.handle} />
      <ReportControl target={{ type: 'racer', id: racer.data.id }} ownerHandle={racer.data.handle} what={`the profile of @${racer.data.handle}`} />
    </Screen>
  );
}
