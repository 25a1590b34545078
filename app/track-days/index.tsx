import { router, useLocalSearchParams } from 'expo-router';
import { StyleSheet, View } from 'react-native';
import { ButtonLink } from '../../components/ButtonLink';
import { Card } from '../../components/Card';
import { ChoiceChips } from '../../components/ChoiceChips';
import { Screen } from '../../components/Screen';
import { SignedInGate } from '../../components/SignedInGate';
import { EmptyState, ErrorState, LoadingState } from '../../components/StatusViews';
import { TrackDayListItem } from '../../components/TrackDayListItem';
import { signInHref, useMeQuery } from '../../hooks/auth';
import { useDisplayUnits } from '../../hooks/garageUi';
import { useGarageQuery } from '../../hooks/setups';
import { idParam, trackDaysHref, useTrackDaysQuery } from '../../hooks/trackDays';
import { space } from '../../theme';

const ALL = 'all';

function newDayHref(carId: number | null): string {
  return carId ? `/track-days/new?carId=${carId}` : '/track-days/new';
}

/** "All cars" or one car: the list follows the address, so a car's link from the garage opens filtered. */
function CarFilter({ carId }: { carId: number | null }) {
  const garage = useGarageQuery();
  const cars = garage.data?.cars ?? [];
  if (cars.length < 2 && !carId) return null;
  const options = [{ value: ALL, label: 'All cars' }, ...cars.map((car) => ({ value: String(car.id), label: car.nickname }))];
  return (
    <ChoiceChips
      label="Show the days of"
      options={options}
      selected={[carId ? String(carId) : ALL]}
      onChange={([value]) => router.replace(trackDaysHref(value === ALL ? null : Number(value)))}
    />
  );
}

function TrackDays({ carId }: { carId: number | null }) {
  const days = useTrackDaysQuery(carId);
  const garage = useGarageQuery();
  const units = useDisplayUnits();
  const car = garage.data?.cars.find((c) => c.id === carId);
  const carName = car ? car.nickname : 'this car';
  let body;
  if (days.isPending) body = <LoadingState label="Loading your track days…" />;
  else if (days.isError) {
    body = <ErrorState title="Your track days could not load" message={days.error.message} onRetry={() => void days.refetch()} />;
  } else if (days.data.length === 0) {
    body = (
      <EmptyState
        title={carId ? `No track days for ${carName} yet` : 'No track days yet'}
        message="Log the day's track and conditions, then each run: which setup the car ran and its lap times. Two runs on different revisions tell you whether the change helped."
        actionLabel="Log a track day"
        onAction={() => router.push(newDayHref(carId))}
      />
    );
  } else {
    body = (
      <Card>
        <View role="list" aria-label={carId ? `Track days of ${carName}` : 'Your track days'}>
          {days.data.map((day, i) => (
            <View key={day.id} role="listitem">
              <TrackDayListItem day={day} units={units} first={i === 0} />
            </View>
          ))}
        </View>
      </Card>
    );
  }
  return (
    <>
      {days.data && days.data.length > 0 ? (
        <View style={styles.actions}>
          <ButtonLink href={newDayHref(carId)} label="Log a track day" />
        </View>
      ) : null}
      <CarFilter carId={carId} />
      {body}
    </>
  );
}

export default function TrackDaysScreen() {
  const me = useMeQuery();
  const params = useLocalSearchParams<{ carId?: string }>();
  const carId = idParam(params.carId);
  return (
    <Screen title="Track days" subtitle="Your runs and lap times, newest day first." back={{ href: '/garage', label: 'Back to Garage' }}>
      <SignedInGate me={me} signInHref={signInHref(trackDaysHref(carId))}>
        {() => <TrackDays carId={carId} />}
      </SignedInGate>
    </Screen>
  );
}

const styles = StyleSheet.create({
  actions: { flexDirection: 'row', flexWrap: 'wrap', gap: space.md },
});
