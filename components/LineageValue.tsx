import type { UnitPreferences } from '../shared/types/auth';
import { fieldsByKey, getTemplate, type SetupFieldValue } from '../shared/types/templates';
import type { VehicleClassKey } from '../shared/types/vehicleClasses';
import { AppText, type AppTextProps } from './AppText';
import { formatFieldValue } from './SetupSheetFormat';

/**
 * One stored value of a class's sheet as the racer reads it (their units, choice labels); null when
 * there is none. A key the sheet does not know shows as stored rather than disappearing.
 */
export function formatSheetValue(
  vehicleClass: VehicleClassKey,
  key: string,
  value: SetupFieldValue | null | undefined,
  units: UnitPreferences,
): string | null {
  if (value === null || value === undefined || value === '') return null;
  const field = fieldsByKey(getTemplate(vehicleClass)).get(key);
  return field ? formatFieldValue(field, value, units) : String(value);
}

export type LineageValueProps = Omit<AppTextProps, 'children'> & {
  vehicleClass: VehicleClassKey;
  fieldKey: string;
  value: SetupFieldValue | null | undefined;
  units: UnitPreferences;
};

/** A sheet value in words, or "Not set" in muted type when the sheet has none. */
export function LineageValue({ vehicleClass, fieldKey, value, units, tone, ...text }: LineageValueProps) {
  const shown = formatSheetValue(vehicleClass, fieldKey, value, units);
  return (
    <AppText tone={shown === null ? 'muted' : tone} {...text}>
      {shown ?? 'Not set'}
    </AppText>
  );
}
