import fc from 'fast-check';
import {
  celsiusToFahrenheit,
  computeCentreDistanceChangeMm,
  computeCentreDistanceMm,
  computeElectricTopSpeedKmh,
  computeFinalDriveRatio,
  computeGearRatio,
  computeInternalDiffRatio,
  computeNoLoadMotorRpm,
  computePitchDiameterMm,
  computeRolloutMm,
  computeTopSpeedKmh,
  computeTotalRearToeDeg,
  fahrenheitToCelsius,
  formatForDisplay,
  inchesToMm,
  kmhToMetresPerSecond,
  metresPerSecondToKmh,
  mmToInches,
} from '../../../shared/compute/setup';

const nonFinite = fc.constantFrom(Number.NaN, Number.POSITIVE_INFINITY, Number.NEGATIVE_INFINITY);
const notPositive = fc.oneof(nonFinite, fc.constant(0), fc.constant(-0), fc.double({ max: -Number.MIN_VALUE, noNaN: true }));
const notTeeth = fc.oneof(
  notPositive,
  fc.double({ min: 0.01, max: 500, noNaN: true }).filter((x) => !Number.isInteger(x)),
);

/** Asserts a RangeError whose message starts with the argument's name, so the racer's form can point at it. */
function expectRangeErrorNaming(argument: string, call: () => unknown): void {
  expect(call).toThrow(RangeError);
  expect(call).toThrow(new RegExp(`^${argument} `));
}

const gearing = { spurTeeth: 60, pinionTeeth: 16, ringGearTeeth: 43, diffPinionTeeth: 10 };

describe('invalid inputs throw a RangeError naming the argument', () => {
  it.each(Object.keys(gearing))('final drive ratio refuses a bad %s', (argument) => {
    fc.assert(
      fc.property(notTeeth, (bad) => {
        expectRangeErrorNaming(argument, () => computeFinalDriveRatio({ ...gearing, [argument]: bad }));
      }),
    );
  });

  it('gear ratio and diff ratio refuse zero and negative teeth', () => {
    expectRangeErrorNaming('pinionTeeth', () => computeGearRatio({ spurTeeth: 60, pinionTeeth: 0 }));
    expectRangeErrorNaming('spurTeeth', () => computeGearRatio({ spurTeeth: -60, pinionTeeth: 16 }));
    expectRangeErrorNaming('diffPinionTeeth', () => computeInternalDiffRatio({ ringGearTeeth: 43, diffPinionTeeth: 0 }));
  });

  it('rollout refuses a tire diameter or final drive ratio that is not above zero', () => {
    fc.assert(
      fc.property(notPositive, (bad) => {
        expectRangeErrorNaming('tireDiameterMm', () => computeRolloutMm({ tireDiameterMm: bad, finalDriveRatio: 10 }));
        expectRangeErrorNaming('finalDriveRatio', () => computeRolloutMm({ tireDiameterMm: 83, finalDriveRatio: bad }));
      }),
    );
  });

  it('top speed refuses a bad rollout, a negative rpm, and bad kV or voltage', () => {
    fc.assert(
      fc.property(notPositive, (bad) => {
        expectRangeErrorNaming('rolloutMm', () => computeTopSpeedKmh({ rolloutMm: bad, rpm: 30_000 }));
        expectRangeErrorNaming('motorKv', () => computeNoLoadMotorRpm({ motorKv: bad, batteryVolts: 16.8 }));
        expectRangeErrorNaming('batteryVolts', () => computeElectricTopSpeedKmh({ rolloutMm: 20, motorKv: 2000, batteryVolts: bad }));
      }),
    );
    expectRangeErrorNaming('rpm', () => computeTopSpeedKmh({ rolloutMm: 10, rpm: -1 }));
    expectRangeErrorNaming('rpm', () => computeTopSpeedKmh({ rolloutMm: 10, rpm: Number.NaN }));
  });

  it('top speed refuses inputs whose product overflows instead of returning Infinity', () => {
    expect(() => computeTopSpeedKmh({ rolloutMm: 1e300, rpm: 1e300 })).toThrow(RangeError);
  });

  it('gear geometry refuses a module that is not above zero and teeth that are not whole', () => {
    fc.assert(
      fc.property(notPositive, notTeeth, (badModule, badTeeth) => {
        expectRangeErrorNaming('moduleMm', () => computePitchDiameterMm({ moduleMm: badModule, teeth: 20 }));
        expectRangeErrorNaming('teeth', () => computePitchDiameterMm({ moduleMm: 1, teeth: badTeeth }));
        expectRangeErrorNaming('spurTeeth', () => computeCentreDistanceMm({ moduleMm: 1, spurTeeth: badTeeth, pinionTeeth: 16 }));
      }),
    );
  });

  it('the engine shift refuses a fractional or non-finite tooth change', () => {
    fc.assert(
      fc.property(fc.oneof(nonFinite, fc.double({ min: -10, max: 10, noNaN: true }).filter((x) => !Number.isInteger(x))), (bad) => {
        expectRangeErrorNaming('pinionTeethChange', () =>
          computeCentreDistanceChangeMm({ moduleMm: 0.8, spurTeeth: 60, pinionTeeth: 16, pinionTeethChange: bad }),
        );
      }),
    );
  });

  it('toe, unit conversions and display refuse non-finite numbers', () => {
    fc.assert(
      fc.property(nonFinite, (bad) => {
        expectRangeErrorNaming('hubToeDeg', () => computeTotalRearToeDeg({ frontBlockDeg: -1, rearBlockDeg: 2.75, hubToeDeg: bad }));
        expectRangeErrorNaming('mm', () => mmToInches(bad));
        expectRangeErrorNaming('inches', () => inchesToMm(bad));
        expectRangeErrorNaming('celsius', () => celsiusToFahrenheit(bad));
        expectRangeErrorNaming('fahrenheit', () => fahrenheitToCelsius(bad));
        expectRangeErrorNaming('kmh', () => kmhToMetresPerSecond(bad));
        expectRangeErrorNaming('metresPerSecond', () => metresPerSecondToKmh(bad));
        expectRangeErrorNaming('valueSi', () => formatForDisplay(bad, 'length', { length: 'mm', temperature: 'C' }));
      }),
    );
  });

  it('refuses a tooth count given as text, as a form field might send it', () => {
    expect(() => computeGearRatio({ spurTeeth: '60' as unknown as number, pinionTeeth: 16 })).toThrow(
      new RangeError('spurTeeth must be a finite number, got string "60"'),
    );
  });
});
