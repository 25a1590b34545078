import convert from 'convert-units';
import fc from 'fast-check';
import {
  MM_PER_INCH,
  celsiusToFahrenheit,
  fahrenheitToCelsius,
  inchesToMm,
  mmToInches,
} from '../../../shared/compute/setup';

const length = fc.double({ min: -1e6, max: 1e6, noNaN: true });
const temperature = fc.double({ min: -273.15, max: 1e4, noNaN: true });

function closeRelative(actual: number, expected: number, relative: number): boolean {
  return Math.abs(actual - expected) <= relative * Math.max(1, Math.abs(expected));
}

describe('length: 1 in = 25.4 mm exactly (NIST SP 811 Appendix B; international yard and pound agreement, 1959)', () => {
  it('uses exactly 25.4 mm per inch', () => {
    expect(MM_PER_INCH).toBe(25.4);
    expect(inchesToMm(1)).toBe(25.4);
    expect(mmToInches(25.4)).toBe(1);
  });

  it('converts 27 mm to 1.06299… in', () => {
    // 27 / 25.4 = 1.0629921…, worked by hand.
    expect(mmToInches(27)).toBeCloseTo(1.0629921, 7);
  });

  it('round-trips mm → in → mm', () => {
    fc.assert(
      fc.property(length, (mm) => {
        expect(closeRelative(inchesToMm(mmToInches(mm)), mm, 1e-12)).toBe(true);
      }),
    );
  });

  it('agrees with the convert-units package on mm → in and in → mm', () => {
    // convert-units goes inch → foot → metre with a foot-to-metre ratio rounded to 3.28084, so its
    // inch is 25.3999992 mm: off by 3.2e-8 relative (read from its lib/definitions/length.js).
    // The 1e-9 agreement asked for is therefore out of reach for length; 1e-7 still catches any
    // real mistake (a wrong factor would be off by far more).
    fc.assert(
      fc.property(length, (mm) => {
        expect(closeRelative(mmToInches(mm), convert(mm).from('mm').to('in'), 1e-7)).toBe(true);
        expect(closeRelative(inchesToMm(mm), convert(mm).from('in').to('mm'), 1e-7)).toBe(true);
      }),
      { numRuns: 1000 },
    );
  });
});

describe('temperature: °F = °C × 9/5 + 32 exactly (NIST SP 811 Appendix B)', () => {
  it.each([
    [0, 32],
    [100, 212],
    [-40, -40],
    [30, 86],
    [-273.15, -459.67],
  ])('converts %p °C to %p °F', (celsius, fahrenheit) => {
    expect(celsiusToFahrenheit(celsius)).toBeCloseTo(fahrenheit, 10);
    expect(fahrenheitToCelsius(fahrenheit)).toBeCloseTo(celsius, 10);
  });

  it('gives whole °F for whole °C on multiples of 5 without float noise', () => {
    expect(celsiusToFahrenheit(30)).toBe(86);
    expect(celsiusToFahrenheit(-40)).toBe(-40);
  });

  it('round-trips °C → °F → °C', () => {
    fc.assert(
      fc.property(temperature, (celsius) => {
        expect(closeRelative(fahrenheitToCelsius(celsiusToFahrenheit(celsius)), celsius, 1e-12)).toBe(true);
      }),
    );
  });

  it('agrees with the convert-units package to 1e-9 relative', () => {
    // Relative to max(1, |value|) so values crossing zero (−17.78 °C = 0 °F) are compared sensibly.
    fc.assert(
      fc.property(temperature, (celsius) => {
        expect(closeRelative(celsiusToFahrenheit(celsius), convert(celsius).from('C').to('F'), 1e-9)).toBe(true);
        expect(closeRelative(fahrenheitToCelsius(celsius), convert(celsius).from('F').to('C'), 1e-9)).toBe(true);
      }),
      { numRuns: 1000 },
    );
  });
});
