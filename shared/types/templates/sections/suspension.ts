import { paired, STIFFNESS_OPTIONS } from '../fieldBuilders';
import type { ClassProfile } from '../profile';
import type { TemplateSection } from '../types';

/**
 * Settings both axles have, kept in one section as front/rear pairs so the editor can put the two
 * ends side by side; settings only one axle has live in the front and rear sections.
 */
export function suspensionPairsSection(p: ClassProfile): TemplateSection {
  return {
    key: 'suspension',
    label: 'Suspension, front and rear',
    fields: [
      ...paired('susp', 'ride-height', () => ({
        type: 'number',
        label: 'ride height',
        unit: 'mm',
        ...p.rideHeight,
        help: 'Height of the chassis above a flat board with the car ready to race, measured at this end. Lower is more stable and responsive on smooth tracks; higher clears bumps and jump landings.',
      })),
      ...paired('susp', 'droop', () => ({
        type: 'number',
        label: 'droop',
        unit: 'mm',
        ...p.droop,
        help: 'How far the wheel can drop below ride height, measured at the hub. More droop adds grip and soaks up rough tracks; less droop makes the car react faster on smooth ones.',
      })),
      ...paired('susp', 'camber', () => ({
        type: 'number',
        label: 'camber',
        unit: 'deg',
        // common practice, no source; from memory: racers run about -3° to 0°.
        min: -10,
        max: 10,
        step: 0.5,
        plausible: { min: -4, max: 1 },
        help: 'Tilt of the wheel seen from the end of the car; negative means the top leans in. More negative camber adds side grip in long corners; nearer zero gives more straight-line traction.',
      })),
      ...paired('susp', 'sway-bar', () => ({
        type: 'number',
        label: 'sway bar',
        unit: 'mm',
        ...p.swayBar,
        help: 'Wire diameter of the anti-roll bar; 0 means no bar. A thicker bar cuts body roll and grip at this end; a thinner one adds grip and roll.',
      })),
      ...paired('susp', 'camber-link-inner', () => ({
        type: 'position',
        label: 'camber link, inner hole',
        min: 1,
        max: p.camberLinkInnerHoles,
        help: 'Hole for the inner end of the camber link, counted from the centre of the car outwards. A shorter link (higher number) makes the car react faster and roll less; a longer link is smoother on bumps.',
      })),
      ...paired('susp', 'camber-link-outer', () => ({
        type: 'position',
        label: 'camber link, outer hole',
        min: 1,
        max: p.camberLinkOuterHoles,
        help: 'Hole for the outer end of the camber link on the hub, counted from the top. A lower hole makes the car react faster; a higher hole is calmer and easier to drive.',
      })),
    ],
  };
}

// Shim stacks: common practice, no source; from memory. Half-millimetre steps match the shims sold.
const shim = (min: number, max: number) => ({ type: 'number' as const, unit: 'mm' as const, min, max, step: 0.5 });

export function frontSuspensionSection(p: ClassProfile): TemplateSection {
  return {
    key: 'front-suspension',
    label: 'Front suspension',
    fields: [
      {
        key: 'susp.front.arm-stiffness',
        label: 'Front arm stiffness',
        type: 'choice',
        options: STIFFNESS_OPTIONS,
        help: 'How stiff the front arms are. Softer arms flex and add grip on cold or bumpy tracks; harder arms react faster on high grip.',
      },
      {
        key: 'susp.front.toe',
        label: 'Front toe',
        type: 'number',
        unit: 'deg',
        // common practice, no source; from memory.
        min: -10,
        max: 10,
        step: 0.5,
        plausible: { min: -3, max: 2 },
        help: 'Angle of the front wheels seen from above; negative means toe-out. Toe-out sharpens turn-in; toe-in calms the car on straights.',
      },
      {
        key: 'susp.front.caster',
        label: 'Caster',
        type: 'number',
        unit: 'deg',
        ...p.caster,
        help: 'Backward lean of the steering axis. More caster is steadier and steers better out of corners; less caster steers more going in.',
      },
      {
        key: 'susp.front.kick-up',
        label: 'Kick-up',
        type: 'number',
        unit: 'deg',
        ...p.kickUp,
        help: 'Upward angle at the front of the front arms. More kick-up soaks up bumps and landings; less gives sharper steering on smooth tracks.',
      },
      {
        key: 'susp.front.ackermann',
        label: 'Ackermann (steering link hole)',
        type: 'position',
        min: 1,
        max: p.ackermannHoles,
        help: 'Hole for the steering links on the rack or bellcrank, counted from the one that turns the inside wheel least. Higher numbers turn in sharper in tight corners; lower numbers are smoother in fast sweepers.',
      },
      {
        key: 'susp.front.camber-link-inner-shim',
        label: 'Front camber link inner shims',
        ...shim(0, 10),
        help: 'Total thickness of shims under the inner ball stud of the front camber link. More shims make the front calmer over bumps; fewer make it react faster.',
      },
      {
        key: 'susp.front.camber-link-outer-shim',
        label: 'Front camber link outer shims',
        ...shim(0, 10),
        help: 'Total thickness of shims under the outer ball stud of the front camber link. More shims give more steering on turn-in; fewer make the front steadier.',
      },
      {
        key: 'susp.front.hub-height-shim',
        label: 'Front hub height shims',
        ...shim(0, 6),
        help: 'Total thickness of shims that raise the steering block on its hub carrier. More shims give a more aggressive turn-in; fewer make the steering gentler.',
      },
      {
        key: 'susp.front.arm-shim-fore',
        label: 'Front arm shims, ahead of the arm',
        ...shim(0, 6),
        help: 'Shims on the hinge pin ahead of the front arm. Moving shims here from behind the arm shortens the wheelbase a little and sharpens steering.',
      },
      {
        key: 'susp.front.arm-shim-aft',
        label: 'Front arm shims, behind the arm',
        ...shim(0, 6),
        help: 'Shims on the hinge pin behind the front arm. Moving shims here from ahead of the arm lengthens the wheelbase a little and calms the car.',
      },
      {
        key: 'susp.front.bump-steer-shim',
        label: 'Bump steer shims',
        ...shim(0, 8),
        help: 'Shims under the steering link ball stud on the hub. Set them so toe barely changes as the suspension moves, which keeps the steering predictable over bumps.',
      },
    ],
  };
}
