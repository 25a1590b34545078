import type { VehicleClassKey } from '../../types/vehicleClasses';
import { computeElectricTopSpeedKmh, computeFinalDriveRatio, computeGearRatio, computeInternalDiffRatio, computeRolloutMm } from './gearing';
import { computeTotalRearToeDeg } from './toe';

type Values = Readonly<Record<string, number | string | boolean>>;

/** One computed figure, or why it cannot be computed yet. */
export type SummaryFigure = { value: number; missing: [] } | { value: null; missing: string[] };

export type SetupSummaryFigures = {
  gearRatio: SummaryFigure;
  internalDiffRatio: SummaryFigure;
  finalDriveRatio: SummaryFigure;
  /** mm of travel per engine or motor revolution, on the rear tire. */
  rolloutMm: SummaryFigure;
  totalRearToeDeg: SummaryFigure;
  /** Electric only: no-load top speed from motor kV × pack voltage. */
  electricTopSpeedKmh: SummaryFigure;
};

/** Template keys the summary reads; the bell (nitro) and pinion (electric) share a role. */
export const SUMMARY_KEYS = {
  spur: 'gear.spur',
  pinion: ['gear.clutch-bell', 'gear.pinion'],
  ring: 'gear.diff-ring',
  diffPinion: 'gear.diff-pinion',
  rearTire: 'tire.rear.diameter',
  toeFore: 'susp.rear.toe-block-fore',
  toeAft: 'susp.rear.toe-block-aft',
  hubToe: 'susp.rear.hub-toe',
  kv: 'motor.kv',
  volts: 'battery.voltage',
} as const;

function num(values: Values, key: string): number | undefined {
  const v = values[key];
  return typeof v === 'number' && Number.isFinite(v) ? v : undefined;
}

function figure(inputs: Record<string, number | undefined>, compute: (n: Record<string, number>) => number): SummaryFigure {
  const missing = Object.entries(inputs).filter(([, v]) => v === undefined).map(([k]) => k);
  if (missing.length) return { value: null, missing };
  try {
    return { value: compute(inputs as Record<string, number>), missing: [] };
  } catch {
    // A value outside what the formula accepts (zero teeth, say) leaves the figure blank.
    return { value: null, missing: Object.keys(inputs) };
  }
}

/**
 * The computed figures a setup page shows, from stored values. A figure whose inputs are not on
 * the sheet comes back empty with the missing field keys, so the page can say what to fill in.
 */
export function computeSetupSummary(vehicleClass: VehicleClassKey, values: Values): SetupSummaryFigures {
  const k = SUMMARY_KEYS;
  // Nitro cars drive the spur through a clutch bell, electric ones through a motor pinion.
  const pinionKey = vehicleClass.endsWith('-nitro') ? k.pinion[0] : k.pinion[1];
  const spur = num(values, k.spur);
  const pinion = num(values, pinionKey);
  const ring = num(values, k.ring);
  const diffPinion = num(values, k.diffPinion);
  const gearRatio = figure({ [k.spur]: spur, [pinionKey]: pinion }, (n) =>
    computeGearRatio({ spurTeeth: n[k.spur], pinionTeeth: n[pinionKey] }),
  );
  const internalDiffRatio = figure({ [k.ring]: ring, [k.diffPinion]: diffPinion }, (n) =>
    computeInternalDiffRatio({ ringGearTeeth: n[k.ring], diffPinionTeeth: n[k.diffPinion] }),
  );
  const finalDriveRatio = figure({ [k.spur]: spur, [pinionKey]: pinion, [k.ring]: ring, [k.diffPinion]: diffPinion }, (n) =>
    computeFinalDriveRatio({ spurTeeth: n[k.spur], pinionTeeth: n[pinionKey], ringGearTeeth: n[k.ring], diffPinionTeeth: n[k.diffPinion] }),
  );
  const rolloutMm =
    finalDriveRatio.value === null
      ? { value: null, missing: [...finalDriveRatio.missing, ...(num(values, k.rearTire) === undefined ? [k.rearTire] : [])] }
      : figure({ [k.rearTire]: num(values, k.rearTire) }, (n) =>
          computeRolloutMm({ tireDiameterMm: n[k.rearTire], finalDriveRatio: finalDriveRatio.value as number }),
        );
  const totalRearToeDeg = figure({ [k.toeFore]: num(values, k.toeFore), [k.toeAft]: num(values, k.toeAft) }, (n) =>
    computeTotalRearToeDeg({ frontBlockDeg: n[k.toeFore], rearBlockDeg: n[k.toeAft], hubToeDeg: num(values, k.hubToe) ?? 0 }),
  );
  const electricTopSpeedKmh =
    rolloutMm.value === null
      ? { value: null, missing: rolloutMm.missing }
      : figure({ [k.kv]: num(values, k.kv), [k.volts]: num(values, k.volts) }, (n) =>
          computeElectricTopSpeedKmh({ rolloutMm: rolloutMm.value as number, motorKv: n[k.kv], batteryVolts: n[k.volts] }),
        );
  return { gearRatio, internalDiffRatio, finalDriveRatio, rolloutMm, totalRearToeDeg, electricTopSpeedKmh };
}
