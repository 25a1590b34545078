import { TrackdayInputError, requireLapIndices, requireLapTimes } from './inputChecks';

/** The fastest run of consecutive laps: racers' "best three in a row". */
export interface BestConsecutiveLaps {
  /** Sum of the laps in the window, in seconds. */
  totalSeconds: number;
  /** 0-based index, in the list given, of the first lap in the window. */
  startIndex: number;
  lapCount: number;
}

/** Summary of one run of laps. Every index refers to the list of lap times as given. */
export interface LapStatistics {
  lapCount: number;
  bestLapSeconds: number;
  bestLapIndex: number;
  meanSeconds: number;
  medianSeconds: number;
  /** Sample (n − 1) standard deviation; null with a single lap, where it is undefined. */
  standardDeviationSeconds: number | null;
  /** See {@link consistencyPercent}; null with a single lap. */
  consistencyPercent: number | null;
  /** Null with fewer than three usable consecutive laps. */
  bestThreeConsecutive: BestConsecutiveLaps | null;
}

/**
 * Arithmetic mean. Summing differences from the first value keeps a run of identical laps exactly
 * equal to that lap, so a spread of zero really comes out as zero later.
 */
export function meanOf(values: readonly number[]): number {
  if (values.length === 0) throw new TrackdayInputError('the mean needs at least one value');
  const shift = values[0];
  let sumOfDifferences = 0;
  for (const value of values) sumOfDifferences += value - shift;
  return shift + sumOfDifferences / values.length;
}

/** Middle value; the average of the two middle values for an even count. */
export function medianOf(values: readonly number[]): number {
  if (values.length === 0) throw new TrackdayInputError('the median needs at least one value');
  const sorted = [...values].sort((a, b) => a - b);
  const middle = Math.floor(sorted.length / 2);
  return sorted.length % 2 === 1 ? sorted[middle] : (sorted[middle - 1] + sorted[middle]) / 2;
}

/** Sample standard deviation (divisor n − 1), computed in two passes for accuracy. */
export function sampleStandardDeviationOf(values: readonly number[]): number {
  if (values.length < 2) {
    throw new TrackdayInputError('the standard deviation needs at least two values');
  }
  const mean = meanOf(values);
  let sumOfSquares = 0;
  for (const value of values) sumOfSquares += (value - mean) ** 2;
  return Math.sqrt(sumOfSquares / (values.length - 1));
}

/**
 * Consistency in percent, defined as 100 × (1 − sd / mean): 100 % means every lap took the same
 * time, and each percent lost is one percent of the mean lap time in lap-to-lap spread. It is
 * 100 minus the coefficient of variation in percent, so runs on long and short tracks compare.
 * Not clamped: it only goes below zero for laps so scattered that the number means little.
 */
export function consistencyPercent(meanSeconds: number, standardDeviationSeconds: number): number {
  return 100 * (1 - standardDeviationSeconds / meanSeconds);
}

/**
 * The fastest window of `windowSize` consecutive laps. Laps in `excludedIndices` break a window:
 * a crash lap set aside does not make its neighbours consecutive. Ties go to the earliest window.
 */
export function bestConsecutiveLaps(
  lapTimes: readonly number[],
  windowSize = 3,
  excludedIndices: ReadonlySet<number> = new Set(),
): BestConsecutiveLaps | null {
  let best: BestConsecutiveLaps | null = null;
  for (let start = 0; start + windowSize <= lapTimes.length; start += 1) {
    let total = 0;
    let usable = true;
    for (let index = start; index < start + windowSize && usable; index += 1) {
      usable = !excludedIndices.has(index);
      total += lapTimes[index];
    }
    if (usable && (best === null || total < best.totalSeconds)) {
      best = { totalSeconds: total, startIndex: start, lapCount: windowSize };
    }
  }
  return best;
}

/** Options for {@link summarizeLaps}. */
export interface SummarizeLapsOptions {
  /** 0-based indices of laps to leave out (crashes, pit stops); at least one lap must remain. */
  excludeIndices?: readonly number[];
}

/**
 * Statistics of a run from its lap times in seconds, optionally leaving some laps out. Indices in
 * the result (best lap, best three) still point into `lapTimes` as given.
 */
export function summarizeLaps(
  lapTimes: readonly number[],
  options: SummarizeLapsOptions = {},
): LapStatistics {
  requireLapTimes(lapTimes);
  const excluded = new Set(
    requireLapIndices(options.excludeIndices ?? [], lapTimes.length, 'laps to exclude'),
  );
  const keptIndices = lapTimes.map((_, index) => index).filter((index) => !excluded.has(index));
  if (keptIndices.length === 0) {
    throw new TrackdayInputError('every lap was excluded: at least one lap must remain');
  }
  const kept = keptIndices.map((index) => lapTimes[index]);
  const bestLapIndex = keptIndices.reduce((best, index) => (lapTimes[index] < lapTimes[best] ? index : best));
  const meanSeconds = meanOf(kept);
  const standardDeviationSeconds = kept.length >= 2 ? sampleStandardDeviationOf(kept) : null;
  return {
    lapCount: kept.length,
    bestLapSeconds: lapTimes[bestLapIndex],
    bestLapIndex,
    meanSeconds,
    medianSeconds: medianOf(kept),
    standardDeviationSeconds,
    consistencyPercent:
      standardDeviationSeconds === null ? null : consistencyPercent(meanSeconds, standardDeviationSeconds),
    bestThreeConsecutive: bestConsecutiveLaps(lapTimes, 3, excluded),
  };
}
