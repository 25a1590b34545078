import { requireFinite, requireFiniteResult, requireNonNegative, requirePositive, requireTeeth } from './validate';

/**
 * The first reduction. `pinionTeeth` is the gear the power source drives directly: the clutch
 * bell on a nitro car, the motor pinion on an electric one.
 */
export interface SpurGearing {
  spurTeeth: number;
  pinionTeeth: number;
}

/** The reduction inside each differential: ring gear driven by the small diff input pinion. */
export interface DiffGearing {
  ringGearTeeth: number;
  diffPinionTeeth: number;
}

/**
 * Spur gear ratio: spur teeth ÷ clutch bell (nitro) or motor pinion (electric) teeth.
 * @returns how many engine or motor turns make one turn of the spur
 * @throws RangeError when either tooth count is not a whole number of 1 or more
 */
export function computeGearRatio({ spurTeeth, pinionTeeth }: SpurGearing): number {
  return requireTeeth('spurTeeth', spurTeeth) / requireTeeth('pinionTeeth', pinionTeeth);
}

/**
 * Internal differential ratio: ring gear teeth ÷ diff input pinion teeth.
 * @throws RangeError when either tooth count is not a whole number of 1 or more
 */
export function computeInternalDiffRatio({ ringGearTeeth, diffPinionTeeth }: DiffGearing): number {
  return requireTeeth('ringGearTeeth', ringGearTeeth) / requireTeeth('diffPinionTeeth', diffPinionTeeth);
}

/**
 * Final drive ratio: spur gear ratio × internal diff ratio, i.e. engine or motor turns per wheel
 * turn. On 4WD cars the spur sits on the centre diff or centre shaft, which turns the front and
 * rear diff pinions 1:1. On a 2WD gearbox enter the diff gear as the ring gear and the top-shaft
 * gear as the diff pinion: idler teeth cancel out of the ratio.
 * @throws RangeError when any tooth count is not a whole number of 1 or more
 */
export function computeFinalDriveRatio(gearing: SpurGearing & DiffGearing): number {
  return computeGearRatio(gearing) * computeInternalDiffRatio(gearing);
}

/**
 * Rollout: distance the car travels per engine or motor revolution, in mm, ignoring tire growth
 * and slip. Tire circumference (π × diameter) ÷ final drive ratio.
 * @param input.tireDiameterMm outside diameter of the driven tire, mm
 * @param input.finalDriveRatio engine or motor turns per wheel turn
 * @throws RangeError when the diameter or ratio is not a finite number above zero
 */
export function computeRolloutMm({
  tireDiameterMm,
  finalDriveRatio,
}: {
  tireDiameterMm: number;
  finalDriveRatio: number;
}): number {
  const diameter = requirePositive('tireDiameterMm', tireDiameterMm);
  const ratio = requirePositive('finalDriveRatio', finalDriveRatio);
  return requireFiniteResult('rollout', (Math.PI * diameter) / ratio);
}

// mm per minute → km per hour: × 60 min/h ÷ 1 000 000 mm/km.
const MM_PER_MIN_TO_KMH = 60 / 1_000_000;

/**
 * Theoretical top speed, km/h, at a given engine or motor speed. For nitro, `rpm` is the engine
 * speed the racer enters; the result ignores clutch slip, tire growth and drag, so it is an upper
 * bound to compare gearings, not a radar reading.
 * @param input.rolloutMm mm travelled per revolution (see computeRolloutMm)
 * @param input.rpm engine or motor revolutions per minute, zero or more
 * @throws RangeError when rollout is not above zero or rpm is negative or not finite
 */
export function computeTopSpeedKmh({ rolloutMm, rpm }: { rolloutMm: number; rpm: number }): number {
  const rollout = requirePositive('rolloutMm', rolloutMm);
  const revs = requireNonNegative('rpm', rpm);
  return requireFiniteResult('top speed', rollout * revs * MM_PER_MIN_TO_KMH);
}

/**
 * No-load speed of a brushless motor: kV (rpm per volt) × battery voltage. Under load the motor
 * turns slower, so speeds derived from this are theoretical.
 * @param input.motorKv motor velocity constant, rpm per volt
 * @param input.batteryVolts pack voltage, V
 * @throws RangeError when kV or voltage is not a finite number above zero
 */
export function computeNoLoadMotorRpm({ motorKv, batteryVolts }: { motorKv: number; batteryVolts: number }): number {
  const kv = requirePositive('motorKv', motorKv);
  const volts = requirePositive('batteryVolts', batteryVolts);
  return requireFiniteResult('no-load motor rpm', kv * volts);
}

/**
 * Theoretical top speed, km/h, of an electric car at the motor's no-load rpm (kV × volts).
 * @param input.rolloutMm mm travelled per motor revolution
 * @param input.motorKv motor velocity constant, rpm per volt
 * @param input.batteryVolts pack voltage, V
 * @throws RangeError when any input is not a finite number above zero
 */
export function computeElectricTopSpeedKmh({
  rolloutMm,
  motorKv,
  batteryVolts,
}: {
  rolloutMm: number;
  motorKv: number;
  batteryVolts: number;
}): number {
  return computeTopSpeedKmh({ rolloutMm, rpm: computeNoLoadMotorRpm({ motorKv, batteryVolts }) });
}

/**
 * km/h → m/s (÷ 3.6, exact by definition of the hour and kilometre).
 * @throws RangeError when the speed is not finite
 */
export function kmhToMetresPerSecond(kmh: number): number {
  return requireFinite('kmh', kmh) / 3.6;
}

/**
 * m/s → km/h (× 3.6).
 * @throws RangeError when the speed is not finite, or the result overflows
 */
export function metresPerSecondToKmh(metresPerSecond: number): number {
  return requireFiniteResult('km/h', requireFinite('metresPerSecond', metresPerSecond) * 3.6);
}
