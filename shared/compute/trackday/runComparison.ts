import {
  TrackdayInputError,
  requireFiniteNumber,
  requireLapTimes,
  requireNumberInRange,
} from './inputChecks';
import { meanOf } from './lapStatistics';
import {
  IntervalVerdict,
  identicalRunsMessage,
  intervalVerdictMessage,
  noSpreadMessage,
  tooFewLapsMessage,
} from './runVerdictWording';
import { studentTQuantile } from './studentT';
import {
  SampleSummary,
  TwoSampleTTest,
  checkSummary,
  pooledTTest,
  summarizeSample,
  welchTTest,
} from './twoSampleTests';

/**
 * What the laps say about B against A:
 * - `real-gain` / `real-loss`: the whole confidence interval lies on one side of zero;
 * - `no-clear-difference`: the interval spans zero;
 * - `identical`: no spread in either run and the same mean;
 * - `no-spread`: no spread in either run but different means, so nothing to judge the gap against;
 * - `too-few-laps`: a run has fewer than 2 laps.
 */
export type RunVerdict =
  | 'real-gain'
  | 'real-loss'
  | 'no-clear-difference'
  | 'identical'
  | 'no-spread'
  | 'too-few-laps';

/** A/B comparison of two runs' mean lap times. Differences are B − A: negative means B is faster. */
export interface RunComparison {
  verdict: RunVerdict;
  /** One sentence for the racer. */
  message: string;
  /** Mean lap time of B minus A, seconds; null when a run has no laps. */
  meanDifferenceSeconds: number | null;
  confidenceLevel: number;
  /** Welch interval for B − A; null when there is no spread or too few laps. */
  confidenceInterval: { lowSeconds: number; highSeconds: number } | null;
  /** Welch's test for B − A; null when there is no spread or too few laps. */
  welch: TwoSampleTTest | null;
  /** Student's pooled test for B − A, for completeness; null like `welch`. */
  pooled: TwoSampleTTest | null;
}

/** Options for {@link compareRuns} and {@link compareRunSummaries}. */
export interface CompareRunsOptions {
  /** Default 0.95. */
  confidenceLevel?: number;
}

/** Below this gap between means, in seconds, two runs without spread count as identical. */
const SAME_MEAN_TOLERANCE_SECONDS = 1e-9;

/** Compares two runs from their lap times in seconds (A is the baseline, B the change). */
export function compareRuns(
  lapTimesA: readonly number[],
  lapTimesB: readonly number[],
  options: CompareRunsOptions = {},
): RunComparison {
  requireLapTimes(lapTimesA, 'run A lap times', true);
  requireLapTimes(lapTimesB, 'run B lap times', true);
  return compareRunSummaries(partialSummary(lapTimesA), partialSummary(lapTimesB), options);
}

/**
 * Compares two runs from summary statistics: Welch's t-test on B − A, a confidence interval with
 * the Welch–Satterthwaite degrees of freedom, and a verdict in plain words. A run with fewer than
 * 2 laps, or two runs without any spread, get a verdict and message rather than an error.
 */
export function compareRunSummaries(
  a: SampleSummary,
  b: SampleSummary,
  options: CompareRunsOptions = {},
): RunComparison {
  const confidenceLevel = requireNumberInRange(
    options.confidenceLevel ?? 0.95, 'confidence level', 0.5, 0.999);
  const tooFew = tooFewLapsComparison(a, b, confidenceLevel);
  if (tooFew) return tooFew;
  checkSummary(a, 'run A');
  checkSummary(b, 'run B');
  const meanDifferenceSeconds = b.mean - a.mean;
  if (a.standardDeviation === 0 && b.standardDeviation === 0) {
    return noSpreadComparison(a.mean, meanDifferenceSeconds, confidenceLevel);
  }
  const welch = welchTTest(b, a);
  const tQuantile = studentTQuantile(1 - (1 - confidenceLevel) / 2, welch.degreesOfFreedom);
  const halfWidth = tQuantile * welch.standardError;
  const confidenceInterval = {
    lowSeconds: meanDifferenceSeconds - halfWidth,
    highSeconds: meanDifferenceSeconds + halfWidth,
  };
  const verdict: IntervalVerdict =
    confidenceInterval.highSeconds < 0
      ? 'real-gain'
      : confidenceInterval.lowSeconds > 0
        ? 'real-loss'
        : 'no-clear-difference';
  return {
    verdict,
    message: intervalVerdictMessage(verdict, meanDifferenceSeconds, confidenceInterval, confidenceLevel),
    meanDifferenceSeconds,
    confidenceLevel,
    confidenceInterval,
    welch,
    pooled: pooledTTest(b, a),
  };
}

/** Both runs without spread: the t statistic would divide by zero, so no interval is attempted. */
function noSpreadComparison(meanA: number, difference: number, confidenceLevel: number): RunComparison {
  const common = { confidenceInterval: null, welch: null, pooled: null, confidenceLevel };
  if (Math.abs(difference) <= SAME_MEAN_TOLERANCE_SECONDS) {
    return {
      ...common,
      verdict: 'identical',
      meanDifferenceSeconds: 0,
      message: identicalRunsMessage(meanA),
    };
  }
  return {
    ...common,
    verdict: 'no-spread',
    meanDifferenceSeconds: difference,
    message: noSpreadMessage(difference),
  };
}

function tooFewLapsComparison(
  a: SampleSummary,
  b: SampleSummary,
  confidenceLevel: number,
): RunComparison | null {
  const countA = requireLapCount(a, 'run A');
  const countB = requireLapCount(b, 'run B');
  const message = tooFewLapsMessage(countA, countB);
  if (message === null) return null;
  return {
    verdict: 'too-few-laps',
    message,
    meanDifferenceSeconds:
      countA > 0 && countB > 0
        ? requireFiniteNumber(b.mean, 'run B mean') - requireFiniteNumber(a.mean, 'run A mean')
        : null,
    confidenceLevel,
    confidenceInterval: null,
    welch: null,
    pooled: null,
  };
}

function requireLapCount(summary: SampleSummary, what: string): number {
  const count: unknown = typeof summary === 'object' && summary !== null ? summary.count : undefined;
  if (typeof count !== 'number' || !Number.isInteger(count) || count < 0) {
    throw new TrackdayInputError(`${what} needs a whole, non-negative lap count`);
  }
  return count;
}

/** A summary that tolerates 0 or 1 laps, which the comparison turns into a "too few laps" verdict. */
function partialSummary(lapTimes: readonly number[]): SampleSummary {
  if (lapTimes.length >= 2) return summarizeSample(lapTimes);
  return { count: lapTimes.length, mean: lapTimes.length === 1 ? meanOf(lapTimes) : 0, standardDeviation: 0 };
}
