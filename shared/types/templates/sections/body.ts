import { options } from '../fieldBuilders';
import type { ClassProfile } from '../profile';
import type { TemplateSection } from '../types';

export function bodyAndWingSection(p: ClassProfile): TemplateSection {
  return {
    key: 'body-wing',
    label: 'Body and wing',
    fields: [
      {
        key: 'body.style',
        label: 'Body style',
        type: 'choice',
        options: options(
          ['standard', 'Standard'],
          ['low-profile', 'Low profile'],
          ['cab-forward', 'Cab forward'],
          ['high-downforce', 'High downforce'],
        ),
        help: 'General shape of the body. Low, slim bodies cut drag and roll on smooth tracks; high-downforce shapes steady the car on fast, jumpy tracks.',
      },
      {
        key: 'body.cutouts',
        label: 'Body cut-outs',
        type: 'text',
        maxLength: 120,
        help: 'Which openings are cut in the body, such as the windscreen or side vents. Open bodies let air through for cooling and less lift over jumps.',
      },
      {
        key: 'wing.angle',
        label: 'Wing angle',
        type: 'number',
        unit: 'deg',
        // common practice, no source; from memory.
        min: -10,
        max: 45,
        step: 1,
        plausible: { min: 0, max: 25 },
        help: 'Angle of the wing to the ground. More angle adds rear downforce and stability at speed; less gives more steering and top speed.',
      },
      {
        key: 'wing.position',
        label: 'Wing mount hole',
        type: 'position',
        min: 1,
        max: p.wingHoles,
        help: 'Hole the wing is mounted in, counted from the front. Further back adds rear downforce and stability; further forward adds steering.',
      },
      {
        key: 'wing.mount-height',
        label: 'Wing mount height',
        type: 'number',
        unit: 'mm',
        min: 0,
        max: 30,
        step: 1,
        help: 'Height of the spacers under the wing mount. A higher wing sits in cleaner air for more downforce; a lower wing is steadier when the car rolls.',
      },
    ],
  };
}
