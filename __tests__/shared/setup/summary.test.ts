import fc from 'fast-check';
import { computeSetupSummary, diffSetupValues } from '../../../shared/compute/setup';

describe('setup summary figures', () => {
  // Common practice, no source: 46/13 spur and bell with a 43/10 diff is a typical 1/8 nitro gearing.
  it('computes gear ratio, diff ratio, final drive and rollout from a 1/8 nitro sheet', () => {
    const s = computeSetupSummary('buggy-1-8-nitro', {
      'gear.spur': 46,
      'gear.clutch-bell': 13,
      'gear.diff-ring': 43,
      'gear.diff-pinion': 10,
      'tire.rear.diameter': 110,
    });
    expect(s.gearRatio.value).toBeCloseTo(46 / 13, 12);
    expect(s.internalDiffRatio.value).toBeCloseTo(4.3, 12);
    expect(s.finalDriveRatio.value).toBeCloseTo((46 / 13) * 4.3, 12);
    // Rollout = π·d / FDR (circumference per engine turn).
    expect(s.rolloutMm.value).toBeCloseTo((Math.PI * 110) / ((46 / 13) * 4.3), 9);
    expect(s.electricTopSpeedKmh.value).toBeNull();
  });

  it('reads the pinion on electric sheets and gives a no-load top speed from kV × volts', () => {
    const s = computeSetupSummary('buggy-1-8-electric', {
      'gear.spur': 46,
      'gear.pinion': 17,
      'gear.diff-ring': 43,
      'gear.diff-pinion': 10,
      'tire.rear.diameter': 110,
      'motor.kv': 2000,
      'battery.voltage': 14.8,
    });
    const rollout = (Math.PI * 110) / ((46 / 17) * 4.3);
    // km/h = mm/rev × rev/min × 60 min/h ÷ 1e6 mm/km
    expect(s.electricTopSpeedKmh.value).toBeCloseTo((rollout * 2000 * 14.8 * 60) / 1e6, 9);
  });

  it('rear toe adds the two hinge-pin blocks and the hub (common practice, no source: −1° and 2.75° give 1.75°)', () => {
    const s = computeSetupSummary('buggy-1-8-nitro', { 'susp.rear.toe-block-fore': -1, 'susp.rear.toe-block-aft': 2.75 });
    expect(s.totalRearToeDeg.value).toBeCloseTo(1.75, 12);
  });

  it('asks for the clutch bell on nitro sheets and the pinion on electric ones', () => {
    expect(computeSetupSummary('buggy-1-8-nitro', { 'gear.spur': 46 }).gearRatio.missing).toEqual(['gear.clutch-bell']);
    expect(computeSetupSummary('truggy-1-8-electric', { 'gear.spur': 46 }).gearRatio.missing).toEqual(['gear.pinion']);
  });

  it('names what is missing instead of guessing', () => {
    const s = computeSetupSummary('buggy-1-10-2wd', { 'gear.spur': 84 });
    expect(s.gearRatio).toEqual({ value: null, missing: ['gear.pinion'] });
    expect(s.finalDriveRatio.value).toBeNull();
    expect(s.rolloutMm.missing).toContain('tire.rear.diameter');
  });

  it('final drive scales linearly with the spur (property)', () => {
    fc.assert(
      fc.property(fc.integer({ min: 20, max: 120 }), fc.integer({ min: 8, max: 30 }), fc.integer({ min: 2, max: 5 }), (spur, pinion, k) => {
        const base = { 'gear.clutch-bell': pinion, 'gear.diff-ring': 43, 'gear.diff-pinion': 10 };
        const a = computeSetupSummary('buggy-1-8-nitro', { ...base, 'gear.spur': spur }).finalDriveRatio.value!;
        const b = computeSetupSummary('buggy-1-8-nitro', { ...base, 'gear.spur': spur * k }).finalDriveRatio.value!;
        expect(b / a).toBeCloseTo(k, 9);
      }),
    );
  });
});

describe('diffSetupValues', () => {
  it('lists changed, added and removed fields in key order', () => {
    expect(diffSetupValues({ a: 1, b: 'x', c: true }, { a: 2, b: 'x', d: false })).toEqual([
      { key: 'a', before: 1, after: 2 },
      { key: 'c', before: true, after: undefined },
      { key: 'd', before: undefined, after: false },
    ]);
  });

  it('is empty exactly when the sheets are equal (property)', () => {
    const values = fc.dictionary(fc.constantFrom('a', 'b', 'c', 'd'), fc.oneof(fc.integer(), fc.boolean(), fc.string()));
    fc.assert(
      fc.property(values, values, (x, y) => {
        const same = JSON.stringify(Object.entries(x).sort()) === JSON.stringify(Object.entries(y).sort());
        expect(diffSetupValues(x, y).length === 0).toBe(same);
      }),
    );
  });
});
