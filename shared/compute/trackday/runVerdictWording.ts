/*
 * The sentences racers read for an A/B comparison. Kept apart from the statistics so the wording
 * can change (or be translated) without touching the numbers.
 */

/** The interval verdicts that have a confidence interval to talk about. */
export type IntervalVerdict = 'real-gain' | 'real-loss' | 'no-clear-difference';

/** The sentence for a verdict drawn from a confidence interval of B − A. */
export function intervalVerdictMessage(
  verdict: IntervalVerdict,
  difference: number,
  interval: { lowSeconds: number; highSeconds: number },
  confidenceLevel: number,
): string {
  const level = `${Number((confidenceLevel * 100).toFixed(1))} % CI`;
  const low = interval.lowSeconds;
  const high = interval.highSeconds;
  const nearest = Math.min(Math.abs(low), Math.abs(high));
  const format = secondsFormatter(verdict === 'no-clear-difference' ? [difference] : [difference, nearest]);
  const gap = format(Math.abs(difference));
  const span = `${format(nearest)}–${format(Math.max(Math.abs(low), Math.abs(high)))} s`;
  if (verdict === 'real-gain') return `B is faster by ${gap} s a lap, ${level} ${span}: likely a real gain.`;
  if (verdict === 'real-loss') return `B is slower by ${gap} s a lap, ${level} ${span}: likely a real loss.`;
  const onAverage =
    gap === format(0)
      ? 'A and B average the same lap time'
      : `B is ${gap} s a lap ${fasterOrSlower(difference)} on average`;
  const range = `from ${format(-low)} s faster to ${format(high)} s slower`;
  return `No difference you can tell from these laps: ${onAverage}, but the ${level} runs ${range}.`;
}

/** Both runs had the same time on every lap. */
export function identicalRunsMessage(lapSeconds: number): string {
  return `No difference: every lap in both runs took ${formatSeconds(lapSeconds)} s.`;
}

/** Each run had the same time on every lap, but the two times differ. */
export function noSpreadMessage(difference: number): string {
  return (
    `B is ${fasterOrSlower(difference)} by ${formatSeconds(Math.abs(difference))} s a lap, but every lap ` +
    `within each run took the same time, so there is no spread to judge the gap against: time more laps.`
  );
}

/** A run with 0 or 1 laps; null when both runs have at least 2. */
export function tooFewLapsMessage(lapCountA: number, lapCountB: number): string | null {
  const problems = [
    [lapCountA, 'A'],
    [lapCountB, 'B'],
  ]
    .map(([count, name]) =>
      count === 0 ? `run ${name} has no laps` : count === 1 ? `run ${name} has only 1 lap` : '',
    )
    .filter((problem) => problem !== '');
  if (problems.length === 0) return null;
  const sentence = problems.join(' and ');
  const capitalized = sentence.charAt(0).toUpperCase() + sentence.slice(1);
  return `${capitalized}: each run needs at least 2 laps to compare.`;
}

function fasterOrSlower(difference: number): string {
  return difference < 0 ? 'faster' : 'slower';
}

/**
 * Seconds with two decimals, or three when any of `smallValues` is under 0.05 s, so a small real
 * gain never prints as 0.00. One precision per message keeps its numbers comparable.
 */
function secondsFormatter(smallValues: readonly number[]): (value: number) => string {
  const decimals = smallValues.some((value) => Math.abs(value) < 0.05) ? 3 : 2;
  return (value) => value.toFixed(decimals);
}

function formatSeconds(value: number): string {
  return secondsFormatter([value])(value);
}
