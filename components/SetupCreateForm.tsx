import { useState } from 'react';
import { StyleSheet, View } from 'react-native';
import { describeError } from '../hooks/form';
import type { UnitPreferences } from '../shared/types/auth';
import type { Garage, SetupCreate, Visibility } from '../shared/types/setups';
import { vehicleClassLabel } from '../shared/types/vehicleClasses';
import { space } from '../theme';
import { Button } from './Button';
import { ConditionsFields, conditionsFromDraft, EMPTY_CONDITIONS, type ConditionsDraft } from './ConditionsFields';
import { FormErrorBanner } from './FormErrorBanner';
import { formatDay } from './SetupSheetFormat';
import { SetupRadioList, type SetupRadioOption } from './SetupRadioList';
import { TextField } from './TextField';
import { VisibilityChoice } from './VisibilityChoice';

type GarageCar = Garage['cars'][number];

export type SetupCreateFormProps = {
  cars: GarageCar[];
  initialCarId: number | null;
  units: UnitPreferences;
  onSubmit: (input: SetupCreate) => unknown;
  pending: boolean;
  error: unknown;
};

/** The kit's stock sheet, or a copy of any of my setups for the same class of car. */
function startOptions(car: GarageCar, cars: GarageCar[]): SetupRadioOption<string>[] {
  const copies = cars
    .filter((c) => c.vehicleClass === car.vehicleClass)
    .flatMap((c) => c.setups.map((s) => ({ car: c, setup: s })))
    .map(({ car: c, setup }) => ({
      value: `copy:${setup.id}`,
      label: `A copy of “${setup.title}”`,
      description: `Its latest revision, from ${c.nickname}, changed ${formatDay(setup.updatedAt)}`,
    }));
  return [
    { value: 'stock', label: 'The kit’s stock sheet', description: `${car.makerName} ${car.kitName} as it comes in the box` },
    ...copies,
  ];
}

function startFromValue(choice: string): SetupCreate['startFrom'] {
  return choice.startsWith('copy:') ? { kind: 'copy', setupId: Number(choice.slice(5)) } : { kind: 'stock' };
}

/** Title, who can see it, conditions and a starting sheet for a new setup on one of my cars. */
export function SetupCreateForm({ cars, initialCarId, units, onSubmit, pending, error }: SetupCreateFormProps) {
  const [carId, setCarId] = useState<number>(cars.some((c) => c.id === initialCarId) ? (initialCarId as number) : cars[0].id);
  const [title, setTitle] = useState('');
  const [visibility, setVisibility] = useState<Visibility>('private');
  const [conditions, setConditions] = useState<ConditionsDraft>(EMPTY_CONDITIONS);
  const [startFrom, setStartFrom] = useState('stock');
  const [local, setLocal] = useState<{ title?: string; temperature?: string }>({});
  const car = cars.find((c) => c.id === carId) ?? cars[0];
  const server = describeError(error, ['title', 'startFrom', 'carId']);

  const submit = () => {
    if (pending) return;
    const converted = conditionsFromDraft(conditions, units);
    const errors = {
      title: title.trim() ? undefined : 'Give the setup a title, such as the track and the day.',
      temperature: 'error' in converted ? converted.error : undefined,
    };
    setLocal(errors);
    if (errors.title || errors.temperature || 'error' in converted) return;
    const input: SetupCreate = { carId: car.id, title: title.trim(), visibility, conditions: converted.conditions, startFrom: startFromValue(startFrom) };
    // The caller's mutation keeps the failure and hands it back as `error`.
    Promise.resolve(onSubmit(input)).catch(() => undefined);
  };

  return (
    <View style={styles.form}>
      <FormErrorBanner message={server.formError} />
      {cars.length > 1 ? (
        <SetupRadioList
          label="Car"
          options={cars.map((c) => ({ value: c.id, label: c.nickname, description: `${c.makerName} ${c.kitName} · ${vehicleClassLabel(c.vehicleClass)}` }))}
          value={car.id}
          onChange={(id) => {
            setCarId(id);
            // Copies of another class's setups do not fit this car's sheet.
            setStartFrom('stock');
          }}
          error={server.fieldErrors.carId}
          disabled={pending}
        />
      ) : null}
      <TextField
        label="Title"
        hint="Say where and when it works, such as “Dusty summer evenings”."
        value={title}
        onChangeText={(text) => {
          setTitle(text);
          setLocal((prev) => ({ ...prev, title: undefined }));
        }}
        error={local.title ?? server.fieldErrors.title}
        maxLength={120}
        editable={!pending}
      />
      <VisibilityChoice value={visibility} onChange={setVisibility} disabled={pending} />
      <ConditionsFields
        value={conditions}
        onChange={(field, value) => {
          setConditions((prev) => ({ ...prev, [field]: value }));
          if (field === 'temperature') setLocal((prev) => ({ ...prev, temperature: undefined }));
        }}
        units={units}
        temperatureError={local.temperature}
        disabled={pending}
      />
      <SetupRadioList
        label="Start from"
        options={startOptions(car, cars)}
        value={startFrom}
        onChange={setStartFrom}
        error={server.fieldErrors.startFrom}
        disabled={pending}
      />
      <Button label="Create the setup" busy={pending} busyLabel="Creating the setup…" onPress={submit} />
    </View>
  );
}

const styles = StyleSheet.create({
  form: { gap: space.xl },
});
