import fc from 'fast-check';
import {
  computeCentreDistanceChangeMm,
  computeCentreDistanceMm,
  computePitchDiameterMm,
} from '../../../shared/compute/setup';

describe('gear geometry from the module', () => {
  // ISO 54 (modules) and ISO 21771:2007 (cylindrical gear geometry) define, for spur gears, the
  // reference diameter d = m·z and the external-pair centre distance a = (d1 + d2)/2. Definitions
  // recalled from memory; the worked example is computed by hand from them.
  it('gives d = 80 mm and 40 mm for m = 2 with 40 and 20 teeth (ISO 54 / ISO 21771)', () => {
    expect(computePitchDiameterMm({ moduleMm: 2, teeth: 40 })).toBe(80);
    expect(computePitchDiameterMm({ moduleMm: 2, teeth: 20 })).toBe(40);
  });

  it('gives a centre distance of 60 mm for m = 2 with 40 and 20 teeth (ISO 54 / ISO 21771)', () => {
    expect(computeCentreDistanceMm({ moduleMm: 2, spurTeeth: 40, pinionTeeth: 20 })).toBe(60);
  });

  // Common practice, no source: 1/8 nitro spurs and bells are 0.8 module.
  it('puts 0.8-module gears of 60 and 16 teeth 30.4 mm apart', () => {
    expect(computeCentreDistanceMm({ moduleMm: 0.8, spurTeeth: 60, pinionTeeth: 16 })).toBeCloseTo(30.4, 12);
  });

  it('equals half the sum of the two pitch diameters', () => {
    fc.assert(
      fc.property(fc.double({ min: 0.1, max: 10, noNaN: true }), fc.integer({ min: 1, max: 300 }), fc.integer({ min: 1, max: 300 }), (m, z1, z2) => {
        const a = computeCentreDistanceMm({ moduleMm: m, spurTeeth: z1, pinionTeeth: z2 });
        const halfSum = (computePitchDiameterMm({ moduleMm: m, teeth: z1 }) + computePitchDiameterMm({ moduleMm: m, teeth: z2 })) / 2;
        expect(Math.abs(a - halfSum)).toBeLessThanOrEqual(1e-12 * halfSum);
      }),
    );
  });
});

describe('engine or motor shift for a pinion change', () => {
  it('moves the engine 0.4 mm away for one more tooth at 0.8 module', () => {
    expect(computeCentreDistanceChangeMm({ moduleMm: 0.8, spurTeeth: 60, pinionTeeth: 16, pinionTeethChange: 1 })).toBeCloseTo(0.4, 12);
  });

  it('moves the engine towards the spur (negative) for a smaller bell', () => {
    expect(computeCentreDistanceChangeMm({ moduleMm: 0.8, spurTeeth: 60, pinionTeeth: 16, pinionTeethChange: -2 })).toBeCloseTo(-0.8, 12);
  });

  it('is zero when the pinion does not change', () => {
    expect(computeCentreDistanceChangeMm({ moduleMm: 1, spurTeeth: 46, pinionTeeth: 14, pinionTeethChange: 0 })).toBe(0);
  });

  it('equals m·n/2 whatever the spur', () => {
    fc.assert(
      fc.property(
        fc.double({ min: 0.1, max: 5, noNaN: true }),
        fc.integer({ min: 1, max: 200 }),
        fc.integer({ min: 1, max: 60 }),
        fc.integer({ min: -30, max: 30 }),
        (m, spur, pinion, n) => {
          fc.pre(pinion + n >= 1);
          const shift = computeCentreDistanceChangeMm({ moduleMm: m, spurTeeth: spur, pinionTeeth: pinion, pinionTeethChange: n });
          expect(Math.abs(shift - (m * n) / 2)).toBeLessThanOrEqual(1e-9);
        },
      ),
    );
  });

  it('returns to zero after +n teeth then −n teeth', () => {
    fc.assert(
      fc.property(
        fc.double({ min: 0.1, max: 5, noNaN: true }),
        fc.integer({ min: 1, max: 200 }),
        fc.integer({ min: 1, max: 60 }),
        fc.integer({ min: 0, max: 30 }),
        (m, spur, pinion, n) => {
          const out = computeCentreDistanceChangeMm({ moduleMm: m, spurTeeth: spur, pinionTeeth: pinion, pinionTeethChange: n });
          const back = computeCentreDistanceChangeMm({ moduleMm: m, spurTeeth: spur, pinionTeeth: pinion + n, pinionTeethChange: -n });
          expect(out + back).toBe(0);
        },
      ),
    );
  });

  it('refuses a change that would leave the pinion without teeth', () => {
    expect(() =>
      computeCentreDistanceChangeMm({ moduleMm: 0.8, spurTeeth: 60, pinionTeeth: 16, pinionTeethChange: -16 }),
    ).toThrow(new RangeError('pinionTeethChange -16 would leave a 0-tooth pinion; the new pinion needs 1 tooth or more'));
  });
});
