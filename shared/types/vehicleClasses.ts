import { z } from './zod';

/** The classes Tunefork keeps setup sheets for. Keys are stable: they are stored in the database. */
export const VEHICLE_CLASSES = [
  { key: 'buggy-1-8-nitro', label: '1/8 nitro buggy', scale: '1/8', power: 'nitro', drive: '4WD' },
  { key: 'buggy-1-8-electric', label: '1/8 electric buggy', scale: '1/8', power: 'electric', drive: '4WD' },
  { key: 'truggy-1-8-nitro', label: '1/8 nitro truggy', scale: '1/8', power: 'nitro', drive: '4WD' },
  { key: 'truggy-1-8-electric', label: '1/8 electric truggy', scale: '1/8', power: 'electric', drive: '4WD' },
  { key: 'buggy-1-10-4wd', label: '1/10 4WD buggy', scale: '1/10', power: 'electric', drive: '4WD' },
  { key: 'buggy-1-10-2wd', label: '1/10 2WD buggy', scale: '1/10', power: 'electric', drive: '2WD' },
] as const;

export type VehicleClass = (typeof VEHICLE_CLASSES)[number];
export type VehicleClassKey = VehicleClass['key'];

export const vehicleClassKeySchema = z.enum(
  VEHICLE_CLASSES.map((c) => c.key) as [VehicleClassKey, ...VehicleClassKey[]],
);

export function vehicleClassLabel(key: VehicleClassKey): string {
  return VEHICLE_CLASSES.find((c) => c.key === key)?.label ?? key;
}
