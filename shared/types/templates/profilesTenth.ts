import { options, range } from './fieldBuilders';
import type { ClassProfile } from './profile';

// Ranges and plausible ranges below are common practice, no source; from memory. 1/10 cars run
// lower (ride height about 18–24 mm), on finer gears and lighter oils than 1/8.

const TENTH_MODULES = options(
  ['48dp', '48 pitch'],
  ['64dp', '64 pitch'],
  ['module-0.6', 'Module 0.6'],
  ['module-0.5', 'Module 0.5'],
);

const tenth = {
  scale: '1/10',
  power: 'electric',
  rideHeight: range(0, 60, 0.5, 18, 25),
  droop: range(0, 50, 0.5, 5, 30),
  caster: range(0, 40, 0.5, 15, 35),
  kickUp: range(0, 35, 0.5, 10, 30),
  swayBar: range(0, 3, 0.1, 0, 2.2),
  camberLinkInnerHoles: 8,
  camberLinkOuterHoles: 4,
  ackermannHoles: 4,
  shockOil: range(100, 2000, 25, 200, 700),
  shockLength: { front: range(30, 150, 0.5, 60, 80), rear: range(30, 150, 0.5, 75, 100) },
  springRate: range(0.1, 5, 0.01, 0.25, 0.9),
  pistonHoleSize: range(0.5, 3, 0.05, 1, 1.8),
  towerHoles: 8,
  armHoles: 4,
  spur: range(40, 120, 1, 64, 90),
  drivePinion: range(10, 50, 1, 15, 40),
  gearModules: TENTH_MODULES,
  ballast: range(0, 500, 1, 0, 120),
  wingHoles: 5,
  motorKv: range(500, 15_000, 10, 2500, 10_000),
  cells: range(1, 4, 1, 1, 2),
  voltage: range(3, 18, 0.1, 3.7, 8.8),
} as const;

export const TENTH_PROFILES: readonly ClassProfile[] = [
  {
    ...tenth,
    vehicleClass: 'buggy-1-10-4wd',
    label: '1/10 4WD buggy',
    weight: range(500, 5000, 5, 1500, 1900),
    tireDiameter: { front: range(40, 120, 0.5, 76, 90), rear: range(40, 120, 0.5, 78, 95) },
    drive: '4WD',
    diffOil: {
      front: range(100, 1_000_000, 100, 2000, 100_000),
      centre: range(100, 1_000_000, 100, 2000, 100_000),
      rear: range(100, 1_000_000, 100, 1000, 10_000),
    },
    diffRing: range(20, 60, 1, 34, 44),
    diffPinion: range(8, 20, 1, 10, 15),
  },
  {
    ...tenth,
    vehicleClass: 'buggy-1-10-2wd',
    label: '1/10 2WD buggy',
    weight: range(500, 5000, 5, 1400, 1750),
    tireDiameter: { front: range(40, 120, 0.5, 74, 88), rear: range(40, 120, 0.5, 78, 95) },
    drive: '2WD',
    rearDiffOil: range(100, 1_000_000, 100, 1000, 15_000),
  },
];
