import type { VehicleClassKey } from '../vehicleClasses';

/**
 * Units a value is stored in. Display conversion (inches, weight oil grades, lb/in) belongs to the
 * units module; a template only records which unit its numbers mean.
 */
export const FIELD_UNITS = ['mm', 'deg', 'cSt', 'teeth', '%', 'g', 'N/mm', '°C', 'kV', 'V', 'rpm'] as const;
export type FieldUnit = (typeof FIELD_UNITS)[number];

export const FIELD_TYPES = ['number', 'integer', 'choice', 'position', 'boolean', 'text'] as const;
export type FieldType = (typeof FIELD_TYPES)[number];

export type Side = 'front' | 'rear';

/** Outside `plausible` a value is kept but flagged, because odd setups are sometimes real. */
export interface PlausibleRange {
  min: number;
  max: number;
}

export interface NumericRange {
  min: number;
  max: number;
  /** Increment the editor offers; validation only rounds to its decimal places (see valuesSchema). */
  step: number;
  plausible?: PlausibleRange;
}

interface FieldBase {
  /** Dotted lowercase key. Values are stored under it, so it never changes once released. */
  key: string;
  label: string;
  /** One or two plain sentences: what the setting does and which way to turn it. */
  help: string;
  /** Shared by the front and rear halves of a pair so the editor can show them side by side. */
  pairKey?: string;
  side?: Side;
}

export interface NumberField extends FieldBase, NumericRange {
  type: 'number';
  unit: FieldUnit;
}

export interface IntegerField extends FieldBase, NumericRange {
  type: 'integer';
  /** null for plain counts (piston holes, battery cells). */
  unit: FieldUnit | null;
}

/** A hole index on a tower, arm or rack; the help text says which end hole 1 is. */
export interface PositionField extends FieldBase {
  type: 'position';
  min: number;
  max: number;
}

export interface ChoiceOption {
  value: string;
  label: string;
}

export interface ChoiceField extends FieldBase {
  type: 'choice';
  options: readonly ChoiceOption[];
}

export interface BooleanField extends FieldBase {
  type: 'boolean';
}

export interface TextField extends FieldBase {
  type: 'text';
  maxLength: number;
}

export type TemplateField =
  | NumberField
  | IntegerField
  | PositionField
  | ChoiceField
  | BooleanField
  | TextField;

export interface TemplateSection {
  key: string;
  label: string;
  fields: readonly TemplateField[];
}

export interface SetupTemplate {
  vehicleClass: VehicleClassKey;
  label: string;
  /** Raised whenever a field's range, options or meaning changes; keys are never reused. */
  version: number;
  sections: readonly TemplateSection[];
}

export type SetupFieldValue = number | string | boolean;
/** A sheet's values by field key; any field may be absent because partial sheets are allowed. */
export type SetupValues = Record<string, SetupFieldValue>;

/** Omit that keeps a union a union, so field specs stay discriminated by `type`. */
export type DistributiveOmit<T, K extends PropertyKey> = T extends unknown ? Omit<T, K> : never;
