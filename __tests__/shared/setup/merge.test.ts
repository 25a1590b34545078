import fc from 'fast-check';
import { diffSetupValues } from '../../../shared/compute/setup/diff';
import { applyDiff, applyMerge, threeWayMerge, upstreamChanges } from '../../../shared/compute/setup/merge';

type Value = number | string | boolean;

// Few keys and short strings so that the three sheets often share, drop and disagree on fields.
const sheet = fc.dictionary(
  fc.constantFrom('a', 'b', 'c', 'd', 'e'),
  fc.oneof(fc.integer(), fc.boolean(), fc.string({ maxLength: 3 })),
);

function takeAll(keys: string[]): Record<string, 'theirs'> {
  return Object.fromEntries(keys.map((key) => [key, 'theirs' as const]));
}

describe('three-way merge of setup sheets', () => {
  it('marks a field the original changed and the fork kept as theirs-only', () => {
    const rows = threeWayMerge({ 'shock.rear.oil': 450 }, { 'shock.rear.oil': 500 }, { 'shock.rear.oil': 450 });
    expect(rows).toEqual([{ key: 'shock.rear.oil', base: 450, theirs: 500, mine: 450, status: 'theirs-only' }]);
  });

  it('classifies every kind of field and sorts the rows by key', () => {
    const base = { 'shock.rear.oil': 450, 'shock.front.oil': 400, 'diff.rear.oil': 3000, 'diff.front.oil': 7000, 'diff.centre.oil': 10000 };
    const theirs = { 'shock.rear.oil': 500, 'shock.front.oil': 400, 'diff.rear.oil': 5000, 'diff.front.oil': 10000, 'diff.centre.oil': 10000 };
    const mine = { 'shock.rear.oil': 450, 'shock.front.oil': 350, 'diff.rear.oil': 5000, 'diff.front.oil': 5000, 'diff.centre.oil': 10000 };
    const statuses = threeWayMerge(base, theirs, mine).map((row) => [row.key, row.status]);
    expect(statuses).toEqual([
      ['diff.centre.oil', 'unchanged'],
      ['diff.front.oil', 'conflict'],
      ['diff.rear.oil', 'both-same'],
      ['shock.front.oil', 'mine-only'],
      ['shock.rear.oil', 'theirs-only'],
    ]);
  });

  it('counts a field added or emptied on one side as a change on that side', () => {
    const rows = threeWayMerge({ 'diff.rear.type': 'gear' }, { 'gear.spur': 46 }, { 'diff.rear.type': 'gear' });
    expect(rows).toEqual([
      { key: 'diff.rear.type', base: 'gear', theirs: undefined, mine: 'gear', status: 'theirs-only' },
      { key: 'gear.spur', base: undefined, theirs: 46, mine: undefined, status: 'theirs-only' },
    ]);
  });

  it('compares with Object.is, so 0 and -0 differ and NaN equals NaN', () => {
    const rows = threeWayMerge({ x: 0, y: NaN }, { x: -0, y: NaN }, { x: 0, y: NaN });
    expect(rows.map((row) => row.status)).toEqual(['theirs-only', 'unchanged']);
  });

  it('reads a field named like an Object member as empty when it is missing', () => {
    const rows = threeWayMerge({}, { constructor: 'x' }, {});
    expect(rows).toEqual([{ key: 'constructor', base: undefined, theirs: 'x', mine: undefined, status: 'theirs-only' }]);
  });

  it('offers only the theirs-only and conflict rows', () => {
    const rows = threeWayMerge({ a: 1, b: 1, c: 1, d: 1, e: 1 }, { a: 1, b: 2, c: 1, d: 2, e: 2 }, { a: 1, b: 1, c: 2, d: 3, e: 2 });
    expect(upstreamChanges(rows).map((row) => [row.key, row.status])).toEqual([
      ['b', 'theirs-only'],
      ['d', 'conflict'],
    ]);
  });

  it('a field is a conflict exactly when both sides changed it to different values', () => {
    fc.assert(
      fc.property(sheet, sheet, sheet, (base, theirs, mine) => {
        for (const row of threeWayMerge(base, theirs, mine)) {
          const theirsChanged = !Object.is(base[row.key], theirs[row.key]);
          const mineChanged = !Object.is(base[row.key], mine[row.key]);
          const expected = theirsChanged && mineChanged && !Object.is(theirs[row.key], mine[row.key]);
          expect(row.status === 'conflict').toBe(expected);
        }
      }),
    );
  });

  it('has one row per field present in any of the three sheets', () => {
    fc.assert(
      fc.property(sheet, sheet, sheet, (base, theirs, mine) => {
        const keys = [...new Set([...Object.keys(base), ...Object.keys(theirs), ...Object.keys(mine)])].sort();
        expect(threeWayMerge(base, theirs, mine).map((row) => row.key)).toEqual(keys);
      }),
    );
  });
});

describe('applying a merge', () => {
  it('takes the original rear oil when the racer chooses theirs', () => {
    const mine = { 'shock.rear.oil': 450, 'gear.spur': 46 };
    const rows = threeWayMerge({ 'shock.rear.oil': 450 }, { 'shock.rear.oil': 500 }, mine);
    expect(applyMerge(mine, rows, { 'shock.rear.oil': 'theirs' })).toEqual({ 'shock.rear.oil': 500, 'gear.spur': 46 });
  });

  it('keeps the fork value of a theirs-only field when nothing is chosen', () => {
    const mine = { 'shock.rear.oil': 450 };
    const rows = threeWayMerge({ 'shock.rear.oil': 450 }, { 'shock.rear.oil': 500 }, mine);
    expect(applyMerge(mine, rows, {})).toEqual({ 'shock.rear.oil': 450 });
  });

  it('keeps the fork value of a conflict unless theirs is chosen', () => {
    const base = { 'diff.front.oil': 7000 };
    const theirs = { 'diff.front.oil': 10000 };
    const mine = { 'diff.front.oil': 5000 };
    const rows = threeWayMerge(base, theirs, mine);
    expect(applyMerge(mine, rows, {})).toEqual({ 'diff.front.oil': 5000 });
    expect(applyMerge(mine, rows, { 'diff.front.oil': 'mine' })).toEqual({ 'diff.front.oil': 5000 });
    expect(applyMerge(mine, rows, { 'diff.front.oil': 'theirs' })).toEqual({ 'diff.front.oil': 10000 });
  });

  it('removes a field the original emptied when theirs is chosen', () => {
    const mine = { 'diff.rear.type': 'gear', 'gear.spur': 46 };
    const rows = threeWayMerge({ 'diff.rear.type': 'gear' }, {}, mine);
    expect(applyMerge(mine, rows, { 'diff.rear.type': 'theirs' })).toEqual({ 'gear.spur': 46 });
  });

  it('ignores a theirs choice on a field only the fork changed', () => {
    const mine = { 'shock.front.oil': 350 };
    const rows = threeWayMerge({ 'shock.front.oil': 400 }, { 'shock.front.oil': 400 }, mine);
    expect(applyMerge(mine, rows, { 'shock.front.oil': 'theirs' })).toEqual({ 'shock.front.oil': 350 });
  });

  it('does not change the sheet it is given', () => {
    const mine = { 'shock.rear.oil': 450 };
    const rows = threeWayMerge({ 'shock.rear.oil': 450 }, { 'shock.rear.oil': 500 }, mine);
    applyMerge(mine, rows, { 'shock.rear.oil': 'theirs' });
    expect(mine).toEqual({ 'shock.rear.oil': 450 });
  });

  it('offers nothing when the original has not changed, and taking everything returns the fork', () => {
    fc.assert(
      fc.property(sheet, sheet, (base, mine) => {
        const rows = threeWayMerge(base, base, mine);
        expect(upstreamChanges(rows)).toEqual([]);
        expect(applyMerge(mine, rows, takeAll(rows.map((row) => row.key)))).toEqual({ ...mine });
      }),
    );
  });

  it('returns the original when the fork has not changed and everything is taken', () => {
    fc.assert(
      fc.property(sheet, sheet, (base, theirs) => {
        const rows = threeWayMerge(base, theirs, base);
        expect(applyMerge(base, rows, takeAll(rows.map((row) => row.key)))).toEqual({ ...theirs });
      }),
    );
  });

  it('keeping every field returns the fork unchanged', () => {
    fc.assert(
      fc.property(sheet, sheet, sheet, (base, theirs, mine) => {
        const rows = threeWayMerge(base, theirs, mine);
        expect(applyMerge(mine, rows, {})).toEqual({ ...mine });
      }),
    );
  });
});

describe('applying a diff', () => {
  it('sets changed fields and removes emptied ones', () => {
    const values: Record<string, Value> = { 'shock.rear.oil': 450, 'diff.rear.type': 'gear' };
    const changes = [
      { key: 'diff.rear.type', after: undefined },
      { key: 'gear.spur', after: 46 },
      { key: 'shock.rear.oil', after: 500 },
    ];
    expect(applyDiff(values, changes)).toEqual({ 'shock.rear.oil': 500, 'gear.spur': 46 });
    expect(values).toEqual({ 'shock.rear.oil': 450, 'diff.rear.type': 'gear' });
  });

  it('applying diffSetupValues(a, b) to a yields b', () => {
    fc.assert(
      fc.property(sheet, sheet, (a, b) => {
        expect(applyDiff(a, diffSetupValues(a, b))).toEqual({ ...b });
      }),
    );
  });
});
