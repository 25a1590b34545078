import fc from 'fast-check';
import { PLAUSIBLE_RIDE_HEIGHT_MM, checkRideHeightPlausibility } from '../../../shared/compute/setup';
import { VEHICLE_CLASSES, type VehicleClassKey } from '../../../shared/types/vehicleClasses';

describe('ride height plausibility', () => {
  // Common practice, no source: 1/8 buggies run ride heights in the mid-20s mm.
  it('warns about 5 mm and 80 mm on a 1/8 nitro buggy', () => {
    expect(checkRideHeightPlausibility('buggy-1-8-nitro', 5)).toBe(
      'Ride height 5 mm is unusual for a 1/8 nitro buggy: they usually sit between 18 and 36 mm. Check the value and the unit.',
    );
    expect(checkRideHeightPlausibility('buggy-1-8-nitro', 80)).toMatch(/^Ride height 80 mm is unusual for a 1\/8 nitro buggy/);
  });

  it('does not warn about 26 mm on a 1/8 nitro buggy (common practice, no source)', () => {
    expect(checkRideHeightPlausibility('buggy-1-8-nitro', 26)).toBeNull();
  });

  it('does not warn anywhere from 24 to 28 mm on either 1/8 buggy (common practice, no source)', () => {
    fc.assert(
      fc.property(
        fc.constantFrom<VehicleClassKey>('buggy-1-8-nitro', 'buggy-1-8-electric'),
        fc.double({ min: 24, max: 28, noNaN: true }),
        (vehicleClass, height) => {
          expect(checkRideHeightPlausibility(vehicleClass, height)).toBeNull();
        },
      ),
    );
  });

  it('suggests the mm value when the number looks like inches', () => {
    // 1.063 in × 25.4 = 27.0 mm.
    expect(checkRideHeightPlausibility('buggy-1-8-electric', 1.063)).toBe(
      'Ride height 1.063 mm is unusual for a 1/8 electric buggy: they usually sit between 18 and 36 mm. ' +
        'Check the value and the unit. If 1.063 was in inches, that is 27 mm.',
    );
  });

  it('has a band for every vehicle class, and warns outside it but not inside it', () => {
    for (const { key } of VEHICLE_CLASSES) {
      const band = PLAUSIBLE_RIDE_HEIGHT_MM[key];
      expect(band.minMm).toBeLessThan(band.maxMm);
      expect(checkRideHeightPlausibility(key, (band.minMm + band.maxMm) / 2)).toBeNull();
      expect(checkRideHeightPlausibility(key, band.minMm - 0.5)).toEqual(expect.any(String));
      expect(checkRideHeightPlausibility(key, band.maxMm + 0.5)).toEqual(expect.any(String));
    }
  });

  it('warns about a chassis resting on the ground rather than refusing it', () => {
    expect(checkRideHeightPlausibility('buggy-1-10-2wd', 0)).toEqual(expect.stringContaining('1/10 2WD buggy'));
  });

  it('refuses a negative ride height', () => {
    expect(() => checkRideHeightPlausibility('buggy-1-10-4wd', -3)).toThrow(new RangeError('rideHeightMm must be zero or more, got -3'));
  });

  it('refuses an unknown vehicle class', () => {
    expect(() => checkRideHeightPlausibility('buggy-1-12' as VehicleClassKey, 20)).toThrow(
      new RangeError('vehicleClass must be a known vehicle class key, got "buggy-1-12"'),
    );
  });
});
