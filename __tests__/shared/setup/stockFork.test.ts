import fc from 'fast-check';
import { applyStockFork, forkCompatible, planStockFork, type StockForkPlan } from '../../../shared/compute/setup/stockFork';
import type { StockChoice } from '../../../shared/types/forks';
import {
  getTemplate,
  listFields,
  validateSetupValues,
  type SetupFieldValue,
  type TemplateField,
} from '../../../shared/types/templates';
import { VEHICLE_CLASSES, type VehicleClassKey } from '../../../shared/types/vehicleClasses';
import { validValueFor } from '../templates/arbitraries';

type Values = Record<string, SetupFieldValue>;

/** A neutral full sheet for the class (text fields left empty, as kits' stock sheets are), with overrides. */
function stockSheet(vehicleClass: VehicleClassKey, overrides: Values = {}): Values {
  const neutral = (field: TemplateField): SetupFieldValue | undefined => {
    switch (field.type) {
      case 'number':
      case 'integer':
      case 'position':
        return field.min;
      case 'choice':
        return field.options[0].value;
      case 'boolean':
        return false;
      case 'text':
        return undefined;
    }
  };
  const entries = listFields(getTemplate(vehicleClass)).flatMap((f) => {
    const v = neutral(f);
    return v === undefined ? [] : [[f.key, v] as const];
  });
  return { ...Object.fromEntries(entries), ...overrides };
}

/** Every option of every choice field is in the box, except the option parts named. */
function inBoxFor(vehicleClass: VehicleClassKey, optionParts: Record<string, string[]> = {}): Record<string, string[]> {
  return Object.fromEntries(
    listFields(getTemplate(vehicleClass)).flatMap((f) =>
      f.type === 'choice' ? [[f.key, f.options.map((o) => o.value).filter((o) => !(optionParts[f.key] ?? []).includes(o))]] : [],
    ),
  );
}

const keysOf = (rows: ReadonlyArray<{ key: string }>) => rows.map((row) => row.key);

describe('forkCompatible', () => {
  // common practice, no source: 1/8 parts and numbers carry over between 1/8 classes, never to 1/10.
  it.each([
    ['buggy-1-8-nitro', 'buggy-1-8-electric', true],
    ['buggy-1-8-electric', 'truggy-1-8-nitro', true],
    ['truggy-1-8-electric', 'buggy-1-8-nitro', true],
    ['buggy-1-10-4wd', 'buggy-1-10-2wd', true],
    ['buggy-1-10-2wd', 'buggy-1-10-2wd', true],
    ['buggy-1-8-nitro', 'buggy-1-10-4wd', false],
    ['buggy-1-10-2wd', 'truggy-1-8-electric', false],
  ] as const)('%s onto %s: %s', (source, target, expected) => {
    expect(forkCompatible(source, target)).toBe(expected);
    expect(forkCompatible(target, source)).toBe(expected);
  });

  it('accepts every class onto itself and agrees with the scale of each class', () => {
    for (const a of VEHICLE_CLASSES) {
      for (const b of VEHICLE_CLASSES) expect(forkCompatible(a.key, b.key)).toBe(a.scale === b.scale);
    }
  });
});

describe('planning a fork onto a car (examples on the real sheets)', () => {
  it('drops the engine fields and fills the motor fields from stock, nitro buggy onto electric buggy', () => {
    // common practice, no source: a nitro sheet's engine settings mean nothing on an electric car.
    const source = stockSheet('buggy-1-8-nitro', { 'electronics.throttle-servo': 'fast metal gear' });
    const stock = stockSheet('buggy-1-8-electric', { 'motor.kv': 2000, 'gear.pinion': 17 });
    const plan = planStockFork({
      sourceClass: 'buggy-1-8-nitro',
      sourceValues: source,
      targetClass: 'buggy-1-8-electric',
      targetStock: { values: stock, inBox: inBoxFor('buggy-1-8-electric') },
      checkOptionParts: true,
    });
    expect(keysOf(plan.dropped)).toEqual([
      'gear.clutch-bell',
      'brakes.bias',
      'engine.size',
      'engine.exhaust',
      'engine.manifold-length',
      'engine.glow-plug',
      'engine.fuel-nitro',
      'engine.head-shim',
      'engine.target-temp',
      'clutch.shoes',
      'clutch.springs',
      'clutch.gap',
      'electronics.throttle-servo',
      'electronics.rx-battery',
      'electronics.rx-voltage',
    ]);
    expect(plan.dropped[2]).toEqual({ key: 'engine.size', label: 'Engine size', section: 'Engine and clutch', value: '3.5cc' });
    expect(keysOf(plan.filledFromStock)).toEqual([
      'gear.pinion',
      'motor.kv',
      'motor.timing',
      'esc.timing-boost',
      'esc.punch',
      'esc.brake',
      'esc.drag-brake',
      'battery.cells',
      'battery.voltage',
      'motor.max-temp',
      'electronics.bec-voltage',
    ]);
    expect(plan.filledFromStock[1]).toEqual({ key: 'motor.kv', label: 'Motor kV', section: 'Motor, speed controller and battery', value: null, stockValue: 2000 });
    expect(plan.optionParts).toEqual([]);

    const values = applyStockFork(plan, source, stock, {});
    expect(values['motor.kv']).toBe(2000);
    expect(values['gear.pinion']).toBe(17);
    expect(Object.keys(values).some((key) => key.startsWith('engine.'))).toBe(false);
    expect(values['shock.rear.oil']).toBe(source['shock.rear.oil']);
    expect(validateSetupValues(getTemplate('buggy-1-8-electric'), values).ok).toBe(true);
  });

  it('fills from stock a value the target sheet cannot hold: a truggy ride height above the buggy limit, a number sent as text', () => {
    // The 1/8 buggy sheet stops ride height at 100 mm; 110 mm is a truggy number.
    const source = stockSheet('truggy-1-8-nitro', { 'susp.front.ride-height': 110, 'gear.spur': '46' });
    const stock = stockSheet('buggy-1-8-nitro', { 'susp.front.ride-height': 26, 'gear.spur': 46 });
    const plan = planStockFork({
      sourceClass: 'truggy-1-8-nitro',
      sourceValues: source,
      targetClass: 'buggy-1-8-nitro',
      targetStock: { values: stock, inBox: inBoxFor('buggy-1-8-nitro') },
      checkOptionParts: false,
    });
    expect(plan.filledFromStock).toEqual([
      { key: 'gear.spur', label: 'Spur gear', section: 'Gearing', value: '46', stockValue: 46 },
      { key: 'susp.front.ride-height', label: 'Front ride height', section: 'Suspension, front and rear', value: 110, stockValue: 26 },
    ]);
    expect(plan.dropped).toEqual([]);
    const values = applyStockFork(plan, source, stock, {});
    expect(values['susp.front.ride-height']).toBe(26);
    expect(values['gear.spur']).toBe(46);
  });

  it('flags exactly the option parts a stock car lacks, each beside its stock value', () => {
    // common practice, no source: a stiff brace the kit does not ship with is an option part.
    const source = stockSheet('buggy-1-8-nitro', { 'chassis.front-brace': 'stiff', 'chassis.centre-brace': 'standard', 'chassis.rear-brace': 'stiff' });
    const stock = stockSheet('buggy-1-8-nitro');
    const inBox = inBoxFor('buggy-1-8-nitro', { 'chassis.front-brace': ['stiff'], 'chassis.rear-brace': ['stiff'] });
    const plan = planStockFork({ sourceClass: 'buggy-1-8-nitro', sourceValues: source, targetClass: 'buggy-1-8-nitro', targetStock: { values: stock, inBox }, checkOptionParts: true });
    expect(plan.optionParts).toEqual([
      { key: 'chassis.front-brace', label: 'Front chassis brace', section: 'Chassis', value: 'stiff', stockValue: 'none' },
      { key: 'chassis.rear-brace', label: 'Rear chassis brace', section: 'Chassis', value: 'stiff', stockValue: 'none' },
    ]);
    expect(plan.dropped).toEqual([]);
    expect(plan.filledFromStock).toEqual([]);

    const values = applyStockFork(plan, source, stock, { 'chassis.front-brace': 'stock' });
    expect(values['chassis.front-brace']).toBe('none');
    expect(values['chassis.rear-brace']).toBe('stiff');
    expect(values['chassis.centre-brace']).toBe('standard');
  });

  it('flags no option parts when the check does not run (same kit, car not marked stock)', () => {
    // common practice, no source: a racer on the same kit who did not mark the car stock owns the parts.
    const source = stockSheet('buggy-1-8-nitro', { 'chassis.front-brace': 'stiff' });
    const inBox = inBoxFor('buggy-1-8-nitro', { 'chassis.front-brace': ['stiff'] });
    const plan = planStockFork({ sourceClass: 'buggy-1-8-nitro', sourceValues: source, targetClass: 'buggy-1-8-nitro', targetStock: { values: source, inBox }, checkOptionParts: false });
    expect(plan).toEqual({ optionParts: [], dropped: [], filledFromStock: [] });
    expect(applyStockFork(plan, source, source, {})).toEqual(source);
  });

  it('does not flag a choice the kit record says nothing about, nor the stock value itself', () => {
    const source = stockSheet('buggy-1-8-nitro', { 'chassis.front-brace': 'stiff', 'chassis.rear-brace': 'none' });
    const plan = planStockFork({
      sourceClass: 'buggy-1-8-nitro',
      sourceValues: source,
      targetClass: 'buggy-1-8-nitro',
      // No list for the front brace; the rear list forgot the stock option.
      targetStock: { values: stockSheet('buggy-1-8-nitro'), inBox: { 'chassis.rear-brace': ['standard'] } },
      checkOptionParts: true,
    });
    expect(plan.optionParts).toEqual([]);
  });

  it('leaves out a value the target cannot hold when the kit has no stock value for it', () => {
    const source = { 'susp.front.ride-height': 110, 'gear.spur': 48 };
    const plan = planStockFork({
      sourceClass: 'truggy-1-8-nitro',
      sourceValues: source,
      targetClass: 'buggy-1-8-nitro',
      targetStock: { values: {}, inBox: {} },
      checkOptionParts: true,
    });
    expect(plan.filledFromStock).toEqual([]);
    expect(plan.dropped).toEqual([{ key: 'susp.front.ride-height', label: 'Front ride height', section: 'Suspension, front and rear', value: 110 }]);
    expect(applyStockFork(plan, source, {}, {})).toEqual({ 'gear.spur': 48 });
  });

  it('treats fields called "constructor" and "__proto__" as ordinary keys', () => {
    const source = Object.fromEntries<SetupFieldValue>([
      ['constructor', 1],
      ['__proto__', 'x'],
      ['gear.spur', 46],
    ]);
    const stock = stockSheet('buggy-1-8-nitro');
    const plan = planStockFork({ sourceClass: 'buggy-1-8-nitro', sourceValues: source, targetClass: 'buggy-1-8-nitro', targetStock: { values: stock, inBox: {} }, checkOptionParts: true });
    expect(keysOf(plan.dropped)).toEqual(['__proto__', 'constructor']);
    expect(plan.dropped[0]).toEqual({ key: '__proto__', label: '__proto__', section: 'Not on the sheet', value: 'x' });
    const values = applyStockFork(plan, source, stock, Object.fromEntries<StockChoice>([['__proto__', 'stock']]));
    expect(Object.hasOwn(values, 'constructor')).toBe(false);
    expect(Object.hasOwn(values, '__proto__')).toBe(false);
    expect(Object.getPrototypeOf(values)).toBe(Object.prototype);
    expect(values['gear.spur']).toBe(46);
  });
});

// ---- Properties ----

const PAIRS = VEHICLE_CLASSES.flatMap((a) => VEHICLE_CLASSES.filter((b) => a.scale === b.scale).map((b) => [a.key, b.key] as const));

/** A full stock sheet (every field, text included) and, per choice field, any options in the box. */
function kitFor(vehicleClass: VehicleClassKey) {
  const fields = listFields(getTemplate(vehicleClass));
  const values = fc.record(Object.fromEntries(fields.map((f) => [f.key, validValueFor(f)])));
  const inBox = fc.record(
    Object.fromEntries(fields.flatMap((f) => (f.type === 'choice' ? [[f.key, fc.subarray(f.options.map((o) => o.value))]] : []))),
    { requiredKeys: [] },
  ).map((lists) => lists as Record<string, string[]>);
  return fc.record({ values, inBox });
}

/** Valid values of the source sheet, mixed with what an old or hand-edited sheet may hold. */
function sourceFor(vehicleClass: VehicleClassKey) {
  const fields = listFields(getTemplate(vehicleClass));
  const valid = fc.record(Object.fromEntries(fields.map((f) => [f.key, validValueFor(f)])), { requiredKeys: [] });
  const junkKey = fc.constantFrom('constructor', '__proto__', 'toString', 'not.a.field', 'engine.size', 'motor.kv', 'gear.spur', 'susp.front.ride-height', 'chassis.front-brace');
  const junkValue = fc.oneof(fc.integer({ min: -1000, max: 100_000 }), fc.double(), fc.boolean(), fc.string({ maxLength: 80 }));
  const junk = fc.array(fc.tuple(junkKey, junkValue), { maxLength: 4 });
  return fc.tuple(valid, junk).map(([v, j]) => Object.fromEntries<SetupFieldValue>([...Object.entries(v) as Array<[string, SetupFieldValue]>, ...j]));
}

const scenario = fc
  .constantFrom(...PAIRS)
  .chain(([sourceClass, targetClass]) =>
    fc.record({
      sourceClass: fc.constant(sourceClass),
      targetClass: fc.constant(targetClass),
      sourceValues: sourceFor(sourceClass),
      targetStock: kitFor(targetClass),
      checkOptionParts: fc.boolean(),
      stockPicks: fc.array(fc.boolean(), { maxLength: 40 }),
    }),
  );

function choose(plan: StockForkPlan, pick: (i: number) => boolean): Record<string, StockChoice> {
  return Object.fromEntries(plan.optionParts.map((row, i) => [row.key, pick(i) ? 'stock' : 'keep'] as const));
}

describe('stock fork properties', () => {
  it('holds every field of the target sheet, valid for the target class, and none of the dropped ones', () => {
    fc.assert(
      fc.property(scenario, ({ stockPicks, ...input }) => {
        const plan = planStockFork(input);
        const values = applyStockFork(plan, input.sourceValues, input.targetStock.values, choose(plan, (i) => stockPicks[i] ?? false));
        for (const field of listFields(getTemplate(input.targetClass))) expect(Object.hasOwn(values, field.key)).toBe(true);
        expect(validateSetupValues(getTemplate(input.targetClass), values).ok).toBe(true);
        for (const row of plan.dropped) expect(Object.hasOwn(values, row.key)).toBe(false);
      }),
      { numRuns: 150 },
    );
  });

  it('keeps every option-part value when the racer keeps them all', () => {
    fc.assert(
      fc.property(scenario, ({ stockPicks: _picks, ...input }) => {
        const plan = planStockFork({ ...input, checkOptionParts: true });
        const values = applyStockFork(plan, input.sourceValues, input.targetStock.values, choose(plan, () => false));
        for (const row of plan.optionParts) expect(values[row.key]).toBe(row.value);
        expect(applyStockFork(plan, input.sourceValues, input.targetStock.values, {})).toEqual(values);
      }),
      { numRuns: 150 },
    );
  });

  it('leaves no option part to flag once the racer takes the stock value for all of them', () => {
    fc.assert(
      fc.property(scenario, ({ stockPicks: _picks, ...input }) => {
        const plan = planStockFork({ ...input, checkOptionParts: true });
        const values = applyStockFork(plan, input.sourceValues, input.targetStock.values, choose(plan, () => true));
        const again = planStockFork({ ...input, sourceClass: input.targetClass, sourceValues: values, checkOptionParts: true });
        expect(again.optionParts).toEqual([]);
        expect(again.dropped).toEqual([]);
        expect(again.filledFromStock).toEqual([]);
      }),
      { numRuns: 150 },
    );
  });

  it('lists each field at most once, in the order of the target sheet', () => {
    fc.assert(
      fc.property(scenario, ({ stockPicks: _picks, ...input }) => {
        const plan = planStockFork(input);
        const order = new Map(listFields(getTemplate(input.targetClass)).map((f, i) => [f.key, i]));
        for (const rows of [plan.optionParts, plan.filledFromStock]) {
          const positions = rows.map((row) => order.get(row.key)!);
          expect(positions).toEqual([...positions].sort((a, b) => a - b));
        }
        const all = [...keysOf(plan.optionParts), ...keysOf(plan.filledFromStock), ...keysOf(plan.dropped)];
        expect(new Set(all).size).toBe(all.length);
      }),
      { numRuns: 100 },
    );
  });
});
