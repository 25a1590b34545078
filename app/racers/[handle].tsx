import { useLocalSearchParams } from 'expo-router';
import { RacerProfile } from '../../components/RacerProfile';
import { Screen } from '../../components/Screen';
import { EmptyState, ErrorState, LoadingState } from '../../components/StatusViews';
import { ApiRequestError } from '../../hooks/api';
import { useRacerQuery } from '../../hooks/profile';

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
    </Screen>
  );
}
