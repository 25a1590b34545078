import { router } from 'expo-router';
import { CarForm } from '../../components/CarForm';
import { Screen } from '../../components/Screen';
import { SignedInGate } from '../../components/SignedInGate';
import { EmptyState, ErrorState, LoadingState } from '../../components/StatusViews';
import { signInHref, useMeQuery } from '../../hooks/auth';
import { useKitsQuery } from '../../hooks/catalog';
import { useCreateCar } from '../../hooks/setups';

function AddCar() {
  const kits = useKitsQuery();
  const create = useCreateCar();
  if (kits.isPending) return <LoadingState label="Loading the kits…" />;
  if (kits.isError) return <ErrorState title="The kits could not load" message={kits.error.message} onRetry={() => void kits.refetch()} />;
  if (kits.data.length === 0) {
    return <EmptyState title="No kits to choose from yet" message="Kits and their stock sheets are added by admins; check back soon." />;
  }
  return (
    <CarForm
      kits={kits.data}
      pending={create.isPending}
      error={create.error}
      onSubmit={(values) => create.mutateAsync(values).then(() => router.replace('/garage'))}
    />
  );
}

export default function AddCarScreen() {
  const me = useMeQuery();
  return (
    <Screen title="Add a car" subtitle="Pick its kit so Tunefork knows which sheet it uses." back={{ href: '/garage', label: 'Back to Garage' }}>
      <SignedInGate me={me} signInHref={signInHref('/garage/add-car')}>
        {() => <AddCar />}
      </SignedInGate>
    </Screen>
  );
}
