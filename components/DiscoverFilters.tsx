import { StyleSheet, View } from 'react-native';
import type { DiscoverFilters as Filters } from '../hooks/discover';
import { displayUnitLabel, formatForDisplay, parseFromDisplay } from '../shared/compute/setup';
import type { UnitPreferences } from '../shared/types/auth';
import type { KitSummary } from '../shared/types/catalog';
import { DISCOVER_TEMPERATURE_C, type DiscoverSort } from '../shared/types/community';
import { TRACK_TYPES, type TrackTypeKey } from '../shared/types/trackTypes';
import { VEHICLE_CLASSES, type VehicleClassKey } from '../shared/types/vehicleClasses';
import { space } from '../theme';
import { ChoiceChips, type ChoiceOption } from './ChoiceChips';
import { TextField } from './TextField';

/** The filter controls as typed: "any" for no filter, temperatures in the racer's unit. */
export type DiscoverDraft = {
  vehicleClass: string;
  kitId: string;
  trackType: string;
  tempMin: string;
  tempMax: string;
  sort: DiscoverSort;
  bestFor: TrackTypeKey;
};

export const EMPTY_DISCOVER_DRAFT: DiscoverDraft = {
  vehicleClass: 'any',
  kitId: 'any',
  trackType: 'any',
  tempMin: '',
  tempMax: '',
  sort: 'newest',
  bestFor: TRACK_TYPES[0].key,
};

export type DiscoverFilterErrors = { tempMin?: string; tempMax?: string };

function temperatureC(text: string, units: UnitPreferences): { value: number | null; error?: string } {
  const trimmed = text.trim();
  if (!trimmed) return { value: null };
  let value: number;
  try {
    value = Math.round(parseFromDisplay(trimmed.replace(',', '.'), 'temperature', units) * 10) / 10;
  } catch {
    return { value: null, error: `Type a number, such as ${units.temperature === 'F' ? '68' : '20'}.` };
  }
  if (value < DISCOVER_TEMPERATURE_C.min || value > DISCOVER_TEMPERATURE_C.max) {
    const low = formatForDisplay(DISCOVER_TEMPERATURE_C.min, 'temperature', units).text;
    const high = formatForDisplay(DISCOVER_TEMPERATURE_C.max, 'temperature', units).text;
    return { value: null, error: `Track temperatures go from ${low} to ${high}.` };
  }
  return { value };
}

/**
 * What the API is asked for, from the controls: temperatures converted to °C; a temperature that
 * cannot be used is left out and named in `errors`, so the list never waits on a half-typed field.
 */
export function filtersFromDraft(draft: DiscoverDraft, units: UnitPreferences): { filters: Filters; errors: DiscoverFilterErrors } {
  const min = temperatureC(draft.tempMin, units);
  const max = temperatureC(draft.tempMax, units);
  const errors: DiscoverFilterErrors = { tempMin: min.error, tempMax: max.error };
  if (min.value !== null && max.value !== null && min.value > max.value) {
    errors.tempMax = 'The highest temperature must be at or above the lowest.';
    max.value = null;
  }
  return {
    filters: {
      vehicleClass: draft.vehicleClass === 'any' ? null : (draft.vehicleClass as VehicleClassKey),
      kitId: draft.kitId === 'any' ? null : Number(draft.kitId),
      trackType: draft.trackType === 'any' ? null : (draft.trackType as TrackTypeKey),
      tempMinC: min.value,
      tempMaxC: max.value,
      sort: draft.sort,
      bestFor: draft.sort === 'best-for' ? draft.bestFor : null,
    },
    errors,
  };
}

/** How many filters (not the order) narrow the list: shown on the button that opens them. */
export function activeFilterCount(draft: DiscoverDraft): number {
  return [draft.vehicleClass !== 'any', draft.kitId !== 'any', draft.trackType !== 'any', draft.tempMin.trim() !== '' || draft.tempMax.trim() !== ''].filter(Boolean).length;
}

const CLASS_OPTIONS: ChoiceOption<string>[] = [{ value: 'any', label: 'Any class' }, ...VEHICLE_CLASSES.map((c) => ({ value: c.key, label: c.label }))];
const TRACK_OPTIONS: ChoiceOption<string>[] = [{ value: 'any', label: 'Any surface' }, ...TRACK_TYPES.map((t) => ({ value: t.key, label: t.label }))];

export type DiscoverFiltersProps = {
  draft: DiscoverDraft;
  onChange: <K extends keyof DiscoverDraft>(field: K, value: DiscoverDraft[K]) => void;
  /** Kits to pick from (all of them; only the chosen class's are offered). */
  kits: KitSummary[];
  units: UnitPreferences;
  errors: DiscoverFilterErrors;
};

/** Class, kit, track surface and a track temperature range, in the racer's temperature unit. */
export function DiscoverFilters({ draft, onChange, kits, units, errors }: DiscoverFiltersProps) {
  const unit = displayUnitLabel('temperature', units);
  const kitOptions: ChoiceOption<string>[] = [
    { value: 'any', label: 'Any kit' },
    ...kits
      .filter((k) => draft.vehicleClass === 'any' || k.vehicleClass === draft.vehicleClass)
      .map((k) => ({ value: String(k.id), label: k.name, spoken: `${k.makerName} ${k.name}` })),
  ];
  return (
    <View style={styles.group}>
      <ChoiceChips label="Class" options={CLASS_OPTIONS} selected={[draft.vehicleClass]} onChange={([v]) => onChange('vehicleClass', v)} />
      <ChoiceChips label="Kit" options={kitOptions} selected={[draft.kitId]} onChange={([v]) => onChange('kitId', v)} />
      <ChoiceChips label="Track surface" options={TRACK_OPTIONS} selected={[draft.trackType]} onChange={([v]) => onChange('trackType', v)} />
      <View style={styles.temperatures}>
        <View style={styles.temperature}>
          <TextField
            label={`Track temperature from (${unit})`}
            value={draft.tempMin}
            onChangeText={(text) => onChange('tempMin', text)}
            error={errors.tempMin}
            inputMode="decimal"
            keyboardType="numbers-and-punctuation"
            maxLength={6}
          />
        </View>
        <View style={styles.temperature}>
          <TextField
            label={`Track temperature up to (${unit})`}
            value={draft.tempMax}
            onChangeText={(text) => onChange('tempMax', text)}
            error={errors.tempMax}
            inputMode="decimal"
            keyboardType="numbers-and-punctuation"
            maxLength={6}
          />
        </View>
      </View>
    </View>
  );
}

const styles = StyleSheet.create({
  group: { gap: space.lg },
  temperatures: { flexDirection: 'row', flexWrap: 'wrap', gap: space.md },
  temperature: { flexGrow: 1, flexBasis: 140 },
});
