import { MM_PER_INCH, celsiusToFahrenheit, displayUnitLabel, mmToInches, parseFromDisplay } from '../shared/compute/setup';
import type { UnitPreferences } from '../shared/types/auth';
import type { SetupFieldValue, TemplateField } from '../shared/types/templates';
import { decimalsOf } from '../shared/types/templates/valuesSchema';

/** Number fields in the racer's units: display, steppers and parsing typed text back to stored units. */
export type NumericField = Extract<TemplateField, { type: 'number' | 'integer' }>;
type Converted = 'in' | 'F';

function convertedUnit(field: NumericField, units: UnitPreferences): Converted | null {
  if (field.unit === 'mm' && units.length === 'in') return 'in';
  if (field.unit === '°C' && units.temperature === 'F') return 'F';
  return null;
}

const kindOf = (field: NumericField) => (field.unit === 'mm' ? 'length' : field.unit === '°C' ? 'temperature' : 'stored');
const storedLabel = (field: NumericField) => (field.unit === 'deg' ? '°' : (field.unit ?? ''));

/** The unit a racer reads this field in: their length and temperature choice, anything else as stored. */
export function fieldUnitLabel(field: NumericField, units: UnitPreferences): string {
  return displayUnitLabel(kindOf(field), units, storedLabel(field));
}

const SCALE: Record<Converted, number> = { in: 1 / MM_PER_INCH, F: 9 / 5 };

// Enough places that typing the shown number back stores the same value: 1.25 mm needs 0.0492 in,
// where the usual thousandths (0.049) would come back as 1.24 mm.
function shownDecimals(field: NumericField, unit: Converted): number {
  return Math.max(0, Math.floor(decimalsOf(field.step) - Math.log10(SCALE[unit])) + 1);
}

/** A stored number as the racer types it, without the unit: 27.5 → "27.5", or "1.083" in inches. */
export function formatFieldNumber(field: NumericField, valueSi: number, units: UnitPreferences): string {
  const unit = convertedUnit(field, units);
  if (!unit) return String(valueSi);
  const text = (unit === 'in' ? mmToInches(valueSi) : celsiusToFahrenheit(valueSi)).toFixed(shownDecimals(field, unit));
  return Number(text) === 0 ? text.replace('-', '') : text;
}

function roundToStep(field: NumericField, value: number): number {
  const factor = 10 ** decimalsOf(field.step);
  return Math.round(value * factor) / factor + 0;
}

const NICE_STEPS = [0.001, 0.002, 0.005, 0.01, 0.02, 0.025, 0.05, 0.1, 0.125, 0.25, 0.5, 1, 2, 5, 10, 20, 50, 100];

/** The stepper's increment in the racer's unit: the stored step converted, then rounded to a number people use. */
export function displayStep(field: NumericField, units: UnitPreferences): number {
  const unit = convertedUnit(field, units);
  if (!unit) return field.step;
  const raw = field.step * SCALE[unit];
  return NICE_STEPS.reduce((best, s) => (Math.abs(Math.log(s / raw)) < Math.abs(Math.log(best / raw)) ? s : best));
}

/** One press of − or +: moves by the step in the racer's unit and stays inside the field's limits. */
export function stepFieldValue(field: NumericField, current: SetupFieldValue | undefined, direction: 1 | -1, units: UnitPreferences): number {
  const clamp = (v: number) => roundToStep(field, Math.min(field.max, Math.max(field.min, v)));
  if (typeof current !== 'number') return clamp(field.plausible?.min ?? field.min);
  const unit = convertedUnit(field, units);
  let next = current + direction * field.step;
  if (unit) {
    const shown = Number(formatFieldNumber(field, current, units)) + direction * displayStep(field, units);
    const converted = roundToStep(field, parseFromDisplay(shown, kindOf(field), units));
    // Rounding back to the stored grid can swallow a small inch step; then move by the stored step.
    if (converted !== current) next = converted;
  }
  return clamp(next);
}

export type ParsedText = { ok: true; value: number | undefined } | { ok: false; error: string };

/** Reads what was typed into a number field back into the stored unit; empty clears the field. */
export function parseFieldText(field: NumericField, text: string, units: UnitPreferences): ParsedText {
  let typed = text.trim();
  if (typed === '') return { ok: true, value: undefined };
  if (!typed.includes('.')) typed = typed.replace(',', '.');
  try {
    const value = parseFromDisplay(typed, kindOf(field), units, storedLabel(field));
    // Whole-number fields keep a typed fraction so the check can say so instead of rounding quietly.
    return { ok: true, value: field.type === 'integer' && !convertedUnit(field, units) ? value : roundToStep(field, value) };
  } catch {
    return { ok: false, error: `Type a number for ${field.label.toLowerCase()}, such as ${field.step < 1 ? '27.5' : '12'}, with a dot for decimals.` };
  }
}

export const joinUnit = (number: string, unit: string) => (unit === '' || unit === '°' || unit === '%' ? `${number}${unit}` : `${number} ${unit}`);

/** Any stored value in words, for "was …" notes and the conflict list. */
export function describeValue(field: TemplateField, value: SetupFieldValue | undefined, units: UnitPreferences): string {
  if (value === undefined || value === '') return 'not set';
  switch (field.type) {
    case 'number':
    case 'integer':
      return typeof value === 'number' ? joinUnit(formatFieldNumber(field, value, units), fieldUnitLabel(field, units)) : String(value);
    case 'choice':
      return field.options.find((o) => o.value === value)?.label ?? String(value);
    case 'boolean':
      return value === true ? 'Yes' : 'No';
    case 'position':
      return `Hole ${String(value)}`;
    case 'text':
      return `“${String(value)}”`;
  }
}
