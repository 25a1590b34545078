import { BRACE_OPTIONS, options } from '../fieldBuilders';
import type { ClassProfile } from '../profile';
import type { TemplateField, TemplateSection } from '../types';

const BRACE_HELP =
  'A stiffer brace makes the chassis react faster on high grip; a more flexible one, or none, adds grip on bumpy or slippery tracks.';

/** 1/8 chassis flex is tuned with braces on the plate; 1/10 mostly with the top deck. */
const BRACES: Record<ClassProfile['scale'], ReadonlyArray<readonly [string, string]>> = {
  '1/8': [
    ['front-brace', 'Front chassis brace'],
    ['centre-brace', 'Centre chassis brace'],
    ['rear-brace', 'Rear chassis brace'],
  ],
  '1/10': [
    ['top-deck', 'Top deck'],
    ['rear-brace', 'Rear chassis brace'],
  ],
};

export function chassisSection(p: ClassProfile): TemplateSection {
  const braces: TemplateField[] = BRACES[p.scale].map(([name, label]) => ({
    key: `chassis.${name}`,
    label,
    type: 'choice',
    options: BRACE_OPTIONS,
    help: `How stiff the ${label.toLowerCase()} is. ${BRACE_HELP}`,
  }));
  return {
    key: 'chassis',
    label: 'Chassis',
    fields: [
      ...braces,
      {
        key: 'chassis.stiffener',
        label: 'Chassis stiffeners fitted',
        type: 'boolean',
        help: 'Whether extra stiffening plates or inserts are fitted to the chassis. Fit them for a sharper car on high grip; leave them out for more flex and grip on slippery tracks.',
      },
      {
        key: 'chassis.weight',
        label: 'Weight ready to race',
        type: 'number',
        unit: 'g',
        ...p.weight,
        help: 'Weight of the whole car ready to race, with battery or fuel. Lighter accelerates and brakes better, but check the minimum weight in your race rules.',
      },
      {
        key: 'chassis.ballast',
        label: 'Ballast',
        type: 'number',
        unit: 'g',
        ...p.ballast,
        help: 'Extra weight added to the chassis. It settles a nervous car on bumpy or slippery tracks, at the cost of some acceleration.',
      },
      {
        key: 'chassis.ballast-position',
        label: 'Ballast position',
        type: 'choice',
        options: options(['front', 'Front'], ['centre', 'Centre'], ['rear', 'Rear'], ['spread', 'Spread out']),
        help: 'Where the ballast sits. Weight at the front calms the steering; weight at the rear gives more rear traction.',
      },
    ],
  };
}

/** Only nitro cars have mechanical brakes with a bias to set; electric cars brake through the motor. */
export function brakesSection(p: ClassProfile): TemplateSection | null {
  if (p.power !== 'nitro') return null;
  return {
    key: 'brakes',
    label: 'Brakes',
    fields: [
      {
        key: 'brakes.bias',
        label: 'Brake bias to the front',
        type: 'number',
        unit: '%',
        // common practice, no source; from memory.
        min: 0,
        max: 100,
        step: 1,
        plausible: { min: 25, max: 70 },
        help: 'Share of the braking done by the front brake. More front bias keeps the car straight under braking; more rear bias helps it rotate into corners.',
      },
    ],
  };
}
