import { computeSetupSummary, formatForDisplay, type SummaryFigure } from '../shared/compute/setup';
import type { UnitPreferences } from '../shared/types/auth';
import type { StoredSetupValues } from '../shared/types/setups';
import { fieldsByKey, getTemplate } from '../shared/types/templates';
import { VEHICLE_CLASSES, type VehicleClassKey } from '../shared/types/vehicleClasses';

/** One line of the summary: a figure to show, a list of fields to fill, or nothing this class can give. */
export type SummaryLine =
  | { key: string; label: string; state: 'value'; text: string }
  | { key: string; label: string; state: 'missing'; fieldLabels: string[] }
  | { key: string; label: string; state: 'unavailable' };

const KM_PER_MILE = 1.609344;

function ratio(value: number): string {
  return `${value.toFixed(2)} : 1`;
}

/** Racers who read inches read speed in mph; everyone else in km/h. */
function speed(kmh: number, units: UnitPreferences): string {
  return units.length === 'in' ? `${Math.round(kmh / KM_PER_MILE)} mph` : `${Math.round(kmh)} km/h`;
}

/**
 * The computed figures of a sheet, ready to show. A figure that needs fields the class's sheet does
 * not have (a 2WD gearbox has no diff ring and pinion) is unavailable rather than missing, so the
 * page never asks for a field the racer cannot find.
 */
export function summaryLines(vehicleClass: VehicleClassKey, values: StoredSetupValues, units: UnitPreferences): SummaryLine[] {
  const fields = fieldsByKey(getTemplate(vehicleClass));
  const figures = computeSetupSummary(vehicleClass, values);
  const electric = VEHICLE_CLASSES.find((c) => c.key === vehicleClass)?.power === 'electric';
  const nitro = !electric;
  const rows: Array<{ key: string; label: string; figure: SummaryFigure; show: (v: number) => string }> = [
    { key: 'gear', label: nitro ? 'Gear ratio (spur ÷ clutch bell)' : 'Gear ratio (spur ÷ pinion)', figure: figures.gearRatio, show: ratio },
    { key: 'diff', label: 'Diff ratio (ring ÷ diff pinion)', figure: figures.internalDiffRatio, show: ratio },
    { key: 'final', label: 'Final drive', figure: figures.finalDriveRatio, show: ratio },
    {
      key: 'rollout',
      label: nitro ? 'Rollout per engine turn' : 'Rollout per motor turn',
      figure: figures.rolloutMm,
      show: (v) => formatForDisplay(v, 'length', units).text,
    },
    { key: 'toe', label: 'Total rear toe', figure: figures.totalRearToeDeg, show: (v) => `${v.toFixed(1)}°` },
  ];
  if (electric) {
    rows.push({ key: 'speed', label: 'Top speed with no load', figure: figures.electricTopSpeedKmh, show: (v) => speed(v, units) });
  }
  return rows.map(({ key, label, figure, show }): SummaryLine => {
    if (figure.value !== null) return { key, label, state: 'value', text: show(figure.value) };
    const unique = [...new Set(figure.missing)];
    if (unique.some((k) => !fields.has(k))) return { key, label, state: 'unavailable' };
    return { key, label, state: 'missing', fieldLabels: unique.map((k) => fields.get(k)?.label ?? k) };
  });
}

/** "Spur gear", "Spur gear and Pinion", "A, B and C". */
export function joinLabels(labels: string[]): string {
  if (labels.length <= 1) return labels[0] ?? '';
  return `${labels.slice(0, -1).join(', ')} and ${labels[labels.length - 1]}`;
}
