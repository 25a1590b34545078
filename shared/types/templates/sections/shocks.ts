import { options, paired } from '../fieldBuilders';
import type { ClassProfile } from '../profile';
import type { TemplateSection } from '../types';

/** Every shock setting exists at both ends, so the whole section is front/rear pairs. */
export function shocksSection(p: ClassProfile): TemplateSection {
  return {
    key: 'shocks',
    label: 'Shocks',
    fields: [
      ...paired('shock', 'oil', () => ({
        type: 'number',
        label: 'shock oil',
        unit: 'cSt',
        ...p.shockOil,
        help: 'Oil in the shock. Thicker oil slows the suspension for big jumps and smooth tracks; thinner oil reacts faster and grips better over bumps.',
      })),
      ...paired('shock', 'piston-holes', () => ({
        type: 'integer',
        label: 'piston holes',
        unit: null,
        // common practice, no source; from memory.
        min: 1,
        max: 12,
        step: 1,
        plausible: { min: 2, max: 8 },
        help: 'Number of holes in the shock piston. Fewer holes make the damping firmer on landings; more holes make it softer.',
      })),
      ...paired('shock', 'piston-hole-size', () => ({
        type: 'number',
        label: 'piston hole size',
        unit: 'mm',
        ...p.pistonHoleSize,
        help: 'Diameter of each piston hole. Smaller holes firm up landings and fast bumps; bigger holes make the shock softer and quicker.',
      })),
      ...paired('shock', 'spring', () => ({
        type: 'number',
        label: 'spring rate',
        unit: 'N/mm',
        ...p.springRate,
        help: 'Force needed to squeeze the spring one millimetre. A harder spring reacts faster and copes with big jumps; a softer spring adds grip on bumpy tracks.',
      })),
      ...paired('shock', 'spring-label', () => ({
        type: 'text',
        label: 'spring marking',
        maxLength: 40,
        help: 'The colour or marking on the spring, for springs sold without a rate. Fill in this or the spring rate, whichever you know.',
      })),
      ...paired('shock', 'tower-hole', () => ({
        type: 'position',
        label: 'shock tower hole',
        min: 1,
        max: p.towerHoles,
        help: 'Hole used on the shock tower, counted from the outside in. Inner holes make the suspension softer and more progressive; outer holes firm it up.',
      })),
      ...paired('shock', 'arm-hole', () => ({
        type: 'position',
        label: 'shock arm hole',
        min: 1,
        max: p.armHoles,
        help: 'Hole used on the suspension arm, counted from the outside in. Inner holes make the suspension softer for more grip; outer holes firm it up for stability.',
      })),
      ...paired('shock', 'length', (side) => ({
        type: 'number',
        label: 'shock length',
        unit: 'mm',
        ...p.shockLength[side],
        help: 'Length of the shock from eye to eye at full extension. A longer shock lets the wheel drop further; a shorter one limits droop.',
      })),
      ...paired('shock', 'limiter', () => ({
        type: 'number',
        label: 'shock limiters',
        unit: 'mm',
        // common practice, no source; from memory.
        min: 0,
        max: 20,
        step: 0.5,
        plausible: { min: 0, max: 8 },
        help: 'Total thickness of spacers inside the shock that stop it extending fully. More limiting makes the car react faster on smooth tracks; less lets the wheel drop for grip on bumps.',
      })),
      ...paired('shock', 'volume-compensation', () => ({
        type: 'choice',
        label: 'bladder, membrane or emulsion',
        options: options(['bladder', 'Bladder'], ['membrane', 'Membrane'], ['emulsion', 'Emulsion (oil and air mixed)']),
        help: 'How the shock makes room for the shaft as it goes in. A bladder or membrane gives consistent, firm damping; emulsion feels softer over small bumps but can fade.',
      })),
    ],
  };
}
