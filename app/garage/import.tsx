import { router } from 'expo-router';
import { CarsRequired } from '../../components/CarsRequired';
import { ImportSetupForm } from '../../components/ImportSetupForm';
import { Screen } from '../../components/Screen';
import { SignedInGate } from '../../components/SignedInGate';
import { signInHref, useMeQuery } from '../../hooks/auth';
import { useGarageQuery, useImportSetup } from '../../hooks/setups';

function ImportSetup() {
  const garage = useGarageQuery();
  const importSetup = useImportSetup();
  return (
    <CarsRequired
      garage={garage}
      emptyTitle="An import needs a car"
      emptyMessage="Add a car of the same class as the file first; the setup lands on it."
    >
      {(cars) => (
        <ImportSetupForm
          cars={cars}
          pending={importSetup.isPending}
          error={importSetup.error}
          onReset={importSetup.reset}
          onSubmit={(input) => importSetup.mutateAsync(input).then((setup) => router.replace(`/setups/${setup.id}`))}
        />
      )}
    </CarsRequired>
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
