import { useState } from 'react';
import { StyleSheet, View } from 'react-native';
import type { Garage } from '../shared/types/setups';
import { setupDocumentSchema, type SetupDocument } from '../shared/types/setups';
import { vehicleClassLabel, type VehicleClassKey } from '../shared/types/vehicleClasses';
import { space } from '../theme';
import { AppText } from './AppText';
import { Button } from './Button';
import { Card } from './Card';
import { FormErrorBanner } from './FormErrorBanner';
import { ImportFileButton } from './ImportFileButton';
import { ImportProblems } from './ImportProblems';
import { SetupRadioList } from './SetupRadioList';

type GarageCar = Garage['cars'][number];

export type ImportSetupFormProps = {
  cars: GarageCar[];
  onSubmit: (input: { carId: number; document: unknown }) => unknown;
  pending: boolean;
  error: unknown;
  /** Called when another file is picked, so the last file's refusal is cleared. */
  onReset: () => void;
};

type Picked = { name: string; document: unknown; preview: SetupDocument['setup'] | null };

/** Reads a picked file as JSON; the server does the full check, this only catches files that are not JSON. */
async function readPicked(file: File): Promise<Picked | string> {
  const text = await file.text();
  try {
    const document: unknown = JSON.parse(text);
    const parsed = setupDocumentSchema.safeParse(document);
    return { name: file.name, document, preview: parsed.success ? parsed.data.setup : null };
  } catch {
    return `“${file.name}” is not a setup file: it is not JSON. Pick a file exported from a Tunefork setup page.`;
  }
}

function Preview({ picked }: { picked: Picked }) {
  const setup = picked.preview;
  return (
    <Card>
      <AppText style={styles.bold}>{picked.name}</AppText>
      {setup ? (
        <AppText tone="muted">
          “{setup.title}” · {vehicleClassLabel(setup.vehicleClass)} · {setup.kit.maker} {setup.kit.name} · revision {setup.revision.number}
        </AppText>
      ) : (
        <AppText tone="muted">This file does not look like a Tunefork setup file; importing it will say what is wrong.</AppText>
      )}
    </Card>
  );
}

/** A setup file from the device, imported as a new private setup on one of my cars. */
export function ImportSetupForm({ cars, onSubmit, pending, error, onReset }: ImportSetupFormProps) {
  const [picked, setPicked] = useState<Picked | null>(null);
  const [readError, setReadError] = useState<string | null>(null);
  const [carId, setCarId] = useState<number | null>(null);
  const fileClass: VehicleClassKey | null = picked?.preview?.vehicleClass ?? null;
  const matching = fileClass ? cars.filter((c) => c.vehicleClass === fileClass) : cars;
  const chosen = carId ?? matching[0]?.id ?? null;

  const pick = async (file: File) => {
    const result = await readPicked(file);
    onReset();
    setReadError(typeof result === 'string' ? result : null);
    setPicked(typeof result === 'string' ? null : result);
    setCarId(null);
  };
  const submit = () => {
    if (!picked || chosen === null || pending) return;
    // The caller's mutation keeps the failure and hands it back as `error`.
    Promise.resolve(onSubmit({ carId: chosen, document: picked.document })).catch(() => undefined);
  };

  return (
    <View style={styles.form}>
      <AppText tone="muted">
        Setup files are the JSON documents Tunefork exports from a setup page. The import becomes a new private setup, with
        its values checked like any save.
      </AppText>
      <ImportFileButton label={picked ? 'Choose another file' : 'Choose a setup file'} accept="application/json,.json" onPick={(f) => void pick(f)} disabled={pending} />
      <FormErrorBanner message={readError} />
      {picked ? <Preview picked={picked} /> : null}
      {picked && fileClass && matching.length === 0 ? (
        <FormErrorBanner message={`This file is for a ${vehicleClassLabel(fileClass)} and none of your cars is one. Add a car of that class first.`} />
      ) : null}
      {picked && matching.length > 0 ? (
        <SetupRadioList
          label="Import onto"
          options={matching.map((c) => ({ value: c.id, label: c.nickname, description: `${c.makerName} ${c.kitName} · ${vehicleClassLabel(c.vehicleClass)}` }))}
          value={chosen}
          onChange={setCarId}
          disabled={pending}
        />
      ) : null}
      <ImportProblems error={error} vehicleClass={fileClass} />
      {picked && matching.length > 0 ? (
        <Button label="Import as a private setup" busy={pending} busyLabel="Importing…" onPress={submit} />
      ) : null}
    </View>
  );
}

const styles = StyleSheet.create({
  form: { gap: space.lg },
  bold: { fontWeight: '700' },
});
