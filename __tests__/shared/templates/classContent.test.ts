import {
  TEMPLATES,
  getTemplate,
  fieldsByKey,
  listFields,
  type SetupTemplate,
  type TemplateField,
} from '../../../shared/types/templates';
import { VEHICLE_CLASSES } from '../../../shared/types/vehicleClasses';

const keysOf = (template: SetupTemplate) => listFields(template).map((f) => f.key);

function field<T extends TemplateField['type']>(template: SetupTemplate, key: string, type: T) {
  const found = fieldsByKey(template).get(key);
  if (!found || found.type !== type) throw new Error(`${key} is not a ${type} field on ${template.label}`);
  return found as Extract<TemplateField, { type: T }>;
}

const nitro = VEHICLE_CLASSES.filter((c) => c.power === 'nitro').map((c) => getTemplate(c.key));
const electric = VEHICLE_CLASSES.filter((c) => c.power === 'electric').map((c) => getTemplate(c.key));

describe('the 1/8 nitro buggy sheet', () => {
  const template = getTemplate('buggy-1-8-nitro');

  it('covers what 1/8 racers tune, from diffs to the wing', () => {
    const expected = [
      'diff.front.oil', 'diff.centre.oil', 'diff.rear.oil', 'diff.notes',
      'gear.spur', 'gear.clutch-bell', 'gear.module', 'gear.diff-ring', 'gear.diff-pinion',
      'susp.front.arm-stiffness', 'susp.front.ride-height', 'susp.front.droop', 'susp.front.camber',
      'susp.front.toe', 'susp.front.caster', 'susp.front.kick-up', 'susp.front.ackermann',
      'susp.front.camber-link-inner', 'susp.front.camber-link-outer',
      'susp.front.camber-link-inner-shim', 'susp.front.camber-link-outer-shim',
      'susp.front.hub-height-shim', 'susp.front.arm-shim-fore', 'susp.front.arm-shim-aft',
      'susp.front.sway-bar', 'susp.front.bump-steer-shim',
      'susp.rear.ride-height', 'susp.rear.droop', 'susp.rear.camber', 'susp.rear.toe-block-fore',
      'susp.rear.toe-block-aft', 'susp.rear.hub-toe', 'susp.rear.anti-squat',
      'susp.rear.camber-link-inner', 'susp.rear.camber-link-outer', 'susp.rear.wheelbase-shim',
      'susp.rear.hub-width', 'susp.rear.sway-bar', 'susp.rear.axle-height',
      'shock.front.oil', 'shock.rear.oil', 'shock.front.piston-holes', 'shock.front.piston-hole-size',
      'shock.front.spring', 'shock.rear.spring', 'shock.front.spring-label', 'shock.front.tower-hole',
      'shock.front.arm-hole', 'shock.front.length', 'shock.front.limiter', 'shock.rear.volume-compensation',
      'chassis.front-brace', 'chassis.centre-brace', 'chassis.rear-brace', 'chassis.stiffener',
      'chassis.weight', 'chassis.ballast', 'brakes.bias',
      'engine.size', 'engine.exhaust', 'engine.glow-plug', 'engine.fuel-nitro',
      'clutch.shoes', 'clutch.springs', 'clutch.gap',
      'electronics.steering-servo', 'electronics.throttle-servo', 'electronics.rx-battery', 'electronics.rx-voltage',
      'tire.front.compound', 'tire.rear.tread', 'tire.front.insert', 'tire.rear.diameter', 'tire.front.wheel-offset',
      'body.style', 'body.cutouts', 'wing.angle', 'wing.position', 'wing.mount-height',
    ];
    expect(expected.filter((key) => !fieldsByKey(template).has(key))).toEqual([]);
  });

  it('stores oils in cSt, springs in N/mm, toe angles signed in degrees and bias in %', () => {
    expect(field(template, 'shock.rear.oil', 'number')).toMatchObject({ unit: 'cSt', min: 100, max: 2000 });
    expect(field(template, 'diff.centre.oil', 'number').unit).toBe('cSt');
    expect(field(template, 'shock.rear.spring', 'number').unit).toBe('N/mm');
    expect(field(template, 'susp.rear.toe-block-fore', 'number')).toMatchObject({ unit: 'deg', min: -5 });
    expect(field(template, 'brakes.bias', 'number')).toMatchObject({ unit: '%', min: 0, max: 100 });
  });

  it('describes glow plugs and tire compounds only in generic words', () => {
    expect(field(template, 'engine.glow-plug', 'choice').options.map((o) => o.value)).toEqual(['hot', 'medium', 'cold']);
    expect(field(template, 'tire.front.compound', 'choice').options.map((o) => o.label)).toEqual([
      'Super soft', 'Soft', 'Medium', 'Hard',
    ]);
    expect(field(template, 'tire.rear.tread', 'choice').options.map((o) => o.value)).toEqual([
      'fine-pin', 'small-pin', 'small-block', 'large-block', 'bar', 'spike', 'slick-ish',
    ]);
  });

  it('offers 1/8 gear modules', () => {
    expect(field(template, 'gear.module', 'choice').options.map((o) => o.value)).toContain('module-1');
  });
});

describe('nitro and electric sheets', () => {
  it.each(electric.map((t) => [t.label, t] as const))('%s has no glow plug, clutch bell or brake bias', (_l, t) => {
    const keys = keysOf(t);
    expect(keys.filter((k) => k.includes('glow') || k.startsWith('clutch.') || k.startsWith('engine.'))).toEqual([]);
    expect(keys).not.toContain('gear.clutch-bell');
    expect(keys).not.toContain('brakes.bias');
  });

  it.each(electric.map((t) => [t.label, t] as const))('%s has motor kV, pinion, speed controller and battery', (_l, t) => {
    expect(keysOf(t)).toEqual(
      expect.arrayContaining(['motor.kv', 'gear.pinion', 'esc.timing-boost', 'esc.punch', 'battery.cells', 'battery.voltage']),
    );
    expect(field(t, 'motor.kv', 'number').unit).toBe('kV');
  });

  it.each(nitro.map((t) => [t.label, t] as const))('%s has no motor kV, pinion or battery cells', (_l, t) => {
    const keys = keysOf(t);
    expect(keys.filter((k) => k.startsWith('motor.') || k.startsWith('esc.') || k.startsWith('battery.'))).toEqual([]);
    expect(keys).not.toContain('gear.pinion');
    expect(keys).toContain('gear.clutch-bell');
  });
});

describe('the 1/10 2WD buggy sheet', () => {
  const template = getTemplate('buggy-1-10-2wd');
  const keys = keysOf(template);

  it('has no front or centre diff and no diff ring gears', () => {
    expect(keys.filter((k) => k.startsWith('diff.front') || k.startsWith('diff.centre'))).toEqual([]);
    expect(keys).not.toContain('gear.diff-ring');
  });

  it('has a rear diff, a slipper clutch and a gearbox layout choice', () => {
    expect(field(template, 'diff.rear.type', 'choice').options.map((o) => o.value)).toEqual(['gear', 'ball']);
    expect(field(template, 'diff.rear.oil', 'number').unit).toBe('cSt');
    expect(field(template, 'slipper.backoff', 'number')).toMatchObject({ unit: 'deg', min: 0, max: 720 });
    expect(keys).toContain('slipper.pads');
    expect(field(template, 'gearbox.layout', 'choice').options.map((o) => o.value)).toEqual([
      'rear-motor', 'mid-motor-laydown', 'mid-motor-standup',
    ]);
  });
});

describe('class differences', () => {
  const plausible = (t: SetupTemplate, key: string) => field(t, key, 'number').plausible;

  it('expects 1/10 cars to sit at about 18–24 mm', () => {
    for (const key of ['buggy-1-10-4wd', 'buggy-1-10-2wd'] as const) {
      expect(plausible(getTemplate(key), 'susp.front.ride-height')).toEqual({ min: 18, max: 25 });
    }
  });

  it('offers 48 pitch and module 0.6 on 1/10 cars, module 1 on 1/8 cars', () => {
    const modules = (t: SetupTemplate) => field(t, 'gear.module', 'choice').options.map((o) => o.value);
    expect(modules(TEMPLATES['buggy-1-10-4wd'])).toEqual(expect.arrayContaining(['48dp', 'module-0.6']));
    expect(modules(TEMPLATES['buggy-1-10-2wd'])).not.toContain('module-1');
    expect(modules(TEMPLATES['truggy-1-8-electric'])).toContain('module-1');
  });

  it('gives truggies bigger tires, taller ride heights and heavier oils than buggies', () => {
    const buggy = getTemplate('buggy-1-8-nitro');
    const truggy = getTemplate('truggy-1-8-nitro');
    expect(plausible(truggy, 'tire.front.diameter')!.min).toBeGreaterThan(plausible(buggy, 'tire.front.diameter')!.max);
    expect(plausible(truggy, 'susp.rear.ride-height')!.max).toBeGreaterThan(plausible(buggy, 'susp.rear.ride-height')!.max);
    expect(plausible(truggy, 'shock.front.oil')!.max).toBeGreaterThan(plausible(buggy, 'shock.front.oil')!.max);
    expect(plausible(truggy, 'diff.centre.oil')!.max).toBeGreaterThan(plausible(buggy, 'diff.centre.oil')!.max);
  });

  it('expects lighter shock oil on 1/10 cars than on 1/8 cars', () => {
    const tenth = plausible(getTemplate('buggy-1-10-4wd'), 'shock.rear.oil')!;
    const eighth = plausible(getTemplate('buggy-1-8-electric'), 'shock.rear.oil')!;
    expect(tenth.max).toBeLessThan(eighth.max);
    expect(tenth.min).toBeLessThan(eighth.min);
  });
});
