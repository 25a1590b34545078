/**
 * The one error the track-day computations throw for bad input. The message is written for a
 * person and names what is wrong, so the API can return it as-is in a 400 response.
 */
export class TrackdayInputError extends Error {
  constructor(message: string) {
    super(message);
    this.name = 'TrackdayInputError';
  }
}

/** A short, printable description of any value, safe to put in an error message. */
export function describeValue(value: unknown): string {
  if (typeof value === 'number') return String(value);
  if (typeof value === 'string') return `'${printableExcerpt(value)}'`;
  if (value === null) return 'null';
  if (Array.isArray(value)) return 'a list';
  return typeof value;
}

const CHARACTERS_IN_EXCERPT = 24;

/**
 * Up to 24 characters of `text` with control and direction-changing characters shown as `\uXXXX`.
 * Input from files is echoed back in messages; a NUL or a right-to-left override would otherwise
 * break database text columns or make the message read backwards.
 */
export function printableExcerpt(text: string): string {
  const codePoints = Array.from(text);
  const shown = codePoints.slice(0, CHARACTERS_IN_EXCERPT).map((character) =>
    /[\u0000-\u001f\u007f-\u009f\u200b-\u200f\u202a-\u202e\u2066-\u2069\ufeff]/.test(character)
      ? `\\u${character.charCodeAt(0).toString(16).padStart(4, '0')}`
      : character,
  );
  return shown.join('') + (codePoints.length > CHARACTERS_IN_EXCERPT ? '…' : '');
}

/** `value` as a finite number, or a TrackdayInputError naming `what`. */
export function requireFiniteNumber(value: unknown, what: string): number {
  if (typeof value !== 'number' || !Number.isFinite(value)) {
    throw new TrackdayInputError(`${what} must be a finite number, got ${describeValue(value)}`);
  }
  return value;
}

/** `value` as a number inside [min, max], or a TrackdayInputError naming `what` and the range. */
export function requireNumberInRange(value: unknown, what: string, min: number, max: number): number {
  const checked = requireFiniteNumber(value, what);
  if (checked < min || checked > max) {
    throw new TrackdayInputError(`${what} must be between ${min} and ${max}, got ${checked}`);
  }
  return checked;
}

/** `value` as a number above zero, or a TrackdayInputError naming `what`. */
export function requirePositiveNumber(value: unknown, what: string): number {
  const checked = requireFiniteNumber(value, what);
  if (checked <= 0) {
    throw new TrackdayInputError(`${what} must be more than 0, got ${checked}`);
  }
  return checked;
}

/**
 * `lapTimes` checked to be a list of positive, finite lap times in seconds. An empty list is
 * refused unless `allowEmpty`, because most statistics have no meaning without a lap.
 */
export function requireLapTimes(
  lapTimes: unknown,
  what = 'lap times',
  allowEmpty = false,
): readonly number[] {
  if (!Array.isArray(lapTimes)) {
    throw new TrackdayInputError(`${what} must be a list of seconds, got ${describeValue(lapTimes)}`);
  }
  if (lapTimes.length === 0 && !allowEmpty) {
    throw new TrackdayInputError(`${what} must contain at least one lap`);
  }
  lapTimes.forEach((lapTime: unknown, index: number) => {
    if (typeof lapTime !== 'number' || !Number.isFinite(lapTime) || lapTime <= 0) {
      throw new TrackdayInputError(
        `${what}: lap at index ${index} must be a positive number of seconds, got ${describeValue(lapTime)}`,
      );
    }
  });
  return lapTimes as readonly number[];
}

/** `indices` checked to be whole positions inside a list of `length` items. */
export function requireLapIndices(indices: unknown, length: number, what: string): readonly number[] {
  if (!Array.isArray(indices)) {
    throw new TrackdayInputError(`${what} must be a list of lap indices, got ${describeValue(indices)}`);
  }
  for (const index of indices as unknown[]) {
    if (typeof index !== 'number' || !Number.isInteger(index) || index < 0 || index >= length) {
      throw new TrackdayInputError(
        `${what}: ${describeValue(index)} is not a lap index between 0 and ${length - 1}`,
      );
    }
  }
  return indices as readonly number[];
}
