import { StyleSheet, View } from 'react-native';
import type { Car } from '../shared/types/setups';
import { space } from '../theme';
import { Button } from './Button';
import { SetupRadioList } from './SetupRadioList';

export type ForkCarPickerProps = {
  /** Only the racer's cars the setup can go onto (same scale). */
  cars: readonly Car[];
  value: number | null;
  onChange: (carId: number) => void;
  error?: string;
  /** Opens the inline form for a car that is not in the garage yet. */
  onAddCar: () => void;
  disabled?: boolean;
};

/** Which of my cars the copy goes onto; a car of another scale is never offered. */
export function ForkCarPicker({ cars, value, onChange, error, onAddCar, disabled }: ForkCarPickerProps) {
  const options = cars.map((car) => ({
    value: car.id,
    label: car.nickname,
    description: `${car.makerName} ${car.kitName}${car.stock ? ' · stock, no option parts' : ''}`,
  }));
  return (
    <View style={styles.picker}>
      <SetupRadioList label="Your car" options={options} value={value} onChange={onChange} error={error} disabled={disabled} />
      <Button label="Add another car" variant="secondary" onPress={onAddCar} disabled={disabled} />
    </View>
  );
}

const styles = StyleSheet.create({
  picker: { gap: space.sm },
});
