import { router, useLocalSearchParams } from 'expo-router';
import { CarsRequired } from '../../components/CarsRequired';
import { MyLimitsNotice } from '../../components/MyLimitsNotice';
import { Screen } from '../../components/Screen';
import { SetupCreateForm } from '../../components/SetupCreateForm';
import { SignedInGate } from '../../components/SignedInGate';
import { signInHref, useMeQuery } from '../../hooks/auth';
import { useDisplayUnits } from '../../hooks/garageUi';
import { useCreateSetup, useGarageQuery } from '../../hooks/setups';

function NewSetup({ carId }: { carId: number | null }) {
  const garage = useGarageQuery();
  const create = useCreateSetup();
  const units = useDisplayUnits();
  return (
    <CarsRequired
      garage={garage}
      emptyTitle="A setup needs a car"
      emptyMessage="Add the car you race first; its kit decides which sheet the setup uses."
    >
      {(cars) => (
        <SetupCreateForm
          cars={cars}
          initialCarId={carId}
          units={units}
          pending={create.isPending}
          error={create.error}
          onSubmit={(input) => create.mutateAsync(input).then((setup) => router.replace(`/setups/${setup.id}`))}
        />
      )}
    </CarsRequired>
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
        {() => (
          <>
            <MyLimitsNotice focus="setups" />
            <NewSetup carId={carId} />
          </>
        )}
      </SignedInGate>
    </Screen>
  );
}
