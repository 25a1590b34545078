import fc from 'fast-check';
import { tTestTwoSample } from 'simple-statistics';
import {
  TrackdayInputError,
  pooledTTest,
  studentTQuantile,
  summarizeSample,
  welchTTest,
} from '../../../shared/compute/trackday';

// NIST/SEMATECH e-Handbook of Statistical Methods, §1.3.5.3 "Two-Sample t-Test for Equal Means",
// AUTO83B data set given as summary statistics.
const nistSample1 = { count: 249, mean: 20.14458, standardDeviation: 6.4147 };
const nistSample2 = { count: 79, mean: 30.48101, standardDeviation: 6.10771 };

describe('two-sample t-tests from summary statistics (NIST/SEMATECH e-Handbook §1.3.5.3, AUTO83B)', () => {
  it('Welch t = −12.94627 with 136.87499 degrees of freedom', () => {
    const welch = welchTTest(nistSample1, nistSample2);
    expect(welch.t).toBeCloseTo(-12.94627, 4);
    expect(welch.degreesOfFreedom).toBeCloseTo(136.87499, 3);
    expect(welch.meanDifference).toBeCloseTo(20.14458 - 30.48101, 10);
  });

  it('pooled (Student) t = −12.62059 with 326 degrees of freedom', () => {
    const pooled = pooledTTest(nistSample1, nistSample2);
    expect(pooled.t).toBeCloseTo(-12.62059, 4);
    expect(pooled.degreesOfFreedom).toBe(326);
  });

  it('swapping the samples flips the sign of t and keeps the degrees of freedom', () => {
    const forward = welchTTest(nistSample1, nistSample2);
    const backward = welchTTest(nistSample2, nistSample1);
    expect(backward.t).toBeCloseTo(-forward.t, 12);
    expect(backward.degreesOfFreedom).toBeCloseTo(forward.degreesOfFreedom, 9);
  });
});

describe('t-tests from raw laps', () => {
  const laps = fc.array(fc.double({ min: 20, max: 60, noNaN: true }), { minLength: 2, maxLength: 80 });

  it('pooled t matches simple-statistics tTestTwoSample (independent implementation)', () => {
    fc.assert(fc.property(laps, laps, (first, second) => {
      const a = summarizeSample(first);
      const b = summarizeSample(second);
      fc.pre(a.standardDeviation > 0 || b.standardDeviation > 0);
      const reference = tTestTwoSample(first, second, 0);
      fc.pre(reference !== null && Number.isFinite(reference) && Math.abs(reference) < 1e6);
      expect(pooledTTest(a, b).t).toBeCloseTo(reference as number, 6);
    }));
  });

  it('Welch degrees of freedom lie between the smaller n − 1 and n1 + n2 − 2', () => {
    fc.assert(fc.property(laps, laps, (first, second) => {
      const a = summarizeSample(first);
      const b = summarizeSample(second);
      fc.pre(a.standardDeviation > 0 || b.standardDeviation > 0);
      const { degreesOfFreedom } = welchTTest(a, b);
      expect(degreesOfFreedom).toBeGreaterThanOrEqual(Math.min(a.count, b.count) - 1 - 1e-9);
      expect(degreesOfFreedom).toBeLessThanOrEqual(a.count + b.count - 2 + 1e-9);
    }));
  });

  it('refuses samples with no spread on both sides instead of dividing by zero', () => {
    const flat = summarizeSample([31, 31, 31]);
    expect(() => welchTTest(flat, flat)).toThrow('both samples have a standard deviation of 0');
    expect(() => pooledTTest(flat, flat)).toThrow(TrackdayInputError);
  });

  it('refuses a summary with fewer than 2 values or a negative spread', () => {
    expect(() => summarizeSample([31])).toThrow('a sample summary needs at least 2 values, got 1');
    expect(() => welchTTest({ count: 1, mean: 31, standardDeviation: 0 }, nistSample2)).toThrow(
      'first sample needs a count of at least 2, got 1',
    );
    expect(() => welchTTest(nistSample1, { count: 5, mean: 31, standardDeviation: -1 })).toThrow(
      'second sample standard deviation cannot be negative, got -1',
    );
    expect(() => pooledTTest(nistSample1, { count: 5, mean: Number.NaN, standardDeviation: 1 })).toThrow(
      'second sample mean must be a finite number, got NaN',
    );
  });
});

// NIST/SEMATECH e-Handbook of Statistical Methods, §1.3.6.7.2 "Critical Values of the Student's t
// Distribution", upper-tail probability 0.025 column.
describe('Student t quantile (jstat) against the NIST/SEMATECH e-Handbook t table', () => {
  it.each([
    [1, 12.706],
    [2, 4.303],
    [5, 2.571],
    [10, 2.228],
    [18, 2.101],
    [30, 2.042],
    [100, 1.984],
  ])('t(0.975, %s) = %s to the table’s three decimals', (degreesOfFreedom, tableValue) => {
    expect(studentTQuantile(0.975, degreesOfFreedom)).toBeCloseTo(tableValue, 3);
  });

  it('t(0.975, ∞) = 1.960, the normal quantile, also for huge finite degrees of freedom', () => {
    expect(studentTQuantile(0.975, Infinity)).toBeCloseTo(1.96, 3);
    expect(studentTQuantile(0.975, 1e9)).toBeCloseTo(1.959964, 6);
  });

  it('is symmetric and falls toward the normal quantile as degrees of freedom grow', () => {
    fc.assert(fc.property(
      fc.double({ min: 0.5, max: 0.999, noNaN: true }),
      fc.double({ min: 1, max: 1e5, noNaN: true }),
      (probability, degreesOfFreedom) => {
        expect(studentTQuantile(1 - probability, degreesOfFreedom)).toBeCloseTo(
          -studentTQuantile(probability, degreesOfFreedom), 6);
        expect(studentTQuantile(probability, degreesOfFreedom * 2)).toBeLessThanOrEqual(
          studentTQuantile(probability, degreesOfFreedom) + 1e-9);
      },
    ));
  });

  it.each([
    [0, 10, 'probability must be strictly between 0 and 1, got 0'],
    [1.2, 10, 'probability must be strictly between 0 and 1, got 1.2'],
    [Number.NaN, 10, 'probability must be a finite number, got NaN'],
    [0.975, 0, 'degrees of freedom must be more than 0, got 0'],
    [0.975, Number.NaN, 'degrees of freedom must be more than 0, got NaN'],
  ])('refuses probability %p with %p degrees of freedom', (probability, degreesOfFreedom, message) => {
    expect(() => studentTQuantile(probability, degreesOfFreedom)).toThrow(message);
  });
});
