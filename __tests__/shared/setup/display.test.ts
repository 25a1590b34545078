import fc from 'fast-check';
import {
  displayUnitLabel,
  formatForDisplay,
  parseFromDisplay,
  type UnitPreferences,
} from '../../../shared/compute/setup';

const metric: UnitPreferences = { length: 'mm', temperature: 'C' };
const imperial: UnitPreferences = { length: 'in', temperature: 'F' };

describe('formatting stored values for display', () => {
  it('shows 27 mm as "27.0 mm" to a racer reading mm', () => {
    expect(formatForDisplay(27, 'length', metric)).toEqual({ value: 27, unit: 'mm', text: '27.0 mm' });
  });

  it('shows 27 mm as "1.063 in" to a racer reading inches', () => {
    // 27 / 25.4 = 1.06299…, rounded to thousandths.
    expect(formatForDisplay(27, 'length', imperial)).toEqual({ value: 1.063, unit: 'in', text: '1.063 in' });
  });

  // Spacing per NIST SP 811 §7.2: "30.2 °C", not "30.2°C".
  it('shows 30 °C as "30 °C" or "86 °F"', () => {
    expect(formatForDisplay(30, 'temperature', metric)).toEqual({ value: 30, unit: '°C', text: '30 °C' });
    expect(formatForDisplay(30, 'temperature', imperial)).toEqual({ value: 86, unit: '°F', text: '86 °F' });
  });

  it('rounds temperatures to whole degrees', () => {
    expect(formatForDisplay(21.6, 'temperature', metric).text).toBe('22 °C');
    // 21.6 °C = 70.88 °F.
    expect(formatForDisplay(21.6, 'temperature', imperial).text).toBe('71 °F');
  });

  it('never shows a negative zero', () => {
    expect(formatForDisplay(-0.04, 'length', metric).text).toBe('0.0 mm');
    expect(formatForDisplay(-0.0001, 'length', imperial).text).toBe('0.000 in');
  });

  it('passes other kinds through unconverted and unrounded with the given unit', () => {
    expect(formatForDisplay(450.5, 'viscosity', imperial, 'cSt')).toEqual({ value: 450.5, unit: 'cSt', text: '450.5 cSt' });
  });

  // NIST SP 811 §7.2: plane-angle degrees touch the number.
  it('writes angle degrees without a space', () => {
    expect(formatForDisplay(2.75, 'angle', metric, '°').text).toBe('2.75°');
  });

  it('names the unit a kind is shown in', () => {
    expect(displayUnitLabel('length', imperial)).toBe('in');
    expect(displayUnitLabel('temperature', imperial)).toBe('°F');
    expect(displayUnitLabel('teeth', imperial, 'T')).toBe('T');
  });

  it('refuses a preference it does not know', () => {
    const wrong = { length: 'cm', temperature: 'C' } as unknown as UnitPreferences;
    expect(() => formatForDisplay(27, 'length', wrong)).toThrow(new RangeError("preferences.length must be 'mm' or 'in', got cm"));
  });
});

describe('parsing display values back to SI', () => {
  it('reads "1.063 in" back as about 27 mm', () => {
    expect(parseFromDisplay('1.063 in', 'length', imperial)).toBeCloseTo(27.0002, 4);
  });

  it('reads "86 °F" and "86 F" back as 30 °C', () => {
    expect(parseFromDisplay('86 °F', 'temperature', imperial)).toBe(30);
    expect(parseFromDisplay('86 F', 'temperature', imperial)).toBe(30);
  });

  it('reads a bare number in the racer unit', () => {
    expect(parseFromDisplay('27.5', 'length', metric)).toBe(27.5);
    expect(parseFromDisplay(2, 'length', imperial)).toBe(50.8);
  });

  it('returns other kinds as given', () => {
    expect(parseFromDisplay('2.75°', 'angle', imperial, '°')).toBe(2.75);
  });

  it.each(['', '   ', 'abc', '0x1A', '1e3', '27,5', '27 mm', 'in'])('refuses %p for an inch field', (text) => {
    expect(() => parseFromDisplay(text, 'length', imperial)).toThrow(RangeError);
  });

  it('refuses a non-finite number', () => {
    expect(() => parseFromDisplay(Number.NaN, 'length', metric)).toThrow(new RangeError('input must be a finite number, got NaN'));
  });

  // Parsing what was displayed can only lose what the display rounded away: half a display step.
  it.each([
    ['length', metric, 0.05],
    ['length', imperial, 0.0005 * 25.4],
    ['temperature', metric, 0.5],
    ['temperature', imperial, (0.5 * 5) / 9],
  ] as const)('round-trips a stored %s through the %j display within half a step', (kind, preferences, halfStep) => {
    fc.assert(
      fc.property(fc.double({ min: -200, max: 1000, noNaN: true }), (stored) => {
        const shown = formatForDisplay(stored, kind, preferences);
        expect(Math.abs(parseFromDisplay(shown.text, kind, preferences) - stored)).toBeLessThanOrEqual(halfStep + 1e-9);
        expect(parseFromDisplay(shown.value, kind, preferences)).toBe(parseFromDisplay(shown.text, kind, preferences));
      }),
    );
  });
});
