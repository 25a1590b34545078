import { router } from 'expo-router';
import { ImportSetupForm } from '../../components/ImportSetupForm';
import { Screen } from '../../components/Screen';
import { SignedInGate } from '../../components/SignedInGate';
import { EmptyState, ErrorState, LoadingState } from '../../components/StatusViews';
import { signInHref, useMeQuery } from '../../hooks/auth';
import { useGarageQuery, useImportSetup } from '../../hooks/setups';

function ImportSetup() {
  const garage = useGarageQuery();
  const importSetup = useImportSetup();
  if (garage.isPending) return <LoadingState label="Loading your cars…" />;
  if (garage.isError) {
    return <ErrorState title="Your cars could not load" message={garage.error.message} onRetry={() => void garage.refetch()} />;
  }
  if (garage.data.cars.length === 0) {
    return (
      <EmptyState
        title="An import needs a car"
        message="Add a car of the same class as the file first; the setup lands on it."
        actionLabel="Add a car"
        onAction={() => router.replace('/garage/add-car')}
      />
    );
  }
  return (
    <ImportSetupForm
      cars={garage.data.cars}
      pending={importSetup.isPending}
      error={importSetup.error}
      onReset={importSetup.reset}
      onSubmit={(input) => importSetup.mutateAsync(input).then((setup) => router.replace(`/setups/${setup.id}`))}
    />
  );
}

export default function ImportSetupScreen() {
  const me = useMeQuery();
  return (
    <Screen title="Import a setup file" subtitle="Bring in a sheet exported from Tunefork." back={{ href: '/garage', label: 'Back to Garage' }}>
      <SignedInGate me={me} signInHref={signInHref('/garage/import')}>
        {() => <ImportSetup />}
      </SignedInGate>
    </Screen>
  );
}
