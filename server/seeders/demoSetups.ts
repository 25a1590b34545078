import type { StoredSetupValues, Visibility } from '../../shared/types/setups';
import type { TrackTypeKey } from '../../shared/types/trackTypes';

/**
 * Demo garages. Each setup starts from its kit's stock sheet and then changes one or two things per
 * revision with the reason, the way racers test. All invented.
 */
export type DemoSetup = {
  title: string;
  visibility: Visibility;
  trackType: TrackTypeKey;
  temperatureC: number;
  grip: 'low' | 'medium' | 'high';
  notes: string;
  /** Each step: the fields it changes and the change note. */
  steps: Array<{ changes: StoredSetupValues; note: string }>;
};

export type DemoCar = { owner: string; kit: string; nickname: string; stock: boolean; setups: DemoSetup[] };

export const DEMO_CARS: DemoCar[] = [
  {
    owner: 'juno_braithwick',
    kit: 'ottervale-stoat-8e',
    nickname: 'Blue Stoat',
    stock: false,
    setups: [
      {
        title: 'Hollow Pines — loose and dusty',
        visibility: 'public',
        trackType: 'loose-dusty',
        temperatureC: 24,
        grip: 'low',
        notes: 'Built for the sandy top layer at **Hollow Pines**. Soft and free: the car needs to move weight to find grip.\n\n- Check the rear diff after every main; it thins quickly in the heat.',
        steps: [
          { changes: { 'diff.centre.oil': 7000 }, note: 'Centre diff 10k → 7k: the front was pulling the car wide on power out of the sweeper.' },
          { changes: { 'shock.rear.oil': 450 }, note: 'Rear shock oil 500 → 450: rear was skipping over the braking bumps into the hairpin.' },
          { changes: { 'susp.rear.toe-block-aft': 3.5 }, note: 'More rear toe (3° → 3.5° rear block): calmer on the long straight, a touch less rotation.' },
          { changes: { 'chassis.rear-brace': 'stiff' }, note: 'Stiff rear brace (option part): the rear twisted and stepped out over the ruts on exit.' },
          { changes: { 'body.style': 'high-downforce' }, note: 'High-downforce body (option part): more stable in the air off the tabletop when the wind picks up.' },
        ],
      },
      {
        title: 'Old Kiln indoor clay',
        visibility: 'unlisted',
        trackType: 'indoor-clay',
        temperatureC: 18,
        grip: 'high',
        notes: 'High grip: stiffer and lower so the car does not roll over in the tight infield.',
        steps: [
          { changes: { 'susp.front.ride-height': 25, 'susp.rear.ride-height': 27 }, note: 'Down 2 mm all round: it was rolling too much on the high-grip clay.' },
          { changes: { 'shock.front.oil': 650 }, note: 'Front oil 600 → 650: less dive on entry now the grip has come up.' },
        ],
      },
    ],
  },
  {
    owner: 'pell-strand',
    kit: 'cinderfell-gantry-t8',
    nickname: 'Rut Runner',
    stock: false,
    setups: [
      {
        title: 'Brackwater rough-track truggy',
        visibility: 'public',
        trackType: 'rough-bumpy',
        temperatureC: 15,
        grip: 'medium',
        notes: 'Soft springs and thick diffs for the ruts. Lands flat off the big double.',
        steps: [
          { changes: { 'diff.centre.oil': 30000 }, note: 'Centre 20k → 30k: less unloading over the rhythm section.' },
          { changes: { 'shock.rear.oil': 450 }, note: 'Rear oil 500 → 450: it kicked on the braking bumps.' },
        ],
      },
    ],
  },
  {
    owner: 'oskar-velde',
    kit: 'ottervale-stoat-8n',
    nickname: 'Old Faithful',
    stock: false,
    setups: [
      {
        title: 'Saltmarsh hard-pack nitro',
        visibility: 'public',
        trackType: 'hard-packed',
        temperatureC: 28,
        grip: 'medium',
        notes: 'For the dry afternoon surface at Saltmarsh. Watch engine temperatures on hot days.',
        steps: [
          { changes: { 'gear.clutch-bell': 14 }, note: 'Bell 13 → 14: the long straight needed more top end.' },
          { changes: { 'diff.front.oil': 5000 }, note: 'Front diff 7k → 5k: more steering in the slow infield.' },
        ],
      },
    ],
  },
  {
    owner: 'tamsin_q',
    kit: 'marrowby-wren-10',
    nickname: 'Club Wren',
    stock: false,
    setups: [
      {
        title: 'Wren 10 carpet-ish clay baseline',
        visibility: 'private',
        trackType: 'indoor-clay',
        temperatureC: 20,
        grip: 'high',
        notes: 'My private baseline before club nights.',
        steps: [{ changes: { 'gear.pinion': 21 }, note: 'Pinion 22 → 21: motor was running hot at the end of a five-minute main.' }],
      },
    ],
  },
  { owner: 'rafi_new', kit: 'ottervale-stoat-8e', nickname: 'First Stoat', stock: true, setups: [] },
];
