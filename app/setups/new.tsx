import { router, useLocalSearchParams } from 'expo-router';
import { Screen } from '../../components/Screen';
import { SetupCreateForm } from '../../components/SetupCreateForm';
import { SignedInGate } from '../../components/SignedInGate';
import { EmptyState, ErrorState, LoadingState } from '../../components/StatusViews';
import { signInHref, useMeQuery } from '../../hooks/auth';
import { useDisplayUnits } from '../../hooks/garageUi';
import { useCreateSetup, useGarageQuery } from '../../hooks/setups';

function NewSetup({ carId }: { carId: number | null }) {
  const garage = useGarageQuery();
  const create = useCreateSetup();
  const units = useDisplayUnits();
  if (garage.isPending) return <LoadingState label="Loading your cars…" />;
  if (garage.isError) {
    return <ErrorState title="Your cars could not load" message={garage.error.message} onRetry={() => void garage.refetch()} />;
  }
  if (garage.data.cars.length === 0) {
    return (
      <EmptyState
        title="A setup needs a car"
        message="Add the car you race first; its kit decides which sheet the setup uses."
        actionLabel="Add a car"
        onAction={() => router.replace('/garage/add-car')}
      />
    );
  }
  return (
    <SetupCreateForm
      cars={garage.data.cars}
      initialCarId={carId}
      units={units}
      pending={create.isPending}
      error={create.error}
      onSubmit={(input) => create.mutateAsync(input).then((setup) => router.replace(`/setups/${setup.id}`))}
    />
  );
}

export default function NewSetupScreen() {
  const params = useLocalSearchParams<{ carId?: string }>();
  const carId = typeof params.carId === 'string' && /^\d+$/.test(params.carId) ? Number(params.carId) : null;
  const me = useMeQuery();
  const here = carId ? `/setups/new?carId=${carId}` : '/setups/new';
  return (
    <Screen title="New setup" subtitle="A sheet to tune from, with a record of every change." back={{ href: '/garage', label: 'Back to Garage' }}>
      <SignedInGate me={me} signInHref={signInHref(here)}>
        {() => <NewSetup carId={carId} />}
      </SignedInGate>
    </Screen>
  );
}
