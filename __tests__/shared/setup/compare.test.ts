import fc from 'fast-check';
import { compareSheets, computeSetupSummary, diffSetupValues, type SheetComparison } from '../../../shared/compute/setup';
import { getTemplate } from '../../../shared/types/templates';
import { VEHICLE_CLASSES, type VehicleClassKey } from '../../../shared/types/vehicleClasses';
import { validSheetFor } from '../templates/arbitraries';

type Values = Record<string, number | string | boolean>;

const CLASS_KEYS = VEHICLE_CLASSES.map((c) => c.key) as VehicleClassKey[];

/** A class and a valid partial sheet of it. */
const classSheet = fc.constantFrom(...CLASS_KEYS).chain((vehicleClass) =>
  validSheetFor(getTemplate(vehicleClass)).map((values) => ({ vehicleClass, values: values as Values })),
);

/** Two valid partial sheets of one class: the same car before and after some changes. */
const sameClassPair = fc.constantFrom(...CLASS_KEYS).chain((vehicleClass) => {
  const sheet = validSheetFor(getTemplate(vehicleClass)).map((values) => values as Values);
  return fc.tuple(sheet, sheet).map(([a, b]) => ({ a: { vehicleClass, values: a }, b: { vehicleClass, values: b } }));
});

function rows(result: SheetComparison) {
  return result.sections.flatMap((section) => section.rows);
}

// A typical 1/8 nitro race sheet and an electric one built from it (common practice, no source).
const NITRO = {
  'diff.front.oil': 7000,
  'diff.rear.oil': 3000,
  'gear.spur': 46,
  'gear.clutch-bell': 13,
  'gear.diff-ring': 43,
  'gear.diff-pinion': 10,
  'shock.rear.oil': 450,
  'engine.fuel-nitro': 25,
  'tire.rear.diameter': 110,
  'susp.rear.toe-block-fore': -1,
  'susp.rear.toe-block-aft': 2.75,
};
const ELECTRIC = {
  'diff.front.oil': 7000,
  'diff.rear.oil': 5000,
  'gear.spur': 46,
  'gear.pinion': 17,
  'gear.diff-ring': 43,
  'gear.diff-pinion': 10,
  'shock.rear.oil': 450,
  'motor.kv': 2000,
  'battery.voltage': 14.8,
  'tire.rear.diameter': 110,
  'susp.rear.toe-block-fore': -1,
  'susp.rear.toe-block-aft': 2.75,
};

describe('comparing two setup sheets', () => {
  it('marks only the fields whose values differ, in the sheet’s section order', () => {
    const result = compareSheets(
      { vehicleClass: 'buggy-1-8-nitro', values: { 'shock.rear.oil': 450, 'diff.front.oil': 7000, 'gear.spur': 46 } },
      { vehicleClass: 'buggy-1-8-nitro', values: { 'shock.rear.oil': 500, 'diff.front.oil': 7000, 'gear.spur': 46 } },
    );
    expect(result.sections.map((s) => s.title)).toEqual(['Differentials', 'Gearing', 'Shocks']);
    expect(result.sections[2].rows).toEqual([{ key: 'shock.rear.oil', label: 'Rear shock oil', a: 450, b: 500, changed: true }]);
    expect(rows(result).filter((r) => !r.changed).map((r) => r.key)).toEqual(['diff.front.oil', 'gear.spur']);
    expect(result.changedCount).toBe(1);
  });

  it('counts a value set on one side only as a change, with null for the empty side', () => {
    const result = compareSheets({ vehicleClass: 'buggy-1-10-2wd', values: {} }, { vehicleClass: 'buggy-1-10-2wd', values: { 'gear.spur': 87 } });
    expect(rows(result)).toEqual([{ key: 'gear.spur', label: 'Spur gear', a: null, b: 87, changed: true }]);
  });

  it('leaves out fields empty on both sides', () => {
    const result = compareSheets({ vehicleClass: 'buggy-1-8-nitro', values: { 'gear.spur': 46 } }, { vehicleClass: 'buggy-1-8-nitro', values: { 'gear.spur': 46 } });
    expect(rows(result).map((r) => r.key)).toEqual(['gear.spur']);
  });

  it('keeps a value under a key the sheet no longer has, in a section of its own', () => {
    const result = compareSheets({ vehicleClass: 'buggy-1-8-nitro', values: { 'retired.field': 3 } }, { vehicleClass: 'buggy-1-8-nitro', values: {} });
    expect(result.sections).toEqual([{ key: 'other', title: 'Not on the current sheet', rows: [{ key: 'retired.field', label: 'retired.field', a: 3, b: null, changed: true }] }]);
  });

  it('a 1/8 nitro buggy against a 1/8 electric buggy: shared fields compared, engine and motor apart (common practice, no source)', () => {
    const result = compareSheets({ vehicleClass: 'buggy-1-8-nitro', values: NITRO }, { vehicleClass: 'buggy-1-8-electric', values: ELECTRIC });
    expect(rows(result).filter((r) => r.changed)).toEqual([{ key: 'diff.rear.oil', label: 'Rear diff oil', a: 3000, b: 5000, changed: true }]);
    expect(result.changedCount).toBe(1);
    // The clutch bell and the pinion drive the same spur but are different fields of different sheets.
    expect(result.onlyInA).toEqual([
      { key: 'gear.clutch-bell', label: 'Clutch bell', section: 'Gearing', value: 13 },
      { key: 'engine.fuel-nitro', label: 'Fuel nitro content', section: 'Engine and clutch', value: 25 },
    ]);
    expect(result.onlyInB).toEqual([
      { key: 'gear.pinion', label: 'Pinion', section: 'Gearing', value: 17 },
      { key: 'motor.kv', label: 'Motor kV', section: 'Motor, speed controller and battery', value: 2000 },
      { key: 'battery.voltage', label: 'Battery voltage', section: 'Motor, speed controller and battery', value: 14.8 },
    ]);
  });

  it('takes the computed figures from summary.ts for each side’s own class', () => {
    const result = compareSheets({ vehicleClass: 'buggy-1-8-nitro', values: NITRO }, { vehicleClass: 'buggy-1-8-electric', values: ELECTRIC });
    const nitro = computeSetupSummary('buggy-1-8-nitro', NITRO);
    const electric = computeSetupSummary('buggy-1-8-electric', ELECTRIC);
    const byKey = Object.fromEntries(result.computed.map((row) => [row.key, row]));
    expect(byKey.finalDriveRatio).toMatchObject({ a: nitro.finalDriveRatio.value, b: electric.finalDriveRatio.value, changed: true, unit: 'ratio' });
    expect(byKey.rolloutMm).toMatchObject({ a: nitro.rolloutMm.value, b: electric.rolloutMm.value, changed: true, unit: 'mm' });
    // Same toe blocks on both sheets: the total is unchanged.
    expect(byKey.totalRearToeDeg).toMatchObject({ a: 1.75, b: 1.75, changed: false });
    expect(byKey.internalDiffRatio).toMatchObject({ changed: false });
    // Only the electric sheet has a top speed.
    expect(byKey.electricTopSpeedKmh).toMatchObject({ a: null, b: electric.electricTopSpeedKmh.value, changed: true });
  });

  it('treats one gear ratio reached by different teeth as unchanged (common practice, no source)', () => {
    const base = { 'gear.diff-ring': 43, 'gear.diff-pinion': 10 };
    const result = compareSheets(
      { vehicleClass: 'buggy-1-8-nitro', values: { ...base, 'gear.spur': 48, 'gear.clutch-bell': 12 } },
      { vehicleClass: 'buggy-1-8-nitro', values: { ...base, 'gear.spur': 52, 'gear.clutch-bell': 13 } },
    );
    expect(result.computed.find((row) => row.key === 'finalDriveRatio')).toMatchObject({ changed: false });
    expect(result.changedCount).toBe(2);
  });

  it('leaves out figures neither sheet can give', () => {
    const result = compareSheets({ vehicleClass: 'buggy-1-8-nitro', values: {} }, { vehicleClass: 'buggy-1-8-nitro', values: { 'gear.spur': 46 } });
    expect(result.computed).toEqual([]);
  });
});

describe('comparison properties', () => {
  it('a sheet compared with itself has no changes', () => {
    fc.assert(
      fc.property(classSheet, (sheet) => {
        const result = compareSheets(sheet, sheet);
        expect(result.changedCount).toBe(0);
        expect(rows(result).every((r) => !r.changed)).toBe(true);
        expect(result.computed.every((r) => !r.changed)).toBe(true);
        expect(result.onlyInA).toEqual([]);
        expect(result.onlyInB).toEqual([]);
      }),
    );
  });

  it('counts exactly the fields diffSetupValues finds, for two sheets of one class', () => {
    fc.assert(
      fc.property(sameClassPair, ({ a, b }) => {
        const result = compareSheets(a, b);
        const diff = diffSetupValues(a.values, b.values);
        expect(result.changedCount).toBe(diff.length);
        expect(rows(result).filter((r) => r.changed).map((r) => r.key).sort()).toEqual(diff.map((d) => d.key));
      }),
    );
  });

  it('swapping the sheets swaps the columns', () => {
    fc.assert(
      fc.property(classSheet, classSheet, (a, b) => {
        const ab = compareSheets(a, b);
        const ba = compareSheets(b, a);
        const swapped = (r: { a: unknown; b: unknown }) => ({ ...r, a: r.b, b: r.a });
        // Rows follow the first sheet's sections, so compare them by key.
        const byKey = (result: SheetComparison) => Object.fromEntries(rows(result).map((r) => [r.key, r]));
        const abRows = byKey(ab);
        expect(Object.fromEntries(Object.entries(byKey(ba)).map(([key, r]) => [key, swapped(r)]))).toEqual(abRows);
        expect(ba.onlyInA).toEqual(ab.onlyInB);
        expect(ba.onlyInB).toEqual(ab.onlyInA);
        expect(ba.computed).toEqual(ab.computed.map(swapped));
        expect(ba.changedCount).toBe(ab.changedCount);
        if (a.vehicleClass === b.vehicleClass) expect(ba.sections.map((s) => s.key)).toEqual(ab.sections.map((s) => s.key));
      }),
    );
  });

  it('shows every value of both sheets exactly once, as a row or as a field only one side has', () => {
    fc.assert(
      fc.property(classSheet, classSheet, (a, b) => {
        const result = compareSheets(a, b);
        const seenA = [...rows(result).filter((r) => r.a !== null).map((r) => r.key), ...result.onlyInA.map((f) => f.key)].sort();
        const seenB = [...rows(result).filter((r) => r.b !== null).map((r) => r.key), ...result.onlyInB.map((f) => f.key)].sort();
        expect(seenA).toEqual(Object.keys(a.values).sort());
        expect(seenB).toEqual(Object.keys(b.values).sort());
      }),
    );
  });
});
