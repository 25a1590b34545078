import { TrackdayInputError, requireFiniteNumber } from './inputChecks';
import { meanOf, sampleStandardDeviationOf } from './lapStatistics';

/** Count, mean and sample standard deviation: all a two-sample t-test needs. */
export interface SampleSummary {
  count: number;
  mean: number;
  /** Sample (n − 1) standard deviation. */
  standardDeviation: number;
}

/** A two-sample t statistic for first − second. */
export interface TwoSampleTTest {
  /** Mean of the first sample minus mean of the second. */
  meanDifference: number;
  standardError: number;
  t: number;
  degreesOfFreedom: number;
}

/** Count, mean and sample standard deviation of at least two values. */
export function summarizeSample(values: readonly number[]): SampleSummary {
  if (values.length < 2) {
    throw new TrackdayInputError(`a sample summary needs at least 2 values, got ${values.length}`);
  }
  return { count: values.length, mean: meanOf(values), standardDeviation: sampleStandardDeviationOf(values) };
}

/**
 * Welch's unequal-variances t-test from summary statistics, with Welch–Satterthwaite degrees of
 * freedom. Preferred for laps: two setups rarely give the same lap-to-lap spread.
 */
export function welchTTest(first: SampleSummary, second: SampleSummary): TwoSampleTTest {
  checkSummary(first, 'first sample');
  checkSummary(second, 'second sample');
  const firstShare = first.standardDeviation ** 2 / first.count;
  const secondShare = second.standardDeviation ** 2 / second.count;
  const variance = firstShare + secondShare;
  if (variance === 0) {
    throw new TrackdayInputError('both samples have a standard deviation of 0: the t statistic is undefined');
  }
  const meanDifference = first.mean - second.mean;
  const standardError = Math.sqrt(variance);
  const degreesOfFreedom =
    variance ** 2 / (firstShare ** 2 / (first.count - 1) + secondShare ** 2 / (second.count - 1));
  return { meanDifference, standardError, t: meanDifference / standardError, degreesOfFreedom };
}

/**
 * Student's pooled-variance t-test from summary statistics (assumes equal spreads), with
 * n1 + n2 − 2 degrees of freedom. Exposed for completeness beside {@link welchTTest}.
 */
export function pooledTTest(first: SampleSummary, second: SampleSummary): TwoSampleTTest {
  checkSummary(first, 'first sample');
  checkSummary(second, 'second sample');
  const degreesOfFreedom = first.count + second.count - 2;
  const pooledVariance =
    ((first.count - 1) * first.standardDeviation ** 2 + (second.count - 1) * second.standardDeviation ** 2) /
    degreesOfFreedom;
  if (pooledVariance === 0) {
    throw new TrackdayInputError('both samples have a standard deviation of 0: the t statistic is undefined');
  }
  const meanDifference = first.mean - second.mean;
  const standardError = Math.sqrt(pooledVariance * (1 / first.count + 1 / second.count));
  return { meanDifference, standardError, t: meanDifference / standardError, degreesOfFreedom };
}

/** Throws a TrackdayInputError unless `summary` has a count of at least 2 and finite statistics. */
export function checkSummary(summary: SampleSummary, what: string): void {
  if (typeof summary !== 'object' || summary === null) {
    throw new TrackdayInputError(`${what} must be a summary with count, mean and standardDeviation`);
  }
  if (!Number.isInteger(summary.count) || summary.count < 2) {
    throw new TrackdayInputError(`${what} needs a count of at least 2, got ${String(summary.count)}`);
  }
  requireFiniteNumber(summary.mean, `${what} mean`);
  requireFiniteNumber(summary.standardDeviation, `${what} standard deviation`);
  if (summary.standardDeviation < 0) {
    throw new TrackdayInputError(
      `${what} standard deviation cannot be negative, got ${summary.standardDeviation}`,
    );
  }
}
