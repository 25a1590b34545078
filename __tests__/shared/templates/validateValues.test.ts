import {
  SHEET_ERROR_KEY,
  buildValuesSchema,
  getTemplate,
  validateSetupValues,
} from '../../../shared/types/templates';

const buggy = getTemplate('buggy-1-8-nitro');
const electricBuggy = getTemplate('buggy-1-8-electric');

describe('number fields', () => {
  it('accept a value inside the hard limits, unit implied by the template', () => {
    expect(validateSetupValues(buggy, { 'shock.rear.oil': 450 })).toEqual({
      ok: true,
      values: { 'shock.rear.oil': 450 },
      errors: {},
      warnings: {},
    });
  });

  it('refuse values outside the hard limits with a message naming the field, limits and unit', () => {
    const result = validateSetupValues(buggy, { 'shock.rear.oil': 2500, 'susp.front.toe': -11 });
    expect(result.ok).toBe(false);
    expect(result.errors).toEqual({
      'shock.rear.oil': 'Rear shock oil must be between 100 and 2000 cSt',
      'susp.front.toe': 'Front toe must be between -10 and 10°',
    });
  });

  it('accept the limits themselves', () => {
    expect(validateSetupValues(buggy, { 'shock.rear.oil': 100, 'shock.front.oil': 2000 }).ok).toBe(true);
  });

  it.each([['450'], [null], [Number.NaN], [Number.POSITIVE_INFINITY], [true]])(
    'refuse %p as a shock oil because it is not a number',
    (value) => {
      expect(validateSetupValues(buggy, { 'shock.front.oil': value }).errors).toEqual({
        'shock.front.oil': 'Front shock oil must be a number',
      });
    },
  );

  it('keep off-step values but round them to the step’s decimal places', () => {
    const result = validateSetupValues(buggy, {
      'susp.front.ride-height': 27.3,
      'susp.rear.ride-height': 29.299999999,
      'clutch.gap': 0.7249,
      'shock.front.oil': 437.6,
    });
    expect(result.values).toEqual({
      'susp.front.ride-height': 27.3,
      'susp.rear.ride-height': 29.3,
      'clutch.gap': 0.72,
      'shock.front.oil': 438,
    });
  });

  it('never store a negative zero', () => {
    const { values } = validateSetupValues(buggy, { 'susp.front.camber': -0.04 });
    expect(Object.is(values['susp.front.camber'], 0)).toBe(true);
  });
});

describe('integer fields', () => {
  it('accept whole numbers of teeth and counts without a unit', () => {
    expect(validateSetupValues(buggy, { 'gear.spur': 46, 'shock.front.piston-holes': 6 }).ok).toBe(true);
  });

  it('refuse fractions and out-of-range counts', () => {
    expect(validateSetupValues(buggy, { 'gear.spur': 46.5, 'gear.clutch-bell': 25 }).errors).toEqual({
      'gear.spur': 'Spur gear must be a whole number',
      'gear.clutch-bell': 'Clutch bell must be between 10 and 20 teeth',
    });
    expect(validateSetupValues(buggy, { 'shock.rear.piston-holes': 0 }).errors).toEqual({
      'shock.rear.piston-holes': 'Rear piston holes must be between 1 and 12',
    });
  });
});

describe('position fields', () => {
  it('accept a hole number on the part', () => {
    expect(validateSetupValues(buggy, { 'shock.front.tower-hole': 6, 'wing.position': 1 }).ok).toBe(true);
  });

  it.each([[0], [7], [2.5], ['3']])('refuse hole %p on a six-hole shock tower', (hole) => {
    expect(validateSetupValues(buggy, { 'shock.front.tower-hole': hole }).errors).toEqual({
      'shock.front.tower-hole': 'Front shock tower hole must be a hole number from 1 to 6',
    });
  });
});

describe('choice fields', () => {
  it('accept an option value', () => {
    expect(validateSetupValues(buggy, { 'engine.glow-plug': 'cold' }).values).toEqual({ 'engine.glow-plug': 'cold' });
  });

  it('refuse labels, other words and other types, listing the options a racer can pick', () => {
    for (const value of ['Cold', 'number 8', 3]) {
      expect(validateSetupValues(buggy, { 'engine.glow-plug': value }).errors).toEqual({
        'engine.glow-plug': 'Glow plug heat range must be one of: Hot, Medium, Cold',
      });
    }
  });
});

describe('boolean fields', () => {
  it('accept true and false', () => {
    expect(validateSetupValues(buggy, { 'chassis.stiffener': false }).values).toEqual({ 'chassis.stiffener': false });
  });

  it('refuse yes/no words and numbers', () => {
    for (const value of ['yes', 1]) {
      expect(validateSetupValues(buggy, { 'chassis.stiffener': value }).errors).toEqual({
        'chassis.stiffener': 'Chassis stiffeners fitted must be yes or no',
      });
    }
  });
});

describe('text fields', () => {
  it('accept text up to the field’s length, including empty text', () => {
    expect(validateSetupValues(buggy, { 'diff.notes': 'x'.repeat(200), 'body.cutouts': '' }).ok).toBe(true);
  });

  it('refuse text that is too long or not text', () => {
    expect(validateSetupValues(buggy, { 'diff.notes': 'x'.repeat(201), 'shock.rear.spring-label': 5 }).errors).toEqual({
      'diff.notes': 'Diff notes must be at most 200 characters',
      'shock.rear.spring-label': 'Rear spring marking must be text',
    });
  });
});

describe('unknown keys and sheet shape', () => {
  it('refuses each unknown key with its own message', () => {
    const result = validateSetupValues(buggy, { 'shock.rear.oil': 450, 'shock.rear.colour': 'red', Wing: 3 });
    expect(result.ok).toBe(false);
    expect(result.errors).toEqual({
      'shock.rear.colour': '"shock.rear.colour" is not a field on the 1/8 nitro buggy setup sheet',
      Wing: '"Wing" is not a field on the 1/8 nitro buggy setup sheet',
    });
  });

  it('refuses a nitro field on an electric sheet', () => {
    expect(validateSetupValues(electricBuggy, { 'engine.glow-plug': 'hot' }).errors).toEqual({
      'engine.glow-plug': '"engine.glow-plug" is not a field on the 1/8 electric buggy setup sheet',
    });
  });

  it('refuses keys that only exist on every JavaScript object', () => {
    const result = validateSetupValues(buggy, JSON.parse('{"__proto__": {"x": 1}, "constructor": 1}'));
    expect(result.ok).toBe(false);
    expect(Object.keys(result.errors)).toContain('__proto__');
    const constructorOnly = validateSetupValues(buggy, { constructor: 1 });
    expect(Object.keys(constructorOnly.errors)).toEqual(['constructor']);
  });

  it('accepts an empty or partial sheet and treats undefined as absent', () => {
    expect(validateSetupValues(buggy, {})).toEqual({ ok: true, values: {}, errors: {}, warnings: {} });
    expect(validateSetupValues(buggy, { 'gear.spur': 47, 'wing.angle': undefined }).values).toEqual({ 'gear.spur': 47 });
  });

  it.each([[null], [[]], ['shock oil 450'], [42]])('refuses %p as a sheet', (input) => {
    expect(validateSetupValues(buggy, input).errors).toEqual({
      [SHEET_ERROR_KEY]: 'A setup sheet must be a set of field keys and their values',
    });
  });
});

describe('warnings versus errors', () => {
  it.each([
    [5, 'Front ride height of 5 mm is unusual for a 1/8 nitro buggy (most run 20 to 40 mm); check the value and its unit'],
    [80, 'Front ride height of 80 mm is unusual for a 1/8 nitro buggy (most run 20 to 40 mm); check the value and its unit'],
  ])('accepts a 1/8 buggy ride height of %p mm with a warning', (height, warning) => {
    expect(validateSetupValues(buggy, { 'susp.front.ride-height': height })).toEqual({
      ok: true,
      values: { 'susp.front.ride-height': height },
      errors: {},
      warnings: { 'susp.front.ride-height': warning },
    });
  });

  it('gives no warning inside the usual band', () => {
    expect(validateSetupValues(buggy, { 'susp.front.ride-height': 28 }).warnings).toEqual({});
  });

  it.each([[-1], [101]])('refuses a ride height of %p mm past the hard limits', (height) => {
    expect(validateSetupValues(buggy, { 'susp.front.ride-height': height }).errors).toEqual({
      'susp.front.ride-height': 'Front ride height must be between 0 and 100 mm',
    });
  });

  it('keeps the fields that passed, with their warnings, when others are refused', () => {
    const result = validateSetupValues(buggy, {
      'susp.rear.ride-height': 80,
      'gear.spur': 46,
      'shock.rear.oil': 5000,
    });
    expect(result.ok).toBe(false);
    expect(result.values).toEqual({ 'susp.rear.ride-height': 80, 'gear.spur': 46 });
    expect(Object.keys(result.errors)).toEqual(['shock.rear.oil']);
    expect(Object.keys(result.warnings)).toEqual(['susp.rear.ride-height']);
  });
});

describe('the zod values schema', () => {
  const schema = buildValuesSchema(buggy);

  it('puts each problem at its field’s path with the racer-facing message', () => {
    const result = schema.safeParse({ 'shock.rear.oil': 2500, 'shock.rear.colour': 'red' });
    expect(result.success).toBe(false);
    const issues = result.error!.issues.map((i) => ({ path: i.path, message: i.message }));
    expect(issues).toEqual([
      { path: ['shock.rear.oil'], message: 'Rear shock oil must be between 100 and 2000 cSt' },
      { path: ['shock.rear.colour'], message: '"shock.rear.colour" is not a field on the 1/8 nitro buggy setup sheet' },
    ]);
  });

  it('outputs rounded values and ignores plausible ranges', () => {
    expect(schema.parse({ 'susp.front.ride-height': 5.04, 'gear.spur': 46 })).toEqual({
      'susp.front.ride-height': 5,
      'gear.spur': 46,
    });
  });
});
