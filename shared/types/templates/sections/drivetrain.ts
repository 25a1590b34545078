import { options, paired } from '../fieldBuilders';
import type { ClassProfile } from '../profile';
import type { Side, TemplateField, TemplateSection } from '../types';

const DIFF_OIL_HELP: Record<Side, string> = {
  front:
    'Oil in the front diff. Thicker oil pulls the car through corners on power; thinner oil gives more steering as you turn in off the throttle.',
  rear: 'Oil in the rear diff. Thicker oil gives more drive and stability out of corners; thinner oil lets the rear rotate and adds side grip.',
};

const diffNotes: TemplateField = {
  key: 'diff.notes',
  label: 'Diff notes',
  type: 'text',
  maxLength: 200,
  help: 'Anything the oil numbers do not say, such as diff type, number of planet gears or how full they are. Keep it short.',
};

const slipperBackoff: TemplateField = {
  key: 'slipper.backoff',
  label: 'Slipper back-off',
  type: 'number',
  unit: 'deg',
  // common practice, no source; from memory: a quarter to one turn back from fully tight.
  min: 0,
  max: 720,
  step: 15,
  plausible: { min: 30, max: 360 },
  help: 'How far the slipper nut is turned back from fully tight; a quarter turn is 90°. Loosen it for smoother power on slippery tracks; tighten it for harder drive on high grip.',
};

/** Four-wheel drive: front, centre and rear diffs, plus a slipper for 1/10 cars without a centre diff. */
export function differentialsSection(p: ClassProfile): TemplateSection | null {
  if (p.drive !== '4WD') return null;
  const fields: TemplateField[] = [
    ...paired('diff', 'oil', (side) => ({
      type: 'number',
      label: 'diff oil',
      unit: 'cSt',
      ...p.diffOil[side],
      help: DIFF_OIL_HELP[side],
    })),
    {
      key: 'diff.centre.oil',
      label: 'Centre diff oil',
      type: 'number',
      unit: 'cSt',
      ...p.diffOil.centre,
      help: 'Oil in the centre diff, which shares drive between the axles. Thicker oil sends more drive forward for pull and on-power steering; thinner oil is smoother on loose tracks.',
    },
    diffNotes,
  ];
  if (p.scale === '1/10') fields.push(slipperBackoff);
  return { key: 'differentials', label: 'Differentials', fields };
}

/** Two-wheel drive: one rear diff, a slipper clutch in front of it and the gearbox layout. */
export function rearDriveSection(p: ClassProfile): TemplateSection | null {
  if (p.drive !== '2WD') return null;
  return {
    key: 'rear-drive',
    label: 'Rear diff and slipper',
    fields: [
      {
        key: 'diff.rear.type',
        label: 'Rear diff type',
        type: 'choice',
        options: options(['gear', 'Gear diff (oil filled)'], ['ball', 'Ball diff']),
        help: 'Which kind of diff is fitted. A gear diff is tuned with oil and stays consistent; a ball diff is tuned by tightening and suits loose tracks.',
      },
      {
        key: 'diff.rear.oil',
        label: 'Rear diff oil',
        type: 'number',
        unit: 'cSt',
        ...p.rearDiffOil,
        help: 'Oil in a gear diff; leave it empty for a ball diff. Thicker oil gives more drive and stability out of corners; thinner oil lets the rear rotate.',
      },
      diffNotes,
      slipperBackoff,
      {
        key: 'slipper.pads',
        label: 'Slipper pads',
        type: 'choice',
        options: options(['single', 'Single pad'], ['dual', 'Dual pads']),
        help: 'One or two friction pads in the slipper. Dual pads hold more drive at the same setting; a single pad slips more easily and is smoother.',
      },
      {
        key: 'gearbox.layout',
        label: 'Gearbox layout',
        type: 'choice',
        options: options(
          ['rear-motor', 'Rear motor'],
          ['mid-motor-laydown', 'Mid motor, laydown gearbox'],
          ['mid-motor-standup', 'Mid motor, standup gearbox'],
        ),
        help: 'Where the motor sits and how the gearbox is built. Rear motor puts weight over the rear wheels for loose tracks; mid motor turns faster on high grip.',
      },
    ],
  };
}

export function gearingSection(p: ClassProfile): TemplateSection {
  const fields: TemplateField[] = [
    {
      key: 'gear.spur',
      label: 'Spur gear',
      type: 'integer',
      unit: 'teeth',
      ...p.spur,
      help: 'Teeth on the spur gear. More teeth give harder acceleration and less top speed; fewer teeth the opposite.',
    },
    p.power === 'nitro'
      ? {
          key: 'gear.clutch-bell',
          label: 'Clutch bell',
          type: 'integer',
          unit: 'teeth',
          ...p.drivePinion,
          help: 'Teeth on the clutch bell that drives the spur. More teeth raise top speed but soften acceleration; fewer teeth the opposite.',
        }
      : {
          key: 'gear.pinion',
          label: 'Pinion',
          type: 'integer',
          unit: 'teeth',
          ...p.drivePinion,
          help: 'Teeth on the motor pinion. More teeth raise top speed and motor heat; fewer teeth give punch and run cooler.',
        },
    {
      key: 'gear.module',
      label: 'Gear pitch',
      type: 'choice',
      options: p.gearModules,
      help: 'Tooth size of the spur and pinion; both gears must use the same one. It is usually printed on the spur gear.',
    },
  ];
  if (p.drive === '4WD') {
    fields.push(
      {
        key: 'gear.diff-ring',
        label: 'Diff ring gear',
        type: 'integer',
        unit: 'teeth',
        ...p.diffRing,
        help: 'Teeth on the ring gear inside the front and rear diffs. More teeth act like a bigger spur: more acceleration, less top speed.',
      },
      {
        key: 'gear.diff-pinion',
        label: 'Diff pinion',
        type: 'integer',
        unit: 'teeth',
        ...p.diffPinion,
        help: 'Teeth on the small gear that drives each diff ring. More teeth raise top speed; front and rear must match.',
      },
    );
  }
  return { key: 'gearing', label: 'Gearing', fields };
}
