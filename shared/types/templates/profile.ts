import type { VehicleClassKey } from '../vehicleClasses';
import type { ChoiceOption, NumericRange, Side } from './types';

export type Sided<T> = Record<Side, T>;

/**
 * Everything that differs between vehicle classes, so the section builders can stay shared.
 * A builder reads ranges from here and never branches on a class key.
 */
interface BaseProfile {
  vehicleClass: VehicleClassKey;
  label: string;
  scale: '1/8' | '1/10';
  rideHeight: NumericRange;
  droop: NumericRange;
  caster: NumericRange;
  kickUp: NumericRange;
  swayBar: NumericRange;
  camberLinkInnerHoles: number;
  camberLinkOuterHoles: number;
  ackermannHoles: number;
  shockOil: NumericRange;
  shockLength: Sided<NumericRange>;
  springRate: NumericRange;
  pistonHoleSize: NumericRange;
  towerHoles: number;
  armHoles: number;
  spur: NumericRange;
  /** Clutch bell on nitro cars, motor pinion on electric ones. */
  drivePinion: NumericRange;
  gearModules: readonly ChoiceOption[];
  weight: NumericRange;
  ballast: NumericRange;
  tireDiameter: Sided<NumericRange>;
  wingHoles: number;
}

type PowerProfile =
  | { power: 'nitro' }
  | { power: 'electric'; motorKv: NumericRange; cells: NumericRange; voltage: NumericRange };

type DriveProfile =
  | {
      drive: '4WD';
      diffOil: Sided<NumericRange> & { centre: NumericRange };
      diffRing: NumericRange;
      diffPinion: NumericRange;
    }
  | { drive: '2WD'; rearDiffOil: NumericRange };

export type ClassProfile = BaseProfile & PowerProfile & DriveProfile;
export type ElectricRanges = Omit<Extract<PowerProfile, { power: 'electric' }>, 'power'>;
