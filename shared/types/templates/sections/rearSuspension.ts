import type { TemplateField, TemplateSection } from '../types';

// Angles and offsets below are common practice, no source; from memory. They are the same across
// classes because they measure geometry, not size.

const toeAngle = (plausibleMin: number, plausibleMax: number) => ({
  type: 'number' as const,
  unit: 'deg' as const,
  min: -5,
  max: 8,
  step: 0.5,
  plausible: { min: plausibleMin, max: plausibleMax },
});

const offset = (limit: number) => ({
  type: 'number' as const,
  unit: 'mm' as const,
  min: -limit,
  max: limit,
  step: 0.5,
});

const REAR_FIELDS: TemplateField[] = [
  {
    key: 'susp.rear.toe-block-fore',
    label: 'Rear toe, front hinge-pin block',
    ...toeAngle(-1, 4),
    help: 'Toe set by the hinge-pin block ahead of the rear arms; positive is toe-in. More toe-in gives rear grip and stability; less lets the car rotate.',
  },
  {
    key: 'susp.rear.toe-block-aft',
    label: 'Rear toe, rear hinge-pin block',
    ...toeAngle(-1, 4),
    help: 'Toe set by the hinge-pin block behind the rear arms; positive is toe-in and adds to the front block. More toe-in steadies the car; less frees it up.',
  },
  {
    key: 'susp.rear.hub-toe',
    label: 'Rear hub toe',
    ...toeAngle(0, 3),
    help: 'Toe built into the rear hubs; positive is toe-in and adds to the blocks. More toe-in gives stability on power; less lets the rear rotate.',
  },
  {
    key: 'susp.rear.anti-squat',
    label: 'Anti-squat',
    type: 'number',
    unit: 'deg',
    min: -3,
    max: 8,
    step: 0.5,
    plausible: { min: 0, max: 4 },
    help: 'Upward tilt of the rear hinge pins towards the back of the car. More anti-squat gives more drive on smooth tracks; less lets the rear soak up bumps and grip on rough ones.',
  },
  {
    key: 'susp.rear.wheelbase-shim',
    label: 'Rear hub shims, ahead of the hub',
    type: 'number',
    unit: 'mm',
    min: 0,
    max: 8,
    step: 0.5,
    help: 'Shims ahead of the rear hub on its pin, which set the wheelbase. More shims push the hub back for a longer, steadier car; fewer shorten it for quicker turning.',
  },
  {
    key: 'susp.rear.hub-width',
    label: 'Rear hub width',
    ...offset(5),
    help: 'Extra width per side at the rear hubs compared with the standard parts; negative is narrower. A wider rear gives more steering; a narrower rear gives more rear side grip.',
  },
  {
    key: 'susp.rear.axle-height',
    label: 'Rear axle height',
    ...offset(4),
    help: 'Height of the axle in the rear hub compared with the standard position; negative is lower. A lower axle usually adds rear grip; a higher axle frees the car to turn.',
  },
];

export function rearSuspensionSection(): TemplateSection {
  return { key: 'rear-suspension', label: 'Rear suspension', fields: REAR_FIELDS };
}
