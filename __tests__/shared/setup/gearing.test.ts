import fc from 'fast-check';
import {
  computeElectricTopSpeedKmh,
  computeFinalDriveRatio,
  computeGearRatio,
  computeInternalDiffRatio,
  computeNoLoadMotorRpm,
  computeRolloutMm,
  computeTopSpeedKmh,
  kmhToMetresPerSecond,
  metresPerSecondToKmh,
} from '../../../shared/compute/setup';

const teeth = fc.integer({ min: 1, max: 200 });
const tireDiameterMm = fc.double({ min: 10, max: 300, noNaN: true });
const ratio = fc.double({ min: 0.5, max: 50, noNaN: true });

function expectRelativelyClose(actual: number, expected: number, relative = 1e-12): void {
  expect(Math.abs(actual - expected)).toBeLessThanOrEqual(relative * Math.abs(expected));
}

describe('gear ratio', () => {
  // Common practice, no source: the usual 1/8 nitro pairing quoted as "3.75" in the pits.
  it('gives 3.75 for a 60-tooth spur on a 16-tooth clutch bell', () => {
    expect(computeGearRatio({ spurTeeth: 60, pinionTeeth: 16 })).toBe(3.75);
  });

  it('divides ring gear teeth by diff pinion teeth for the internal diff ratio', () => {
    expect(computeInternalDiffRatio({ ringGearTeeth: 43, diffPinionTeeth: 10 })).toBe(4.3);
  });

  it('multiplies spur ratio and diff ratio into the final drive ratio', () => {
    // 60/16 × 43/10 = 3.75 × 4.3, worked by hand.
    expect(
      computeFinalDriveRatio({ spurTeeth: 60, pinionTeeth: 16, ringGearTeeth: 43, diffPinionTeeth: 10 }),
    ).toBeCloseTo(16.125, 12);
  });

  it('scales the final drive ratio linearly with spur teeth', () => {
    fc.assert(
      fc.property(teeth, fc.integer({ min: 1, max: 10 }), teeth, teeth, teeth, (spur, k, pinion, ring, diffPinion) => {
        const base = computeFinalDriveRatio({ spurTeeth: spur, pinionTeeth: pinion, ringGearTeeth: ring, diffPinionTeeth: diffPinion });
        const scaled = computeFinalDriveRatio({
          spurTeeth: spur * k,
          pinionTeeth: pinion,
          ringGearTeeth: ring,
          diffPinionTeeth: diffPinion,
        });
        expectRelativelyClose(scaled, base * k);
      }),
    );
  });
});

describe('rollout', () => {
  it('is the tire circumference divided by the final drive ratio', () => {
    // A 100/π mm tire has a 100 mm circumference; at 10:1 the car moves 10 mm per revolution.
    expect(computeRolloutMm({ tireDiameterMm: 100 / Math.PI, finalDriveRatio: 10 })).toBeCloseTo(10, 12);
  });

  it('scales inversely with the final drive ratio', () => {
    fc.assert(
      fc.property(tireDiameterMm, ratio, fc.double({ min: 0.1, max: 10, noNaN: true }), (d, fdr, k) => {
        const base = computeRolloutMm({ tireDiameterMm: d, finalDriveRatio: fdr });
        const taller = computeRolloutMm({ tireDiameterMm: d, finalDriveRatio: fdr * k });
        expectRelativelyClose(taller * k, base);
      }),
    );
  });

  it('scales linearly with tire diameter', () => {
    fc.assert(
      fc.property(tireDiameterMm, ratio, fc.double({ min: 0.1, max: 10, noNaN: true }), (d, fdr, k) => {
        const base = computeRolloutMm({ tireDiameterMm: d, finalDriveRatio: fdr });
        const bigger = computeRolloutMm({ tireDiameterMm: d * k, finalDriveRatio: fdr });
        expectRelativelyClose(bigger, base * k);
      }),
    );
  });
});

describe('top speed', () => {
  it('turns rollout and engine rpm into km/h', () => {
    // 10 mm × 30 000 rpm = 300 000 mm/min = 18 km/h, worked by hand.
    expect(computeTopSpeedKmh({ rolloutMm: 10, rpm: 30_000 })).toBeCloseTo(18, 12);
  });

  it('is zero with the engine stopped', () => {
    expect(computeTopSpeedKmh({ rolloutMm: 10, rpm: 0 })).toBe(0);
  });

  it('takes the no-load motor rpm from kV × battery voltage', () => {
    expect(computeNoLoadMotorRpm({ motorKv: 2000, batteryVolts: 16.8 })).toBeCloseTo(33_600, 9);
  });

  it('gives the electric top speed at no-load rpm', () => {
    // 20 mm × 33 600 rpm = 672 000 mm/min = 40.32 km/h, worked by hand.
    expect(computeElectricTopSpeedKmh({ rolloutMm: 20, motorKv: 2000, batteryVolts: 16.8 })).toBeCloseTo(40.32, 9);
  });

  it('doubles when the engine speed doubles', () => {
    fc.assert(
      fc.property(fc.double({ min: 1, max: 100, noNaN: true }), fc.double({ min: 0, max: 60_000, noNaN: true }), (rollout, rpm) => {
        expectRelativelyClose(
          computeTopSpeedKmh({ rolloutMm: rollout, rpm: rpm * 2 }),
          computeTopSpeedKmh({ rolloutMm: rollout, rpm }) * 2,
        );
      }),
    );
  });
});

describe('speed units', () => {
  // SI: 1 km = 1000 m and 1 h = 3600 s, so 36 km/h is 10 m/s.
  it('converts 36 km/h to 10 m/s and back', () => {
    expect(kmhToMetresPerSecond(36)).toBe(10);
    expect(metresPerSecondToKmh(10)).toBe(36);
  });

  it('round-trips km/h through m/s', () => {
    fc.assert(
      fc.property(fc.double({ min: -1000, max: 1000, noNaN: true }), (kmh) => {
        expect(Math.abs(metresPerSecondToKmh(kmhToMetresPerSecond(kmh)) - kmh)).toBeLessThanOrEqual(1e-12 * Math.max(1, Math.abs(kmh)));
      }),
    );
  });
});
