/**
 * Argument guards shared by the setup computations. Each one throws a RangeError that names the
 * argument, because a NaN or Infinity that slips into a saved setup sheet is far harder to trace
 * than an error at the call that produced it.
 */

function describe(value: unknown): string {
  return typeof value === 'number' ? String(value) : `${typeof value} ${JSON.stringify(value)}`;
}

/**
 * Throws a RangeError unless `value` is a finite number.
 * @param name the argument name shown in the error message
 * @param value the value to check
 * @returns the same value, narrowed to `number`
 */
export function requireFinite(name: string, value: unknown): number {
  // typeof guards callers in plain JS (or a form field) that pass a string such as "16".
  if (typeof value !== 'number' || !Number.isFinite(value)) {
    throw new RangeError(`${name} must be a finite number, got ${describe(value)}`);
  }
  return value;
}

/**
 * Throws a RangeError unless `value` is a finite number greater than zero.
 * @param name the argument name shown in the error message
 * @param value the value to check
 * @returns the same value
 */
export function requirePositive(name: string, value: unknown): number {
  const n = requireFinite(name, value);
  if (n <= 0) {
    throw new RangeError(`${name} must be greater than zero, got ${n}`);
  }
  return n;
}

/**
 * Throws a RangeError unless `value` is a finite number of zero or more.
 * @param name the argument name shown in the error message
 * @param value the value to check
 * @returns the same value
 */
export function requireNonNegative(name: string, value: unknown): number {
  const n = requireFinite(name, value);
  if (n < 0) {
    throw new RangeError(`${name} must be zero or more, got ${n}`);
  }
  return n;
}

/**
 * Throws a RangeError unless `value` is a whole number of teeth, one or more. A gear cannot have
 * a fractional tooth, so 16.5 is treated as a typing mistake rather than rounded.
 * @param name the argument name shown in the error message
 * @param value the value to check
 * @returns the same value
 */
export function requireTeeth(name: string, value: unknown): number {
  const n = requireFinite(name, value);
  if (!Number.isInteger(n) || n < 1) {
    throw new RangeError(`${name} must be a whole number of teeth, 1 or more, got ${n}`);
  }
  return n;
}

/**
 * Throws a RangeError unless `value` is a whole number (zero and negatives allowed), used for
 * signed changes such as "two teeth smaller".
 * @param name the argument name shown in the error message
 * @param value the value to check
 * @returns the same value
 */
export function requireInteger(name: string, value: unknown): number {
  const n = requireFinite(name, value);
  if (!Number.isInteger(n)) {
    throw new RangeError(`${name} must be a whole number, got ${n}`);
  }
  return n;
}

/**
 * Throws a RangeError when a computation on valid inputs still overflows (for example two huge
 * but finite numbers multiplied). Keeps the "never return Infinity" promise for every export.
 * @param name what was being computed, shown in the error message
 * @param value the result to check
 * @returns the same value
 */
export function requireFiniteResult(name: string, value: number): number {
  if (!Number.isFinite(value)) {
    throw new RangeError(`${name} is out of range for these inputs (got ${value})`);
  }
  return value;
}
