import { requireFinite, requireFiniteResult } from './validate';

/**
 * Millimetres in one inch: exactly 25.4 since the 1959 international yard and pound agreement
 * (1 yd = 0.9144 m). Kept as the exact constant rather than a chain through feet or metres so that
 * conversions carry no rounding beyond floating point.
 */
export const MM_PER_INCH = 25.4;

/**
 * Millimetres → inches.
 * @throws RangeError when the length is not finite
 */
export function mmToInches(mm: number): number {
  return requireFinite('mm', mm) / MM_PER_INCH;
}

/**
 * Inches → millimetres.
 * @throws RangeError when the length is not finite, or the result overflows
 */
export function inchesToMm(inches: number): number {
  return requireFiniteResult('mm', requireFinite('inches', inches) * MM_PER_INCH);
}

/**
 * Degrees Celsius → degrees Fahrenheit: °F = °C × 9/5 + 32.
 * @throws RangeError when the temperature is not finite, or the result overflows
 */
export function celsiusToFahrenheit(celsius: number): number {
  // Multiplying by 9 before dividing by 5 keeps whole-degree inputs exact (30 °C → 86 °F, not 85.99…).
  return requireFiniteResult('°F', (requireFinite('celsius', celsius) * 9) / 5 + 32);
}

/**
 * Degrees Fahrenheit → degrees Celsius: °C = (°F − 32) × 5/9.
 * @throws RangeError when the temperature is not finite, or the result overflows
 */
export function fahrenheitToCelsius(fahrenheit: number): number {
  return requireFiniteResult('°C', ((requireFinite('fahrenheit', fahrenheit) - 32) * 5) / 9);
}
