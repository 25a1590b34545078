import fc from 'fast-check';
import { mean } from 'simple-statistics';
import { TrackdayInputError, compareRunSummaries, compareRuns } from '../../../shared/compute/trackday';

// Summaries chosen so the arithmetic can be checked by hand: n = 10 and sd = 0.1384 on both sides
// give SE = √(2 × 0.1384² / 10) = 0.06189 and Welch df = 18, where t(0.975, 18) = 2.101
// (NIST/SEMATECH e-Handbook §1.3.6.7.2 table), so the 95 % half-width is 0.130 s.
const runA = { count: 10, mean: 31.5, standardDeviation: 0.1384 };
const halfWidth = 2.101 * Math.sqrt((2 * 0.1384 ** 2) / 10);

describe('A/B verdict wording', () => {
  it('a clear gain: B faster with the whole interval below zero', () => {
    const comparison = compareRunSummaries(runA, { ...runA, mean: 31.29 });
    expect(comparison.verdict).toBe('real-gain');
    expect(comparison.meanDifferenceSeconds).toBeCloseTo(-0.21, 10);
    expect(comparison.confidenceInterval!.lowSeconds).toBeCloseTo(-0.21 - halfWidth, 3);
    expect(comparison.confidenceInterval!.highSeconds).toBeCloseTo(-0.21 + halfWidth, 3);
    expect(comparison.message).toBe('B is faster by 0.21 s a lap, 95 % CI 0.08–0.34 s: likely a real gain.');
  });

  it('a clear loss: B slower with the whole interval above zero', () => {
    const comparison = compareRunSummaries(runA, { ...runA, mean: 31.71 });
    expect(comparison.verdict).toBe('real-loss');
    expect(comparison.message).toBe('B is slower by 0.21 s a lap, 95 % CI 0.08–0.34 s: likely a real loss.');
  });

  it('an unclear difference: the interval spans zero', () => {
    const comparison = compareRunSummaries(runA, { ...runA, mean: 31.45 });
    expect(comparison.verdict).toBe('no-clear-difference');
    expect(comparison.message).toBe(
      'No difference you can tell from these laps: B is 0.05 s a lap faster on average, ' +
        'but the 95 % CI runs from 0.18 s faster to 0.08 s slower.',
    );
  });

  it('identical runs (no spread on either side, same time) say so without dividing by zero', () => {
    const comparison = compareRuns([31.1, 31.1, 31.1], [31.1, 31.1, 31.1, 31.1]);
    expect(comparison).toEqual({
      verdict: 'identical',
      message: 'No difference: every lap in both runs took 31.10 s.',
      meanDifferenceSeconds: 0,
      confidenceLevel: 0.95,
      confidenceInterval: null,
      welch: null,
      pooled: null,
    });
  });

  it('runs with no spread but different times get a "time more laps" message, not an infinite t', () => {
    const comparison = compareRuns([31.1, 31.1, 31.1], [30.9, 30.9, 30.9]);
    expect(comparison.verdict).toBe('no-spread');
    expect(comparison.meanDifferenceSeconds).toBeCloseTo(-0.2, 10);
    expect(comparison.message).toBe(
      'B is faster by 0.20 s a lap, but every lap within each run took the same time, ' +
        'so there is no spread to judge the gap against: time more laps.',
    );
  });

  it('the same laps in both runs give no clear difference and the same mean', () => {
    const laps = [31.2, 31.5, 31.4, 31.8];
    const comparison = compareRuns(laps, laps);
    expect(comparison.verdict).toBe('no-clear-difference');
    expect(comparison.meanDifferenceSeconds).toBe(0);
    expect(comparison.message).toMatch(
      /^No difference you can tell from these laps: A and B average the same lap time/,
    );
  });

  it('a run with fewer than 2 laps gets a clear message naming the run', () => {
    expect(compareRuns([31.2], [31.0, 31.1]).message).toBe(
      'Run A has only 1 lap: each run needs at least 2 laps to compare.',
    );
    const noLaps = compareRuns([], [31.0]);
    expect(noLaps.verdict).toBe('too-few-laps');
    expect(noLaps.meanDifferenceSeconds).toBeNull();
    expect(noLaps.message).toBe(
      'Run A has no laps and run B has only 1 lap: each run needs at least 2 laps to compare.',
    );
    expect(compareRuns([31.2], [31.0]).meanDifferenceSeconds).toBeCloseTo(-0.2, 10);
  });

  it('a small real gain prints three decimals rather than 0.00', () => {
    const comparison = compareRunSummaries(
      { count: 200, mean: 31.5, standardDeviation: 0.05 },
      { count: 200, mean: 31.48, standardDeviation: 0.05 },
    );
    expect(comparison.verdict).toBe('real-gain');
    expect(comparison.message).toMatch(/^B is faster by 0\.020 s a lap, 95 % CI 0\.010–0\.030 s/);
  });

  it('a 90 % level narrows the interval and says 90 % in the message', () => {
    const at90 = compareRunSummaries(runA, { ...runA, mean: 31.45 }, { confidenceLevel: 0.9 });
    const at95 = compareRunSummaries(runA, { ...runA, mean: 31.45 });
    const width = (comparison: typeof at90): number =>
      comparison.confidenceInterval!.highSeconds - comparison.confidenceInterval!.lowSeconds;
    expect(width(at90)).toBeLessThan(width(at95));
    expect(at90.message).toContain('90 % CI');
  });
});

describe('A/B statistics', () => {
  const laps = fc.array(fc.double({ min: 28, max: 40, noNaN: true }), { minLength: 2, maxLength: 40 });

  it('the interval is centred on B − A and the verdict follows from where it lies', () => {
    fc.assert(fc.property(laps, laps, (lapsA, lapsB) => {
      const comparison = compareRuns(lapsA, lapsB);
      fc.pre(comparison.confidenceInterval !== null);
      const { lowSeconds, highSeconds } = comparison.confidenceInterval!;
      expect(comparison.meanDifferenceSeconds!).toBeCloseTo(mean(lapsB) - mean(lapsA), 9);
      expect((lowSeconds + highSeconds) / 2).toBeCloseTo(comparison.meanDifferenceSeconds!, 9);
      const expected = highSeconds < 0 ? 'real-gain' : lowSeconds > 0 ? 'real-loss' : 'no-clear-difference';
      expect(comparison.verdict).toBe(expected);
      const { t, standardError } = comparison.welch!;
      expect(t).toBeCloseTo(comparison.meanDifferenceSeconds! / standardError, 9);
    }));
  });

  it('exposes the pooled t and df beside Welch for the same direction (B − A)', () => {
    const comparison = compareRuns([31.2, 31.4, 31.3, 31.6], [30.9, 31.0, 31.2]);
    expect(comparison.pooled!.degreesOfFreedom).toBe(5);
    expect(Math.sign(comparison.pooled!.t)).toBe(Math.sign(comparison.welch!.t));
    expect(comparison.pooled!.meanDifference).toBeCloseTo(comparison.meanDifferenceSeconds!, 12);
  });

  it('a run with no spread against one with spread uses the other run’s n − 1 degrees of freedom', () => {
    const comparison = compareRuns([31, 31, 31], [30.5, 30.7, 30.6]);
    expect(comparison.welch!.degreesOfFreedom).toBeCloseTo(2, 10);
  });

  it('refuses lap lists with invalid times and a confidence level out of range', () => {
    expect(() => compareRuns([31, Number.NaN], [31, 32])).toThrow(
      'run A lap times: lap at index 1 must be a positive number of seconds, got NaN',
    );
    expect(() => compareRuns([31, 32], [31, 32], { confidenceLevel: 95 })).toThrow(
      'confidence level must be between 0.5 and 0.999, got 95',
    );
    const fractionalCount = { count: 2.5, mean: 31, standardDeviation: 1 };
    expect(() => compareRunSummaries(fractionalCount, runA)).toThrow(TrackdayInputError);
  });
});
