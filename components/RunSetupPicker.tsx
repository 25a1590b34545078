import { useState } from 'react';
import { StyleSheet, View } from 'react-native';
import type { Garage } from '../shared/types/setups';
import { trackTypeLabel } from '../shared/types/trackTypes';
import { vehicleClassLabel } from '../shared/types/vehicleClasses';
import { space } from '../theme';
import { AppText } from './AppText';
import { Button } from './Button';
import { ButtonLink } from './ButtonLink';
import { formatDay } from './SetupSheetFormat';
import { SetupRadioList } from './SetupRadioList';
import { ErrorState, LoadingState } from './StatusViews';

export type GarageCar = Garage['cars'][number];

/** The revisions of the picked setup, as far as they have loaded. */
export type RevisionChoices =
  | { status: 'idle' }
  | { status: 'loading' }
  | { status: 'error'; message: string; retry: () => void }
  | { status: 'ready'; currentId: number; revisions: { id: number; number: number; changeNote: string; createdAt: string }[] };

export type RunSetupPickerProps = {
  cars: readonly GarageCar[];
  carId: number | null;
  setupId: number | null;
  /** null means the setup's current revision. */
  revisionId: number | null;
  revisions: RevisionChoices;
  onPick: (pick: { carId: number | null; setupId: number | null; revisionId: number | null }) => void;
  errors: { carId?: string; setupId?: string; revisionId?: string };
  disabled?: boolean;
};

/** Revisions listed before "Show all": the recent ones are nearly always the ones run today. */
const RECENT_REVISIONS = 4;

function RevisionPicker({ choices, value, onChange, error, disabled }: { choices: Extract<RevisionChoices, { status: 'ready' }>; value: number | null; onChange: (id: number) => void; error?: string; disabled?: boolean }) {
  const [all, setAll] = useState(false);
  const picked = value ?? choices.currentId;
  const newest = [...choices.revisions].sort((a, b) => b.number - a.number);
  const shown = all ? newest : newest.filter((r, i) => i < RECENT_REVISIONS || r.id === picked);
  const options = shown.map((r) => ({
    value: r.id,
    label: `Revision ${r.number}${r.id === choices.currentId ? ' (current)' : ''}`,
    description: [r.changeNote, formatDay(r.createdAt)].filter(Boolean).join(' · '),
  }));
  return (
    <View style={styles.group}>
      <SetupRadioList label="Revision the car ran" options={options} value={picked} onChange={onChange} error={error} disabled={disabled} />
      {!all && newest.length > shown.length ? (
        <Button label={`Show all ${newest.length} revisions`} variant="secondary" onPress={() => setAll(true)} />
      ) : null}
      <AppText variant="caption" tone="muted">
        The run keeps this revision: editing the setup later never changes what this run used.
      </AppText>
    </View>
  );
}

/** Which car, which of its setups and which revision of it ran: picked from the garage. */
export function RunSetupPicker({ cars, carId, setupId, revisionId, revisions, onPick, errors, disabled }: RunSetupPickerProps) {
  const car = cars.find((c) => c.id === carId) ?? null;
  const carOptions = cars.map((c) => ({ value: c.id, label: c.nickname, description: `${c.makerName} ${c.kitName} · ${vehicleClassLabel(c.vehicleClass)}` }));
  const setupOptions = (car?.setups ?? []).map((s) => ({
    value: s.id,
    label: s.title,
    description: `${s.conditions.trackType ? trackTypeLabel(s.conditions.trackType) : 'Any track'} · ${s.revisionCount} revision${s.revisionCount === 1 ? '' : 's'}`,
  }));
  const pickCar = (id: number) => {
    const setups = cars.find((c) => c.id === id)?.setups ?? [];
    // A car with one setup has nothing to choose between.
    onPick({ carId: id, setupId: setups.length === 1 ? setups[0].id : null, revisionId: null });
  };
  return (
    <View style={styles.group}>
      <SetupRadioList label="Car" options={carOptions} value={carId} onChange={pickCar} error={errors.carId} disabled={disabled} />
      {car && setupOptions.length === 0 ? (
        <View style={styles.group}>
          <AppText tone="muted">{car.nickname} has no setups yet. Start one from the kit’s stock sheet, then log its runs.</AppText>
          <ButtonLink href={`/setups/new?carId=${car.id}`} label="New setup" variant="secondary" />
        </View>
      ) : null}
      {car && setupOptions.length > 0 ? (
        <SetupRadioList
          label="Setup"
          options={setupOptions}
          value={setupId}
          onChange={(id) => onPick({ carId, setupId: id, revisionId: null })}
          error={errors.setupId}
          disabled={disabled}
        />
      ) : null}
      {revisions.status === 'loading' ? <LoadingState label="Loading the setup’s revisions…" /> : null}
      {revisions.status === 'error' ? <ErrorState title="The revisions could not load" message={revisions.message} onRetry={revisions.retry} /> : null}
      {revisions.status === 'ready' ? (
        <RevisionPicker choices={revisions} value={revisionId} onChange={(id) => onPick({ carId, setupId, revisionId: id })} error={errors.revisionId} disabled={disabled} />
      ) : null}
    </View>
  );
}

const styles = StyleSheet.create({
  group: { gap: space.md },
});
