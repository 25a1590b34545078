import { StyleSheet, View } from 'react-native';
import { useForm } from '../hooks/form';
import type { KitSummary } from '../shared/types/catalog';
import { carCreateSchema, type CarCreate } from '../shared/types/setups';
import { vehicleClassLabel } from '../shared/types/vehicleClasses';
import { z } from '../shared/types/zod';
import { space } from '../theme';
import { AppText } from './AppText';
import { Button } from './Button';
import { Card } from './Card';
import { CarStockCheckbox } from './CarStockCheckbox';
import { FormErrorBanner } from './FormErrorBanner';
import { SetupRadioList } from './SetupRadioList';
import { TextField } from './TextField';

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

// Same rules as the server, with a message for "no kit picked yet" instead of zod's number wording.
const schema = carCreateSchema.extend({ kitId: z.number().int().positive('Pick the kit your car is built from.') });

/**
 * Adds a car on the spot so a newcomer can start from a setup without leaving the page; it starts
 * on the setup's own kit, marked stock, since that is what a new racer most often has.
 */
export function ForkNewCarForm({ kits, initialKitId, onSubmit, onCancel, pending, error }: ForkNewCarFormProps) {
  const initialKit = kits.find((kit) => kit.id === initialKitId);
  const form = useForm({
    initial: { kitId: initialKit?.id ?? 0, nickname: initialKit ? `My ${initialKit.name}` : '', stock: true },
    schema,
    onSubmit,
    serverError: error,
    pending,
  });
  const options = kits.map((kit) => ({ value: kit.id, label: `${kit.makerName} ${kit.name}`, description: vehicleClassLabel(kit.vehicleClass) }));
  return (
    <Card role="region" aria-label="Add your car">
      <View style={styles.form}>
        <AppText variant="heading">Add the car you race</AppText>
        <AppText tone="muted">A setup lives on one of your cars, and its kit decides the sheet. Only kits this setup fits are listed.</AppText>
        <FormErrorBanner message={form.formError} />
        <SetupRadioList
          label="Kit"
          options={options}
          value={form.values.kitId || null}
          onChange={(kitId) => form.setField('kitId', kitId)}
          error={form.fieldErrors.kitId}
          disabled={pending}
        />
        <TextField
          label="Name for the car"
          hint="Whatever you call it in the pits."
          value={form.values.nickname}
          onChangeText={(text) => form.setField('nickname', text)}
          error={form.fieldErrors.nickname}
          maxLength={60}
          editable={!pending}
          returnKeyType="done"
          onSubmitEditing={() => void form.submit()}
        />
        <CarStockCheckbox checked={form.values.stock} onChange={(stock) => form.setField('stock', stock)} disabled={pending} />
        <View style={styles.buttons}>
          <Button label="Add the car" busy={pending} busyLabel="Adding the car…" onPress={() => void form.submit()} />
          {onCancel ? <Button label="Use one of my cars" variant="secondary" onPress={onCancel} disabled={pending} /> : null}
        </View>
      </View>
    </Card>
  );
}

const styles = StyleSheet.create({
  form: { gap: space.lg },
  buttons: { flexDirection: 'row', flexWrap: 'wrap', gap: space.sm },
});
