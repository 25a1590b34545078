import { router } from 'expo-router';
import { StyleSheet, View } from 'react-native';
import { ButtonLink } from '../../components/ButtonLink';
import { CarCard } from '../../components/CarCard';
import { GarageSignedOut } from '../../components/GarageSignedOut';
import { Screen } from '../../components/Screen';
import { EmptyState, ErrorState, LoadingState } from '../../components/StatusViews';
import { useMeQuery } from '../../hooks/auth';
import { useGarageQuery } from '../../hooks/setups';
import { space } from '../../theme';

function MyGarage() {
  const garage = useGarageQuery();
  if (garage.isPending) return <LoadingState label="Opening your garage…" />;
  if (garage.isError) {
    return <ErrorState title="Your garage could not load" message={garage.error.message} onRetry={() => void garage.refetch()} />;
  }
  if (garage.data.cars.length === 0) {
    return (
      <EmptyState
        title="An empty garage, for now"
        message="Add the car you race, pick its kit, and Tunefork gives you its stock sheet to start tuning from."
        actionLabel="Add your first car"
        onAction={() => router.push('/garage/add-car')}
      />
    );
  }
  return (
    <>
      <View style={styles.actions}>
        <ButtonLink href="/garage/add-car" label="Add a car" />
        <ButtonLink href="/garage/import" label="Import a setup file" variant="secondary" />
      </View>
      {garage.data.cars.map((car) => (
        <CarCard key={car.id} car={car} />
      ))}
    </>
  );
}

export default function GarageScreen() {
  const me = useMeQuery();
  return (
    <Screen title="Garage" subtitle="Your cars, their setup sheets and every change you made.">
      {me.isPending ? <LoadingState label="Checking who is signed in…" /> : null}
      {me.isError && me.data === undefined ? (
        <ErrorState title="Could not check your sign-in" message={me.error.message} onRetry={() => void me.refetch()} />
      ) : null}
      {me.data === null ? <GarageSignedOut /> : null}
      {me.data ? <MyGarage /> : null}
    </Screen>
  );
}

const styles = StyleSheet.create({
  actions: { flexDirection: 'row', flexWrap: 'wrap', gap: space.md },
});
