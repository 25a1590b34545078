import { StyleSheet, View } from 'react-native';
import type { KitSummary } from '../shared/types/catalog';
import type { CarCreate } from '../shared/types/setups';
import { space } from '../theme';
import { AppText } from './AppText';
import { Card } from './Card';
import { CarForm } from './CarForm';

export type ForkNewCarFormProps = {
  /** Kits the setup can go onto. */
  kits: readonly KitSummary[];
  /** The kit the setup was made on, when it is one of `kits`: most newcomers have exactly that kit. */
  initialKitId: number | null;
  onSubmit: (values: CarCreate) => unknown;
  /** Present when the racer already has a car to go back to. */
  onCancel?: () => void;
  pending: boolean;
  error: unknown;
};

/**
 * Adds a car on the spot so a newcomer can start from a setup without leaving the page; it starts
 * on the setup's own kit, marked stock, since that is what a new racer most often has.
 */
export function ForkNewCarForm({ kits, initialKitId, onSubmit, onCancel, pending, error }: ForkNewCarFormProps) {
  const initialKit = kits.find((kit) => kit.id === initialKitId);
  return (
    <Card role="region" aria-label="Add your car">
      <View style={styles.form}>
        <AppText variant="heading">Add the car you race</AppText>
        <AppText tone="muted">A setup lives on one of your cars, and its kit decides the sheet. Only kits this setup fits are listed.</AppText>
        <CarForm
          kits={kits}
          initial={{ kitId: initialKit?.id ?? 0, nickname: initialKit ? `My ${initialKit.name}` : '', stock: true }}
          nicknameHint="Whatever you call it in the pits."
          onSubmit={onSubmit}
          pending={pending}
          error={error}
          cancel={onCancel ? { label: 'Use one of my cars', onPress: onCancel } : undefined}
        />
      </View>
    </Card>
  );
}

const styles = StyleSheet.create({
  form: { gap: space.lg },
});
