import { TrackdayInputError, requireNumberInRange } from './inputChecks';

/*
 * ASTM D341 (Walther) viscosity–temperature line:
 *   log10(log10(ν + 0.7)) = A − B · log10(T)
 * ν is kinematic viscosity in cSt (mm²/s), T absolute temperature in kelvin. On these axes the
 * viscosity of a given oil plots as a straight line, so two measured points fix it. The simple
 * 0.7 offset is the standard's form for ν ≥ 2 cSt, which covers every damper and diff oil.
 */

/** A viscosity at a temperature. */
export interface ViscosityPoint {
  temperatureC: number;
  viscosityCst: number;
}

/** The constants A and B of one oil's Walther line (temperatures in kelvin, log base 10). */
export interface WaltherLine {
  a: number;
  b: number;
}

/** Offset the ASTM D341 simple form adds to the viscosity in cSt. */
export const WALTHER_OFFSET_CST = 0.7;
/** Smallest viscosity for which the simple form holds. */
export const WALTHER_MIN_VISCOSITY_CST = 2;
const MAX_VISCOSITY_CST = 1e7;
const MIN_TEMPERATURE_C = -60;
const MAX_TEMPERATURE_C = 350;
const MAX_CURVE_POINTS = 1000;

/** Kelvin from degrees Celsius. */
export function celsiusToKelvin(temperatureC: number): number {
  return temperatureC + 273.15;
}

/** Fits the Walther line through two viscosities measured at two different temperatures. */
export function fitWaltherLine(first: ViscosityPoint, second: ViscosityPoint): WaltherLine {
  const firstY = doubleLog(checkPoint(first, 'first point'));
  const secondY = doubleLog(checkPoint(second, 'second point'));
  const firstX = Math.log10(celsiusToKelvin(first.temperatureC));
  const secondX = Math.log10(celsiusToKelvin(second.temperatureC));
  if (first.temperatureC === second.temperatureC) {
    throw new TrackdayInputError('the two points must be at different temperatures');
  }
  const b = (firstY - secondY) / (secondX - firstX);
  if (!(b > 0)) {
    throw new TrackdayInputError('viscosity must fall as temperature rises: check the two points');
  }
  return { a: firstY + b * firstX, b };
}

/** Viscosity in cSt on `line` at `temperatureC`. */
export function viscosityAt(line: WaltherLine, temperatureC: number): number {
  checkLine(line);
  temperature(temperatureC, 'temperature (°C)');
  const doubleLogViscosity = line.a - line.b * Math.log10(celsiusToKelvin(temperatureC));
  const viscosity = 10 ** (10 ** doubleLogViscosity) - WALTHER_OFFSET_CST;
  if (!Number.isFinite(viscosity)) {
    throw new TrackdayInputError(
      `the model gives no usable viscosity at ${temperatureC} °C: too far from its data`,
    );
  }
  return viscosity;
}

/** Options for {@link viscosityCurve}. */
export interface ViscosityCurveOptions {
  fromC: number;
  toC: number;
  /** Evenly spaced points including both ends; default 41. */
  pointCount?: number;
}

/** Points of `line` across a temperature range, for a chart. */
export function viscosityCurve(line: WaltherLine, options: ViscosityCurveOptions): ViscosityPoint[] {
  const fromC = temperature(options.fromC, 'curve start (°C)');
  const toC = temperature(options.toC, 'curve end (°C)');
  const pointCount = requireNumberInRange(
    options.pointCount ?? 41,
    'number of curve points',
    2,
    MAX_CURVE_POINTS,
  );
  if (!Number.isInteger(pointCount)) {
    throw new TrackdayInputError(`number of curve points must be whole, got ${pointCount}`);
  }
  if (fromC >= toC) throw new TrackdayInputError('curve start must be below curve end');
  return Array.from({ length: pointCount }, (_, index) => {
    const temperatureC = fromC + ((toC - fromC) * index) / (pointCount - 1);
    return { temperatureC, viscosityCst: viscosityAt(line, temperatureC) };
  });
}

/** log10(log10(ν + 0.7)): the Walther ordinate of a viscosity. */
export function doubleLog(viscosityCst: number): number {
  return Math.log10(Math.log10(viscosityCst + WALTHER_OFFSET_CST));
}

function checkPoint(point: ViscosityPoint, what: string): number {
  if (typeof point !== 'object' || point === null) {
    throw new TrackdayInputError(`${what} must have temperatureC and viscosityCst`);
  }
  temperature(point.temperatureC, `${what} temperature (°C)`);
  return requireNumberInRange(
    point.viscosityCst,
    `${what} viscosity (cSt)`,
    WALTHER_MIN_VISCOSITY_CST,
    MAX_VISCOSITY_CST,
  );
}

function checkLine(line: WaltherLine): void {
  if (typeof line !== 'object' || line === null || !Number.isFinite(line.a) || !Number.isFinite(line.b)) {
    throw new TrackdayInputError('a Walther line needs finite constants a and b');
  }
}

function temperature(value: number, what: string): number {
  return requireNumberInRange(value, what, MIN_TEMPERATURE_C, MAX_TEMPERATURE_C);
}
