import { celsiusToFahrenheit, fahrenheitToCelsius, inchesToMm, mmToInches } from './units';
import { requireFinite } from './validate';

/** Length unit a racer reads setups in. Stored values are always mm. */
export type LengthUnit = 'mm' | 'in';

/** Temperature unit a racer reads setups in. Stored values are always °C. */
export type TemperatureUnit = 'C' | 'F';

/** A racer's display preferences, one per convertible kind. */
export interface UnitPreferences {
  length: LengthUnit;
  temperature: TemperatureUnit;
}

/** The kinds of value this module converts; everything else is shown as stored. */
export type ConvertedKind = 'length' | 'temperature';

/**
 * Kind of a setup-sheet value. Any string is accepted so templates can add kinds (angle, teeth,
 * oil weight …) without touching this module; `string & {}` keeps editor completion for the two
 * kinds that convert.
 */
export type UnitKind = ConvertedKind | (string & {});

/** A value ready to show: the rounded number, its unit label and the two joined. */
export interface DisplayValue {
  value: number;
  unit: string;
  text: string;
}

type DisplayUnit = LengthUnit | TemperatureUnit;

// Resolution racers read at (common practice): a tenth of a mm on ride height and droop, while
// inch readers quote thousandths; whole degrees for track and engine temperature.
const DECIMALS: Record<DisplayUnit, number> = { mm: 1, in: 3, C: 0, F: 0 };

const LABELS: Record<DisplayUnit, string> = { mm: 'mm', in: 'in', C: '°C', F: '°F' };

function displayUnitFor(kind: UnitKind, preferences: UnitPreferences): DisplayUnit | null {
  if (kind === 'length') {
    if (preferences.length !== 'mm' && preferences.length !== 'in') {
      throw new RangeError(`preferences.length must be 'mm' or 'in', got ${String(preferences.length)}`);
    }
    return preferences.length;
  }
  if (kind === 'temperature') {
    if (preferences.temperature !== 'C' && preferences.temperature !== 'F') {
      throw new RangeError(`preferences.temperature must be 'C' or 'F', got ${String(preferences.temperature)}`);
    }
    return preferences.temperature;
  }
  return null;
}

function fromSi(valueSi: number, unit: DisplayUnit): number {
  if (unit === 'in') return mmToInches(valueSi);
  if (unit === 'F') return celsiusToFahrenheit(valueSi);
  return valueSi;
}

function toSi(displayed: number, unit: DisplayUnit): number {
  if (unit === 'in') return inchesToMm(displayed);
  if (unit === 'F') return fahrenheitToCelsius(displayed);
  return displayed;
}

// NIST SP 811 §7.2: a space before every unit symbol, °C included, except the plane-angle
// degree, minute and second, which touch the number (2.75°).
const UNSPACED_UNITS = new Set(['', '°', '′', '″']);

function joinText(number: string, unit: string): string {
  return UNSPACED_UNITS.has(unit) ? `${number}${unit}` : `${number} ${unit}`;
}

/**
 * Label of the unit a value of this kind is shown in, e.g. "in" or "°F".
 * @param passThroughUnit label for kinds that are not converted (e.g. "°" or "cSt")
 * @throws RangeError when the preference for a converted kind is not a known unit
 */
export function displayUnitLabel(kind: UnitKind, preferences: UnitPreferences, passThroughUnit = ''): string {
  const unit = displayUnitFor(kind, preferences);
  return unit === null ? passThroughUnit : LABELS[unit];
}

/**
 * Turns a stored SI value (mm, °C) into what the racer reads: converted to their unit and rounded
 * (mm to 0.1, in to 0.001, °C and °F to 1), e.g. 27 → "27.0 mm" or "1.063 in", 30 → "30 °C" or
 * "86 °F". Other kinds are passed through unconverted and unrounded, with `passThroughUnit`.
 * A space separates number and unit, °C and °F included, per NIST SP 811 §7.2 (angle degrees
 * excepted).
 * @throws RangeError when the value is not finite or a preference is not a known unit
 */
export function formatForDisplay(
  valueSi: number,
  kind: UnitKind,
  preferences: UnitPreferences,
  passThroughUnit = '',
): DisplayValue {
  const stored = requireFinite('valueSi', valueSi);
  const unit = displayUnitFor(kind, preferences);
  if (unit === null) {
    return { value: stored, unit: passThroughUnit, text: joinText(String(stored), passThroughUnit) };
  }
  let number = fromSi(stored, unit).toFixed(DECIMALS[unit]);
  // −0.04 mm rounds to "-0.0"; a racer should read "0.0".
  if (Number(number) === 0) number = (0).toFixed(DECIMALS[unit]);
  return { value: Number(number), unit: LABELS[unit], text: joinText(number, LABELS[unit]) };
}

const PLAIN_DECIMAL = /^[+-]?(\d+(\.\d*)?|\.\d+)$/;

function parseNumber(input: string | number): number {
  if (typeof input === 'number') return requireFinite('input', input);
  const text = String(input).trim(); // String() so a stray null from a form reads as bad text
  // Number() would accept "", "0x1A" and "1e3"; a setup field only ever holds a plain decimal.
  if (!PLAIN_DECIMAL.test(text)) {
    throw new RangeError(`input must be a decimal number such as 27.5 (use a dot), got "${input}"`);
  }
  return Number(text);
}

function stripUnit(text: string, labels: string[]): string {
  const trimmed = text.trim();
  for (const label of labels) {
    if (label !== '' && trimmed.toLowerCase().endsWith(label.toLowerCase())) {
      return trimmed.slice(0, trimmed.length - label.length);
    }
  }
  return trimmed;
}

/**
 * Reads a value typed or shown in the racer's unit back into SI (mm, °C). Accepts a number or a
 * string, optionally ending in the unit label ("1.063 in", "86 °F", "86 F"), so the output of
 * formatForDisplay parses back. Other kinds are returned as given.
 * @throws RangeError when the input is not a plain finite decimal or a preference is unknown
 */
export function parseFromDisplay(
  input: string | number,
  kind: UnitKind,
  preferences: UnitPreferences,
  passThroughUnit = '',
): number {
  const unit = displayUnitFor(kind, preferences);
  const labels = unit === null ? [passThroughUnit] : [LABELS[unit], unit];
  const displayed = parseNumber(typeof input === 'string' ? stripUnit(input, labels) : input);
  return unit === null ? displayed : toSi(displayed, unit);
}
