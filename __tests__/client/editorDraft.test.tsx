import {
  buildConflict,
  changeNoteError,
  checkDraft,
  displayStep,
  fieldUnitLabel,
  formatFieldNumber,
  isChangeNoteRequired,
  mergeConflict,
  parseFieldText,
  readSaveError,
  stepFieldValue,
  type NumericField,
  type StaleRevision,
} from '../../hooks/editor';
import { ApiRequestError } from '../../hooks/api';
import { revisionCreateSchema } from '../../shared/types/setups';
import { fieldsByKey, getTemplate } from '../../shared/types/templates';

const template = getTemplate('buggy-1-8-electric');
const numeric = (key: string) => fieldsByKey(template).get(key) as NumericField;
const oil = numeric('shock.rear.oil');
const rideHeight = numeric('susp.front.ride-height');
const pistonHole = numeric('shock.front.piston-hole-size');
const motorTemp = numeric('motor.max-temp');
const METRIC = { length: 'mm', temperature: 'C' } as const;
const IMPERIAL = { length: 'in', temperature: 'F' } as const;

describe('stepper arithmetic', () => {
  it('moves shock oil up and down by its 25 cSt step', () => {
    expect(stepFieldValue(oil, 450, 1, METRIC)).toBe(475);
    expect(stepFieldValue(oil, 450, -1, METRIC)).toBe(425);
  });

  it('stops at the hard limits instead of stepping past them', () => {
    expect(stepFieldValue(oil, oil.max, 1, METRIC)).toBe(oil.max);
    expect(stepFieldValue(oil, oil.min, -1, METRIC)).toBe(oil.min);
    expect(stepFieldValue(oil, oil.max - 10, 1, METRIC)).toBe(oil.max);
  });

  it('starts an empty field at the low end of the usual range', () => {
    expect(stepFieldValue(oil, undefined, 1, METRIC)).toBe(oil.plausible!.min);
  });

  it('steps a half-millimetre field by a round 0.02 in for inch readers and stores millimetres', () => {
    expect(displayStep(rideHeight, IMPERIAL)).toBe(0.02);
    expect(stepFieldValue(rideHeight, 27, 1, IMPERIAL)).toBe(27.5);
    expect(stepFieldValue(rideHeight, 27, -1, IMPERIAL)).toBe(26.5);
  });

  it('leaves units that are not lengths or temperatures as stored for inch readers', () => {
    expect(displayStep(oil, IMPERIAL)).toBe(25);
    expect(fieldUnitLabel(oil, IMPERIAL)).toBe('cSt');
  });
});

describe('showing and reading numbers in the racer’s units', () => {
  it('shows 27 mm of ride height as 1.063 in', () => {
    expect(fieldUnitLabel(rideHeight, IMPERIAL)).toBe('in');
    expect(formatFieldNumber(rideHeight, 27, IMPERIAL)).toBe('1.063');
  });

  it('reads every ride height shown in inches back to the same millimetres', () => {
    for (let tenths = rideHeight.min * 10; tenths <= rideHeight.max * 10; tenths += 1) {
      const mm = tenths / 10;
      const parsed = parseFieldText(rideHeight, formatFieldNumber(rideHeight, mm, IMPERIAL), IMPERIAL);
      expect(parsed).toEqual({ ok: true, value: mm });
    }
  });

  it('shows fine steps with enough places to survive the round trip (1.25 mm piston holes)', () => {
    const shown = formatFieldNumber(pistonHole, 1.25, IMPERIAL);
    expect(shown).toBe('0.0492');
    expect(parseFieldText(pistonHole, shown, IMPERIAL)).toEqual({ ok: true, value: 1.25 });
  });

  it('reads motor temperatures typed in °F back to the stored °C', () => {
    expect(formatFieldNumber(motorTemp, 30, IMPERIAL)).toBe('86');
    for (let c = motorTemp.min; c <= motorTemp.max; c += 1) {
      expect(parseFieldText(motorTemp, formatFieldNumber(motorTemp, c, IMPERIAL), IMPERIAL)).toEqual({ ok: true, value: c });
    }
  });

  it('accepts a decimal comma and the unit typed after the number', () => {
    expect(parseFieldText(rideHeight, '27,5', METRIC)).toEqual({ ok: true, value: 27.5 });
    expect(parseFieldText(rideHeight, '1.083 in', IMPERIAL)).toEqual({ ok: true, value: 27.5 });
  });

  it('treats an emptied field as cleared and words a typo as a problem', () => {
    expect(parseFieldText(oil, '  ', METRIC)).toEqual({ ok: true, value: undefined });
    const typo = parseFieldText(oil, '4S0', METRIC);
    expect(typo.ok).toBe(false);
  });
});

describe('checking the draft with the server’s rules', () => {
  it('refuses an out-of-range value and words the limits in the racer’s unit', () => {
    const metric = checkDraft(template, { 'shock.rear.oil': 2500 }, {}, METRIC);
    expect(metric.errors['shock.rear.oil']).toBe('Rear shock oil must be between 100 cSt and 2000 cSt.');
    const imperial = checkDraft(template, { 'susp.front.ride-height': 120 }, {}, IMPERIAL);
    expect(imperial.errors['susp.front.ride-height']).toBe('Front ride height must be between 0.000 in and 3.937 in.');
  });

  it('warns about an implausible value without refusing it', () => {
    const result = checkDraft(template, { 'susp.front.ride-height': 45 }, {}, METRIC);
    expect(result.errors).toEqual({});
    expect(result.warnings['susp.front.ride-height']).toMatch(/^Unusual for a 1\/8 electric buggy: most racers run 20 mm to 40 mm/);
  });

  it('reports text that does not read as a number under its field', () => {
    const result = checkDraft(template, { 'shock.rear.oil': 450 }, { 'shock.rear.oil': '45o' }, METRIC);
    expect(result.errors['shock.rear.oil']).toMatch(/^Type a number for rear shock oil/);
  });
});

describe('the change note', () => {
  it('is required for every revision after the first', () => {
    expect(isChangeNoteRequired(1)).toBe(false);
    expect(isChangeNoteRequired(2)).toBe(true);
    expect(changeNoteError('', 1)).toBeNull();
  });

  it('refuses an empty or blank note on revision 2 with the shared schema’s message', () => {
    const expected = revisionCreateSchema.shape.changeNote.safeParse('').error!.issues[0].message;
    expect(changeNoteError('', 2)).toBe(expected);
    expect(changeNoteError('   \n ', 2)).toBe(expected);
    expect(changeNoteError('Rear oil 500 → 450: skipping over the braking bumps.', 2)).toBeNull();
  });
});

describe('merging with a newer revision', () => {
  const base = { 'shock.rear.oil': 450, 'diff.centre.oil': 7000, 'susp.front.ride-height': 27 };
  const mine = { ...base, 'shock.rear.oil': 500, 'susp.front.ride-height': 26 };
  const newer: StaleRevision = {
    id: 55,
    number: 5,
    values: { ...base, 'shock.rear.oil': 400, 'diff.centre.oil': 8000 },
    changeNote: 'Thicker centre diff for the long straight.',
    authorHandle: 'juno_braithwick',
    createdAt: '2026-11-30T18:00:00.000Z',
  };

  it('lists every field where the newer revision and the draft differ', () => {
    const conflict = buildConflict(base, mine, newer);
    expect(conflict.rows).toEqual([
      { key: 'diff.centre.oil', mine: 7000, theirs: 8000, editedByMe: false, editedByThem: true },
      { key: 'shock.rear.oil', mine: 500, theirs: 400, editedByMe: true, editedByThem: true },
      { key: 'susp.front.ride-height', mine: 26, theirs: 27, editedByMe: true, editedByThem: false },
    ]);
  });

  it('keeps the racer’s typed value by default and takes the newer value where they did not type', () => {
    const conflict = buildConflict(base, mine, newer);
    expect(conflict.choices['shock.rear.oil']).toBe('mine');
    expect(conflict.choices['susp.front.ride-height']).toBe('mine');
    expect(mergeConflict(mine, conflict)).toEqual({ 'shock.rear.oil': 500, 'diff.centre.oil': 8000, 'susp.front.ride-height': 26 });
  });

  it('takes the newer value for a typed field when the racer chooses theirs', () => {
    const conflict = buildConflict(base, mine, newer);
    const chosen = { ...conflict, choices: { ...conflict.choices, 'shock.rear.oil': 'theirs' as const } };
    expect(mergeConflict(mine, chosen)['shock.rear.oil']).toBe(400);
  });

  it('recognises the 409 answer and keeps its revision for the merge', () => {
    const error = new ApiRequestError(409, 'stale_revision', 'This setup changed since you opened it.', { currentRevision: newer });
    expect(readSaveError(error).conflict).toEqual(newer);
  });

  it('places the server’s 400 messages under the fields they name', () => {
    const error = new ApiRequestError(400, 'validation_failed', 'Some values on the sheet need fixing.', {
      'shock.rear.oil': 'Rear shock oil must be between 100 and 2000 cSt',
      'values.gear.spur': 'Spur gear must be a whole number',
    });
    expect(readSaveError(error).fields).toEqual({
      'shock.rear.oil': 'Rear shock oil must be between 100 and 2000 cSt',
      'gear.spur': 'Spur gear must be a whole number',
    });
  });
});
