import { formatForDisplay, type ComputedRow, type ComputedUnit } from '../shared/compute/setup';
import type { UnitPreferences } from '../shared/types/auth';
import { AppText } from './AppText';
import { Card } from './Card';
import { CompareRows, type CompareDisplayRow } from './CompareRows';

export type CompareFiguresProps = {
  rows: ComputedRow[];
  units: UnitPreferences;
  wide: boolean;
  columns: { a: string; b: string };
};

const KM_PER_MILE = 1.609344;

/** A computed figure as the setup page's summary shows it: ratios to 2 places, rollout in the viewer's length unit. */
export function figureText(value: number | null, unit: ComputedUnit, units: UnitPreferences): string {
  if (value === null) return 'Not worked out';
  switch (unit) {
    case 'ratio':
      return `${value.toFixed(2)} : 1`;
    case 'mm':
      return formatForDisplay(value, 'length', units).text;
    case 'deg':
      return `${value.toFixed(1)}°`;
    case 'km/h':
      // Racers who read inches read speed in mph, as on the setup page.
      return units.length === 'in' ? `${Math.round(value / KM_PER_MILE)} mph` : `${Math.round(value)} km/h`;
  }
}

/** Ratios, rollout, toe and top speed of both sheets, every figure shown so the gearing story reads whole. */
export function CompareFigures({ rows, units, wide, columns }: CompareFiguresProps) {
  const display: CompareDisplayRow[] = rows.map((row) => ({
    key: row.key,
    label: row.label,
    a: figureText(row.a, row.unit, units),
    b: figureText(row.b, row.unit, units),
    changed: row.changed,
  }));
  return (
    <Card>
      <AppText variant="heading">Worked out from each sheet</AppText>
      {display.length === 0 ? (
        <AppText tone="muted">Neither sheet has the gearing, tire or toe values these figures need.</AppText>
      ) : (
        <CompareRows rows={display} wide={wide} columns={columns} label="Computed figures compared" />
      )}
    </Card>
  );
}
