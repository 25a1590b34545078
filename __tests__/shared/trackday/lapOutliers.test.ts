import fc from 'fast-check';
import { TrackdayInputError, analyzeRun, findSlowLaps } from '../../../shared/compute/trackday';

// Invented club run: laps between 31 and 32 s with one crash lap (45 s) at index 6.
const runWithCrash = [31.42, 31.18, 31.77, 31.05, 31.63, 31.29, 45.0, 31.51, 31.88, 31.34];

// The 3.5 cut-off is the modified z-score threshold of the NIST/SEMATECH e-Handbook §1.3.5.17;
// the 1.5 s minimum margin is our judgement (common practice, no source).
describe('slow-lap rule: median + max(3.5 × scaled MAD, 1.5 s)', () => {
  it('flags an obvious crash lap of 45 s among 31–32 s laps and no normal lap', () => {
    const finding = findSlowLaps(runWithCrash);
    expect(finding.flaggedIndices).toEqual([6]);
    expect(finding.madMultiplier).toBe(3.5);
    expect(finding.minimumMarginSeconds).toBe(1.5);
  });

  it('computes the threshold from the median and the scaled MAD', () => {
    const finding = findSlowLaps(runWithCrash);
    // Sorted laps: median = (31.42 + 31.51) / 2 = 31.465; the ten absolute deviations'
    // middle pair is 0.175 and 0.285, so MAD = 0.23.
    expect(finding.medianSeconds).toBeCloseTo(31.465, 10);
    expect(finding.typicalSpreadSeconds).toBeCloseTo(1.4826 * 0.23, 10);
    // 3.5 × 0.341 = 1.193 s is below the 1.5 s minimum margin, so the margin decides.
    expect(finding.thresholdSeconds).toBeCloseTo(32.965, 10);
  });

  it('describes the rule in plain words with this run’s numbers', () => {
    expect(findSlowLaps(runWithCrash).ruleDescription).toBe(
      'A lap is set aside as a crash or pit stop when it is slower than the median lap (31.47 s) by ' +
        'more than 3.5 × the typical lap-to-lap spread (0.34 s) or by more than 1.50 s, whichever is ' +
        'larger. In this run: any lap slower than 32.97 s.',
    );
  });

  it('a very consistent run does not flag a normal bobble because of the minimum margin', () => {
    const consistent = [31.0, 31.01, 31.0, 31.02, 31.01, 31.0, 31.6, 31.01];
    expect(findSlowLaps(consistent).flaggedIndices).toEqual([]);
    // Without the margin the tiny spread would make the 31.6 s lap a "crash".
    expect(findSlowLaps(consistent, { minimumMarginSeconds: 0 }).flaggedIndices).toEqual([6]);
  });

  it('never flags a fast lap, however far from the median', () => {
    expect(findSlowLaps([31.4, 31.5, 25.0, 31.6, 31.5]).flaggedIndices).toEqual([]);
  });

  it('with one or two laps nothing can be flagged', () => {
    fc.assert(fc.property(
      fc.array(fc.double({ min: 5, max: 600, noNaN: true }), { minLength: 1, maxLength: 2 }),
      (laps) => {
        expect(findSlowLaps(laps).flaggedIndices).toEqual([]);
      },
    ));
  });

  it('never sets aside half the run or more', () => {
    fc.assert(fc.property(
      fc.array(fc.double({ min: 5, max: 600, noNaN: true }), { minLength: 1, maxLength: 60 }),
      (laps) => {
        expect(findSlowLaps(laps).flaggedIndices.length).toBeLessThan(laps.length / 2);
      },
    ));
  });
});

describe('analyzeRun', () => {
  it('gives statistics with and without the set-aside laps', () => {
    const analysis = analyzeRun(runWithCrash);
    expect(analysis.setAsideIndices).toEqual([6]);
    expect(analysis.includedBackIndices).toEqual([]);
    expect(analysis.allLaps.lapCount).toBe(10);
    expect(analysis.keptLaps.lapCount).toBe(9);
    const cleanLaps = runWithCrash.filter((_, index) => index !== 6);
    expect(analysis.keptLaps.meanSeconds).toBeCloseTo(cleanLaps.reduce((a, b) => a + b) / 9, 10);
    expect(analysis.allLaps.meanSeconds).toBeCloseTo(runWithCrash.reduce((a, b) => a + b) / 10, 10);
    expect(analysis.keptLaps.standardDeviationSeconds!).toBeLessThan(
      analysis.allLaps.standardDeviationSeconds!,
    );
  });

  it('puts back a lap the caller includes and reports it as included back', () => {
    const analysis = analyzeRun(runWithCrash, { includeIndices: [6] });
    expect(analysis.setAsideIndices).toEqual([]);
    expect(analysis.includedBackIndices).toEqual([6]);
    expect(analysis.keptLaps).toEqual(analysis.allLaps);
  });

  it('honours a custom multiplier and margin', () => {
    const analysis = analyzeRun(runWithCrash, { madMultiplier: 1, minimumMarginSeconds: 0.3 });
    // Threshold 31.465 + max(0.341, 0.3) = 31.806: the 31.88 s lap (index 8) and the crash go.
    expect(analysis.setAsideIndices).toEqual([6, 8]);
  });

  it('refuses an include-back index that is not a lap', () => {
    expect(() => analyzeRun(runWithCrash, { includeIndices: [10] })).toThrow(
      'laps to include: 10 is not a lap index between 0 and 9',
    );
    expect(() => analyzeRun(runWithCrash, { includeIndices: [1.5] })).toThrow(TrackdayInputError);
  });

  it('refuses a negative or non-finite multiplier', () => {
    expect(() => analyzeRun(runWithCrash, { madMultiplier: -1 })).toThrow(
      'the MAD multiplier must be between 0 and 100, got -1',
    );
    expect(() => analyzeRun(runWithCrash, { minimumMarginSeconds: Number.NaN })).toThrow(
      'the minimum margin must be a finite number, got NaN',
    );
  });
});
