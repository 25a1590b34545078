import { options, range } from './fieldBuilders';
import type { ClassProfile, ElectricRanges } from './profile';

// Ranges and plausible ranges below are common practice, no source; from memory. Hard limits are
// set wide on purpose: they only refuse values no car could have, the plausible band warns.

const EIGHTH_MODULES = options(
  ['module-1', 'Module 1'],
  ['module-0.8', 'Module 0.8'],
  ['32dp', '32 pitch'],
);

const diffOil = (plausibleMin: number, plausibleMax: number) =>
  range(100, 1_000_000, 100, plausibleMin, plausibleMax);

const buggy = {
  scale: '1/8',
  rideHeight: range(0, 100, 0.5, 20, 40),
  droop: range(0, 80, 0.5, 10, 45),
  caster: range(0, 40, 0.5, 8, 22),
  kickUp: range(0, 35, 0.5, 8, 20),
  swayBar: range(0, 5, 0.1, 0, 3.4),
  camberLinkInnerHoles: 6,
  camberLinkOuterHoles: 4,
  ackermannHoles: 4,
  shockOil: range(100, 2000, 25, 300, 900),
  shockLength: { front: range(60, 200, 0.5, 105, 125), rear: range(60, 200, 0.5, 125, 150) },
  springRate: range(0.1, 5, 0.01, 0.5, 1.4),
  pistonHoleSize: range(0.5, 3, 0.05, 1.1, 1.8),
  towerHoles: 6,
  armHoles: 4,
  spur: range(30, 70, 1, 44, 50),
  gearModules: EIGHTH_MODULES,
  ballast: range(0, 1000, 5, 0, 200),
  tireDiameter: { front: range(60, 200, 0.5, 100, 125), rear: range(60, 200, 0.5, 100, 125) },
  wingHoles: 5,
  drive: '4WD',
  diffOil: { front: diffOil(2000, 20_000), centre: diffOil(2000, 100_000), rear: diffOil(1000, 10_000) },
  diffRing: range(30, 60, 1, 40, 48),
  diffPinion: range(8, 20, 1, 10, 14),
} as const;

/** Truggies are heavier with longer travel and bigger tires, so most bands move up and widen. */
const truggy = {
  ...buggy,
  rideHeight: range(0, 120, 0.5, 25, 45),
  droop: range(0, 100, 0.5, 15, 55),
  swayBar: range(0, 5, 0.1, 0, 3.6),
  shockOil: range(100, 2000, 25, 400, 1100),
  shockLength: { front: range(60, 220, 0.5, 115, 140), rear: range(60, 220, 0.5, 135, 165) },
  springRate: range(0.1, 5, 0.01, 0.6, 1.8),
  pistonHoleSize: range(0.5, 3, 0.05, 1.2, 1.9),
  tireDiameter: { front: range(60, 220, 0.5, 130, 160), rear: range(60, 220, 0.5, 130, 160) },
  ballast: range(0, 1000, 5, 0, 250),
  diffOil: { front: diffOil(3000, 30_000), centre: diffOil(5000, 200_000), rear: diffOil(1000, 20_000) },
} as const;

const NITRO_CLUTCH_BELL = range(10, 20, 1, 12, 15);

const eighthElectric = (motorKv: ElectricRanges['motorKv']): ElectricRanges => ({
  motorKv,
  cells: range(1, 8, 1, 3, 6),
  voltage: range(3, 35, 0.1, 11, 26),
});

export const EIGHTH_PROFILES: readonly ClassProfile[] = [
  {
    ...buggy,
    vehicleClass: 'buggy-1-8-nitro',
    label: '1/8 nitro buggy',
    power: 'nitro',
    drivePinion: NITRO_CLUTCH_BELL,
    weight: range(1000, 10_000, 10, 3300, 4000),
  },
  {
    ...buggy,
    ...eighthElectric(range(500, 8000, 10, 1600, 2800)),
    vehicleClass: 'buggy-1-8-electric',
    label: '1/8 electric buggy',
    power: 'electric',
    drivePinion: range(10, 30, 1, 13, 20),
    weight: range(1000, 10_000, 10, 3500, 4300),
  },
  {
    ...truggy,
    vehicleClass: 'truggy-1-8-nitro',
    label: '1/8 nitro truggy',
    power: 'nitro',
    drivePinion: NITRO_CLUTCH_BELL,
    weight: range(1000, 10_000, 10, 4000, 5000),
  },
  {
    ...truggy,
    ...eighthElectric(range(500, 8000, 10, 1500, 2400)),
    vehicleClass: 'truggy-1-8-electric',
    label: '1/8 electric truggy',
    power: 'electric',
    drivePinion: range(10, 30, 1, 12, 19),
    weight: range(1000, 10_000, 10, 4400, 5600),
  },
];
