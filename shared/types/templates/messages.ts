import type { FieldUnit, SetupTemplate, TemplateField } from './types';

/** Degrees and percent hug the number the way racers write them ("2°", "40%"). */
export function withUnit(value: number, unit: FieldUnit | null): string {
  if (unit === null) return String(value);
  if (unit === 'deg') return `${value}°`;
  if (unit === '%') return `${value}%`;
  return `${value} ${unit}`;
}

type RangedField = Extract<TemplateField, { type: 'number' | 'integer' }>;

export function rangeMessage(field: RangedField): string {
  return `${field.label} must be between ${field.min} and ${withUnit(field.max, field.unit)}`;
}

export function positionMessage(field: Extract<TemplateField, { type: 'position' }>): string {
  return `${field.label} must be a hole number from ${field.min} to ${field.max}`;
}

export function choiceMessage(field: Extract<TemplateField, { type: 'choice' }>): string {
  return `${field.label} must be one of: ${field.options.map((o) => o.label).join(', ')}`;
}

export function unknownFieldMessage(template: SetupTemplate, key: string): string {
  return `"${key}" is not a field on the ${template.label} setup sheet`;
}

export const SHEET_SHAPE_MESSAGE = 'A setup sheet must be a set of field keys and their values';

export function plausibleWarning(field: RangedField, value: number, template: SetupTemplate): string {
  const band = field.plausible;
  const usual = band ? `${band.min} to ${withUnit(band.max, field.unit)}` : '';
  return `${field.label} of ${withUnit(value, field.unit)} is unusual for a ${template.label} (most run ${usual}); check the value and its unit`;
}
