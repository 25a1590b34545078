import fc from 'fast-check';
import { mean, median, sampleStandardDeviation } from 'simple-statistics';
import {
  TrackdayInputError,
  bestConsecutiveLaps,
  consistencyPercent,
  meanOf,
  medianOf,
  sampleStandardDeviationOf,
  summarizeLaps,
} from '../../../shared/compute/trackday';

const lapTimes = fc.array(fc.double({ min: 8, max: 300, noNaN: true, noDefaultInfinity: true }), {
  minLength: 2,
  maxLength: 200,
});

describe('lap statistics against simple-statistics (independent implementation)', () => {
  it('mean matches simple-statistics mean for any run of laps', () => {
    fc.assert(fc.property(lapTimes, (laps) => {
      expect(meanOf(laps)).toBeCloseTo(mean(laps), 9);
    }));
  });

  it('sample standard deviation matches simple-statistics sampleStandardDeviation', () => {
    fc.assert(fc.property(lapTimes, (laps) => {
      expect(sampleStandardDeviationOf(laps)).toBeCloseTo(sampleStandardDeviation(laps), 9);
    }));
  });

  it('median matches simple-statistics median for odd and even lap counts', () => {
    fc.assert(fc.property(lapTimes, (laps) => {
      expect(medianOf(laps)).toBeCloseTo(median(laps), 12);
    }));
  });

  it('summarizeLaps reports the same mean, median and sd as the building blocks', () => {
    fc.assert(fc.property(lapTimes, (laps) => {
      const stats = summarizeLaps(laps);
      expect(stats.lapCount).toBe(laps.length);
      expect(stats.bestLapSeconds).toBe(Math.min(...laps));
      expect(laps[stats.bestLapIndex]).toBe(stats.bestLapSeconds);
      expect(stats.meanSeconds).toBeCloseTo(mean(laps), 9);
      expect(stats.medianSeconds).toBeCloseTo(median(laps), 12);
      expect(stats.standardDeviationSeconds).toBeCloseTo(sampleStandardDeviation(laps), 9);
    }));
  });
});

describe('summarizeLaps on a worked run', () => {
  const run = [32.1, 31.6, 31.4, 31.5, 31.9, 32.0];

  it('reports best lap, mean, median, sd and consistency by hand-computed values', () => {
    const stats = summarizeLaps(run);
    expect(stats.bestLapSeconds).toBe(31.4);
    expect(stats.bestLapIndex).toBe(2);
    expect(stats.meanSeconds).toBeCloseTo(31.75, 12);
    expect(stats.medianSeconds).toBeCloseTo(31.75, 12);
    // Deviations from 31.75 square and sum to 0.415; 0.415 / (6 − 1) = 0.083.
    expect(stats.standardDeviationSeconds).toBeCloseTo(Math.sqrt(0.083), 12);
    expect(stats.consistencyPercent).toBeCloseTo(100 * (1 - Math.sqrt(0.083) / 31.75), 10);
  });

  it('finds the best three consecutive laps and where they start', () => {
    const best = summarizeLaps(run).bestThreeConsecutive;
    expect(best?.startIndex).toBe(1);
    expect(best?.totalSeconds).toBeCloseTo(94.5, 10);
    expect(best?.lapCount).toBe(3);
  });

  it('a run of identical laps has a spread of exactly 0 and 100 % consistency', () => {
    const stats = summarizeLaps([31.1, 31.1, 31.1, 31.1]);
    expect(stats.standardDeviationSeconds).toBe(0);
    expect(stats.consistencyPercent).toBe(100);
    expect(stats.meanSeconds).toBe(31.1);
  });

  it('a single lap gives null spread, consistency and best three rather than NaN', () => {
    const stats = summarizeLaps([30.5]);
    expect(stats).toEqual({
      lapCount: 1,
      bestLapSeconds: 30.5,
      bestLapIndex: 0,
      meanSeconds: 30.5,
      medianSeconds: 30.5,
      standardDeviationSeconds: null,
      consistencyPercent: null,
      bestThreeConsecutive: null,
    });
  });

  it('excluded laps leave the statistics and break consecutive windows', () => {
    const withCrash = [31.0, 31.2, 45.0, 30.9, 31.1, 31.3];
    const stats = summarizeLaps(withCrash, { excludeIndices: [2] });
    expect(stats.lapCount).toBe(5);
    expect(stats.meanSeconds).toBeCloseTo(31.1, 12);
    // The windows 0–2 … 2–4 contain the excluded lap; 3–5 is the only clean one.
    expect(stats.bestThreeConsecutive).toEqual({
      totalSeconds: 30.9 + 31.1 + 31.3,
      startIndex: 3,
      lapCount: 3,
    });
  });
});

describe('consistency and best consecutive laps', () => {
  it('consistency is 100 × (1 − sd / mean)', () => {
    expect(consistencyPercent(30, 0.3)).toBeCloseTo(99, 12);
    expect(consistencyPercent(40, 2)).toBeCloseTo(95, 12);
  });

  it('best consecutive window ties go to the earliest window', () => {
    expect(bestConsecutiveLaps([30, 30, 30, 30], 2)).toEqual({ totalSeconds: 60, startIndex: 0, lapCount: 2 });
  });

  it('best three consecutive is never slower than any three-lap window', () => {
    fc.assert(fc.property(lapTimes.filter((laps) => laps.length >= 3), (laps) => {
      const best = bestConsecutiveLaps(laps)!;
      for (let start = 0; start + 3 <= laps.length; start += 1) {
        expect(best.totalSeconds).toBeLessThanOrEqual(laps[start] + laps[start + 1] + laps[start + 2]);
      }
    }));
  });
});

describe('summarizeLaps refuses bad input with a clear error', () => {
  it.each([
    [[], /at least one lap/],
    [[31, Number.NaN], /index 1 must be a positive number of seconds, got NaN/],
    [[31, -2], /index 1 must be a positive number of seconds, got -2/],
    [[31, Infinity], /got Infinity/],
    ['31,32', /must be a list of seconds/],
  ])('%p is refused', (laps, message) => {
    expect(() => summarizeLaps(laps as number[])).toThrow(TrackdayInputError);
    expect(() => summarizeLaps(laps as number[])).toThrow(message);
  });

  it('excluding every lap is refused', () => {
    expect(() => summarizeLaps([31, 32], { excludeIndices: [0, 1] })).toThrow('at least one lap must remain');
  });

  it('an exclusion index outside the run is refused', () => {
    expect(() => summarizeLaps([31, 32], { excludeIndices: [2] })).toThrow(
      'laps to exclude: 2 is not a lap index between 0 and 1',
    );
  });
});
