import { type VehicleClassKey, vehicleClassLabel } from '../../types/vehicleClasses';
import { MM_PER_INCH } from './units';
import { requireNonNegative } from './validate';

/** An inclusive range in mm. */
export interface RangeMm {
  minMm: number;
  maxMm: number;
}

/**
 * Ride heights, mm, that are plausible for each class, measured the usual way: car at rest on a
 * flat board, chassis underside at the front or rear. Deliberately wider than where race setups
 * sit, because the point is to catch typing and unit mistakes (5, 80, or 1.06 meant as inches),
 * not to second-guess an unusual setup.
 *
 * These bands are common practice recalled from memory, not from a published source; race
 * setups sit roughly at 24–28 mm for 1/8 buggies, 28–35 mm for 1/8 truggies and 19–24 mm for
 * 1/10 buggies. Typed as a Record over every class key so a new class cannot be added to
 * shared/types/vehicleClasses.ts without choosing its band here.
 */
export const PLAUSIBLE_RIDE_HEIGHT_MM: Readonly<Record<VehicleClassKey, RangeMm>> = {
  'buggy-1-8-nitro': { minMm: 18, maxMm: 36 },
  'buggy-1-8-electric': { minMm: 18, maxMm: 36 },
  'truggy-1-8-nitro': { minMm: 22, maxMm: 45 },
  'truggy-1-8-electric': { minMm: 22, maxMm: 45 },
  'buggy-1-10-4wd': { minMm: 14, maxMm: 30 },
  'buggy-1-10-2wd': { minMm: 14, maxMm: 30 },
};

function isWithin(value: number, range: RangeMm): boolean {
  return value >= range.minMm && value <= range.maxMm;
}

// Enough decimals to echo what the racer typed (1.063) without float noise (0.30000000000000004).
function formatMm(value: number, decimals: number): string {
  const scale = 10 ** decimals;
  return String(Math.round(value * scale) / scale);
}

/**
 * A warning, not a refusal: returns a message when `rideHeightMm` is outside the plausible band
 * for the class, or null when it is plausible. When the number would be plausible as inches the
 * message says so, since that is the most common slip.
 * @param vehicleClass one of the keys in VEHICLE_CLASSES
 * @param rideHeightMm measured ride height, mm
 * @throws RangeError when the class is unknown or the height is negative or not finite
 */
export function checkRideHeightPlausibility(vehicleClass: VehicleClassKey, rideHeightMm: number): string | null {
  const range = Object.hasOwn(PLAUSIBLE_RIDE_HEIGHT_MM, vehicleClass)
    ? PLAUSIBLE_RIDE_HEIGHT_MM[vehicleClass]
    : undefined;
  if (range === undefined) {
    throw new RangeError(`vehicleClass must be a known vehicle class key, got ${JSON.stringify(vehicleClass)}`);
  }
  const height = requireNonNegative('rideHeightMm', rideHeightMm);
  if (isWithin(height, range)) return null;

  const label = vehicleClassLabel(vehicleClass);
  let message =
    `Ride height ${formatMm(height, 3)} mm is unusual for a ${label}: ` +
    `they usually sit between ${range.minMm} and ${range.maxMm} mm. Check the value and the unit.`;
  const asInchesMm = height * MM_PER_INCH;
  if (isWithin(asInchesMm, range)) {
    message += ` If ${formatMm(height, 3)} was in inches, that is ${formatMm(asInchesMm, 1)} mm.`;
  }
  return message;
}
