import { options, paired } from '../fieldBuilders';
import type { ClassProfile } from '../profile';
import type { TemplateSection } from '../types';

const COMPOUNDS = options(
  ['super-soft', 'Super soft'],
  ['soft', 'Soft'],
  ['medium', 'Medium'],
  ['hard', 'Hard'],
);

/** Our own generic tread words, so a sheet never names a product. */
const TREADS = options(
  ['fine-pin', 'Fine pin'],
  ['small-pin', 'Small pin'],
  ['small-block', 'Small block'],
  ['large-block', 'Large block'],
  ['bar', 'Bar'],
  ['spike', 'Spike'],
  ['slick-ish', 'Slick-ish'],
);

const INSERTS = options(
  ['soft-foam', 'Soft foam'],
  ['medium-foam', 'Medium foam'],
  ['firm-foam', 'Firm foam'],
  ['closed-cell', 'Closed-cell foam'],
  ['none', 'No insert'],
);

export function tiresSection(p: ClassProfile): TemplateSection {
  return {
    key: 'tires',
    label: 'Tires',
    fields: [
      ...paired('tire', 'compound', () => ({
        type: 'choice',
        label: 'tire compound',
        options: COMPOUNDS,
        help: 'Rubber compound. Softer compounds grip better on cold, loose or low-grip tracks; harder ones last longer on hot, abrasive tracks.',
      })),
      ...paired('tire', 'tread', () => ({
        type: 'choice',
        label: 'tire tread',
        options: TREADS,
        help: 'Tread pattern in general terms. Fine pins and slick-ish treads suit hard, dusty or high-grip tracks; big blocks, bars and spikes dig into loose, loamy or wet dirt.',
      })),
      ...paired('tire', 'insert', () => ({
        type: 'choice',
        label: 'tire insert',
        options: INSERTS,
        help: 'Foam insert inside the tire. A firmer insert gives sharper response and holds its shape at speed; a softer one adds grip over bumps.',
      })),
      ...paired('tire', 'diameter', (side) => ({
        type: 'number',
        label: 'tire diameter',
        unit: 'mm',
        ...p.tireDiameter[side],
        help: 'Outside diameter of the mounted tire. Bigger tires act like taller gearing and raise the car a little; tires shrink as they wear.',
      })),
      ...paired('tire', 'wheel-offset', () => ({
        type: 'number',
        label: 'wheel offset',
        unit: 'mm',
        // common practice, no source; from memory.
        min: -10,
        max: 10,
        step: 0.5,
        plausible: { min: -3, max: 5 },
        help: 'How far the wheel sits outwards compared with a standard wheel; negative is inwards. A wider track at one end lowers grip there: wider at the front steadies the steering, wider at the rear adds steering.',
      })),
    ],
  };
}
