import { StyleSheet, View } from 'react-native';
import type { Garage } from '../shared/types/setups';
import { vehicleClassLabel } from '../shared/types/vehicleClasses';
import { space } from '../theme';
import { AppText } from './AppText';
import { ButtonLink } from './ButtonLink';
import { Card } from './Card';
import { CarStockBadge } from './CarStockBadge';
import { SetupListItem } from './SetupListItem';

export type CarCardProps = { car: Garage['cars'][number] };

/** One car in the garage: what it is, its setups, and a way to start another. */
export function CarCard({ car }: CarCardProps) {
  return (
    <Card role="article" aria-label={car.nickname}>
      <View style={styles.header}>
        <AppText variant="heading">{car.nickname}</AppText>
        <AppText tone="muted">
          {car.makerName} {car.kitName} · {vehicleClassLabel(car.vehicleClass)}
        </AppText>
        {car.stock ? <CarStockBadge /> : null}
      </View>
      {car.setups.length === 0 ? (
        <AppText tone="muted">No setups for this car yet. Start one from the kit’s stock sheet.</AppText>
      ) : (
        <View role="list" aria-label={`Setups for ${car.nickname}`}>
          {car.setups.map((setup, i) => (
            <View key={setup.id} role="listitem">
              <SetupListItem setup={setup} first={i === 0} />
            </View>
          ))}
        </View>
      )}
      <View style={styles.actions}>
        <ButtonLink href={`/setups/new?carId=${car.id}`} label="New setup" variant={car.setups.length === 0 ? 'primary' : 'secondary'} />
        <ButtonLink href={`/track-days?carId=${car.id}`} label="Track days" variant="secondary" />
      </View>
    </Card>
  );
}

const styles = StyleSheet.create({
  header: { gap: space.xs, marginBottom: space.xs },
  actions: { flexDirection: 'row', flexWrap: 'wrap', gap: space.md },
});
