import { StyleSheet, View } from 'react-native';
import { useForm } from '../hooks/form';
import type { KitSummary } from '../shared/types/catalog';
import { carCreateSchema, type CarCreate } from '../shared/types/setups';
import { vehicleClassLabel } from '../shared/types/vehicleClasses';
import { z } from '../shared/types/zod';
import { space } from '../theme';
import { Button } from './Button';
import { CarStockCheckbox } from './CarStockCheckbox';
import { FormErrorBanner } from './FormErrorBanner';
import { SetupRadioList } from './SetupRadioList';
import { TextField } from './TextField';

export type CarFormProps = {
  kits: readonly KitSummary[];
  onSubmit: (values: CarCreate) => unknown;
  pending: boolean;
  error: unknown;
  /** Where the form starts; empty by default. */
  initial?: Partial<Values>;
  /** Shown under the name field. */
  nicknameHint?: string;
  /** A secondary button beside "Add the car", e.g. to go back to choosing a car. */
  cancel?: { label: string; onPress: () => void };
};

// Same rules as the server, with a message for "no kit picked yet" instead of zod's number wording.
const schema = carCreateSchema.extend({ kitId: z.number().int().positive('Pick the kit your car is built from.') });

type Values = { kitId: number; nickname: string; stock: boolean };
const INITIAL: Values = { kitId: 0, nickname: '', stock: false };

/** A new car: which kit it is, what you call it, and whether it is stock. */
export function CarForm({ kits, onSubmit, pending, error, initial, nicknameHint, cancel }: CarFormProps) {
  const form = useForm({ initial: { ...INITIAL, ...initial }, schema, onSubmit, serverError: error, pending });
  const options = kits.map((kit) => ({
    value: kit.id,
    label: `${kit.makerName} ${kit.name}`,
    description: vehicleClassLabel(kit.vehicleClass),
  }));
  return (
    <View style={styles.form}>
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
        hint={nicknameHint ?? 'Whatever you call it in the pits, such as “Blue one” or “Spare”.'}
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
        {cancel ? <Button label={cancel.label} variant="secondary" onPress={cancel.onPress} disabled={pending} /> : null}
      </View>
    </View>
  );
}

const styles = StyleSheet.create({
  form: { gap: space.lg },
  buttons: { flexDirection: 'row', flexWrap: 'wrap', gap: space.sm },
});
