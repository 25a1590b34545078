import { requireLapIndices, requireLapTimes, requireNumberInRange } from './inputChecks';
import { LapStatistics, medianOf, summarizeLaps } from './lapStatistics';

/**
 * Multiplier of the scaled median absolute deviation beyond which a slow lap is set aside. 3.5 is
 * the modified z-score cut-off for potential outliers given in the NIST/SEMATECH e-Handbook of
 * Statistical Methods, §1.3.5.17. The median and MAD are used because a crash lap drags the mean
 * and the standard deviation toward itself and would hide.
 */
export const DEFAULT_SLOW_LAP_MAD_MULTIPLIER = 3.5;

/**
 * A lap must be at least this many seconds slower than the median to be set aside, whatever the
 * spread. Without it a very consistent run has a spread of a few hundredths and an ordinary
 * bobble would count as a crash. 1.5 s is our judgement of the smallest crash or pit stop on a
 * club track (common practice, no source).
 */
export const DEFAULT_SLOW_LAP_MINIMUM_MARGIN_SECONDS = 1.5;

/** Makes the MAD estimate the standard deviation for normally distributed laps (1 / 0.6745). */
export const MAD_TO_STANDARD_DEVIATION = 1.4826;

/** Tuning for {@link findSlowLaps} and {@link analyzeRun}. */
export interface SlowLapRuleOptions {
  /** k in "median + k × scaled MAD"; default {@link DEFAULT_SLOW_LAP_MAD_MULTIPLIER}. */
  madMultiplier?: number;
  /** Smallest margin over the median, seconds; default {@link DEFAULT_SLOW_LAP_MINIMUM_MARGIN_SECONDS}. */
  minimumMarginSeconds?: number;
}

/** The slow-lap rule applied to one run. */
export interface SlowLapFinding {
  /** 0-based indices of laps slower than the threshold, in lap order. */
  flaggedIndices: number[];
  medianSeconds: number;
  /** Scaled median absolute deviation: a spread that one crash cannot inflate. */
  typicalSpreadSeconds: number;
  /** Laps strictly slower than this are flagged. */
  thresholdSeconds: number;
  madMultiplier: number;
  minimumMarginSeconds: number;
  /** The rule and this run's numbers in plain words, for the UI. */
  ruleDescription: string;
}

/**
 * Flags laps slower than median + max(k × scaled MAD, minimum margin): crashes and pit stops.
 * Only slow laps are flagged; a fast lap is the racer's, not an accident. With one or two laps
 * nothing can be flagged, since neither lap is far from their median.
 */
export function findSlowLaps(lapTimes: readonly number[], options: SlowLapRuleOptions = {}): SlowLapFinding {
  requireLapTimes(lapTimes);
  const madMultiplier = requireNumberInRange(
    options.madMultiplier ?? DEFAULT_SLOW_LAP_MAD_MULTIPLIER,
    'the MAD multiplier',
    0,
    100,
  );
  const minimumMarginSeconds = requireNumberInRange(
    options.minimumMarginSeconds ?? DEFAULT_SLOW_LAP_MINIMUM_MARGIN_SECONDS,
    'the minimum margin',
    0,
    3600,
  );
  const medianSeconds = medianOf(lapTimes);
  const typicalSpreadSeconds =
    MAD_TO_STANDARD_DEVIATION * medianOf(lapTimes.map((lapTime) => Math.abs(lapTime - medianSeconds)));
  const marginSeconds = Math.max(madMultiplier * typicalSpreadSeconds, minimumMarginSeconds);
  const thresholdSeconds = medianSeconds + marginSeconds;
  const flaggedIndices = lapTimes
    .map((lapTime, index) => (lapTime > thresholdSeconds ? index : -1))
    .filter((index) => index >= 0);
  const ruleDescription =
    `A lap is set aside as a crash or pit stop when it is slower than the median lap ` +
    `(${seconds(medianSeconds)}) by more than ${madMultiplier} × the typical lap-to-lap spread ` +
    `(${seconds(typicalSpreadSeconds)}) or by more than ${seconds(minimumMarginSeconds)}, whichever ` +
    `is larger. In this run: any lap slower than ${seconds(thresholdSeconds)}.`;
  return {
    flaggedIndices, medianSeconds, typicalSpreadSeconds, thresholdSeconds,
    madMultiplier, minimumMarginSeconds, ruleDescription,
  };
}

/** Options for {@link analyzeRun}. */
export interface AnalyzeRunOptions extends SlowLapRuleOptions {
  /** 0-based indices the racer puts back although the rule flagged them. */
  includeIndices?: readonly number[];
}

/** A run's statistics with and without the laps the slow-lap rule set aside. */
export interface RunAnalysis {
  allLaps: LapStatistics;
  /** Statistics without the set-aside laps; the same as `allLaps` when none were set aside. */
  keptLaps: LapStatistics;
  /** Flagged by the rule and not put back; 0-based, in lap order. */
  setAsideIndices: number[];
  /** Flagged by the rule but put back by the caller. */
  includedBackIndices: number[];
  rule: SlowLapFinding;
}

/** Statistics of a run with crashes and pit stops set aside, and the caller's put-backs honoured. */
export function analyzeRun(lapTimes: readonly number[], options: AnalyzeRunOptions = {}): RunAnalysis {
  const rule = findSlowLaps(lapTimes, options);
  const includeBack = new Set(
    requireLapIndices(options.includeIndices ?? [], lapTimes.length, 'laps to include'),
  );
  const setAsideIndices = rule.flaggedIndices.filter((index) => !includeBack.has(index));
  const includedBackIndices = rule.flaggedIndices.filter((index) => includeBack.has(index));
  return {
    allLaps: summarizeLaps(lapTimes),
    keptLaps: summarizeLaps(lapTimes, { excludeIndices: setAsideIndices }),
    setAsideIndices,
    includedBackIndices,
    rule,
  };
}

function seconds(value: number): string {
  return `${value.toFixed(2)} s`;
}
