import { TrackdayInputError, describeValue, requireFiniteNumber } from './inputChecks';

/** Longest lap time accepted, in seconds: an hour is well beyond any RC lap, even a stopped one. */
export const MAX_LAP_SECONDS = 3600;

/** Why a text is not a lap time, or the lap time it holds. */
export type LapTimeParse = { ok: true; seconds: number } | { ok: false; reason: string };

const SECONDS_FORM = /^(\d{1,4})(?:\.(\d{1,6}))?$/;
const MINUTES_FORM = /^(\d{1,2}):([0-5]\d)(?:\.(\d{1,6}))?$/;

/**
 * Reads a lap time written as seconds (`32.481`) or minutes and seconds (`1:02.345`). Signs,
 * exponents, `NaN` and `Infinity` are refused by the patterns, so nothing a spreadsheet or an
 * attacker writes can turn into a non-finite or negative time. `decimalComma` also accepts
 * `32,481`, for files whose columns are separated by semicolons.
 */
export function parseLapTime(text: string, decimalComma = false): LapTimeParse {
  if (typeof text !== 'string') {
    throw new TrackdayInputError(`a lap time to read must be text, got ${describeValue(text)}`);
  }
  const normalized = decimalComma ? text.trim().replace(',', '.') : text.trim();
  const secondsMatch = SECONDS_FORM.exec(normalized);
  const minutesMatch = secondsMatch ? null : MINUTES_FORM.exec(normalized);
  if (!secondsMatch && !minutesMatch) {
    return { ok: false, reason: 'is not a lap time (write seconds like 32.481 or minutes like 1:02.345)' };
  }
  const seconds = secondsMatch
    ? Number(normalized)
    : Number(minutesMatch![1]) * 60 + Number(`${minutesMatch![2]}.${minutesMatch![3] ?? '0'}`);
  if (seconds <= 0) return { ok: false, reason: 'is not a lap time: it must be more than 0 s' };
  if (seconds > MAX_LAP_SECONDS) {
    return { ok: false, reason: `is not a lap time: it is longer than ${MAX_LAP_SECONDS / 60} minutes` };
  }
  return { ok: true, seconds };
}

/** A lap time as racers write it: `32.481` under a minute, `1:02.345` from a minute up. */
export function formatLapTime(seconds: number): string {
  if (requireFiniteNumber(seconds, 'lap time') < 0) {
    throw new TrackdayInputError(`lap time cannot be negative, got ${seconds}`);
  }
  const thousandths = Math.round(seconds * 1000);
  const minutes = Math.floor(thousandths / 60000);
  const rest = ((thousandths - minutes * 60000) / 1000).toFixed(3);
  return minutes === 0 ? rest : `${minutes}:${rest.padStart(6, '0')}`;
}
