import { router, useLocalSearchParams } from 'expo-router';
import { FamilyTree } from '../../../components/FamilyTree';
import { Screen } from '../../../components/Screen';
import { EmptyState, ErrorState, LoadingState } from '../../../components/StatusViews';
import { ApiRequestError } from '../../../hooks/api';
import { useFamilyQuery } from '../../../hooks/forks';
import { useSetupQuery } from '../../../hooks/setups';

function isMissing(error: unknown): boolean {
  return error instanceof ApiRequestError && error.status === 404;
}

function FamilyBody({ id, share }: { id: number; share?: string }) {
  const setup = useSetupQuery(id, share);
  const family = useFamilyQuery(id, share);
  if (isMissing(setup.error) || isMissing(family.error)) {
    return (
      <EmptyState
        title="No setup at this address"
        message="It may be private, deleted, or the link is missing the part after “share=”. Ask whoever sent it for the full link."
        actionLabel="Find setups on Discover"
        onAction={() => router.replace('/')}
      />
    );
  }
  if (setup.isError) return <ErrorState title="This setup could not load" message={setup.error.message} onRetry={() => void setup.refetch()} />;
  if (family.isError) return <ErrorState title="The family could not load" message={family.error.message} onRetry={() => void family.refetch()} />;
  if (setup.isPending || family.isPending) return <LoadingState label="Loading the family…" />;
  const query = share ? `?share=${encodeURIComponent(share)}` : '';
  return (
    <FamilyTree
      family={family.data}
      self={{ id: setup.data.id, title: setup.data.title, ownerHandle: setup.data.owner.handle, createdAt: setup.data.createdAt }}
      forkHref={`/setups/${id}/fork${query}`}
    />
  );
}

export default function FamilyScreen() {
  const params = useLocalSearchParams<{ id: string; share?: string }>();
  const id = Number(params.id);
  const share = typeof params.share === 'string' && params.share ? params.share : undefined;
  const query = share ? `?share=${encodeURIComponent(share)}` : '';
  const valid = Number.isSafeInteger(id) && id > 0;
  return (
    <Screen
      title="Family"
      subtitle="Where this setup came from and who started from it."
      back={{ href: `/setups/${params.id}${query}`, label: 'Back to the setup' }}
    >
      {valid ? (
        <FamilyBody id={id} share={share} />
      ) : (
        <EmptyState title="No setup at this address" message="Check the address, or find a setup on Discover." actionLabel="Find setups on Discover" onAction={() => router.replace('/')} />
      )}
    </Screen>
  );
}
