import fc from 'fast-check';
import type { SetupFieldValue, SetupTemplate, TemplateField } from '../../../shared/types/templates';
import { listFields } from '../../../shared/types/templates';

/** Any value a racer could legitimately enter for the field, anywhere inside its hard limits. */
export function validValueFor(field: TemplateField): fc.Arbitrary<SetupFieldValue> {
  switch (field.type) {
    case 'number':
      return fc.double({ min: field.min, max: field.max, noNaN: true });
    case 'integer':
    case 'position':
      return fc.integer({ min: field.min, max: field.max });
    case 'choice':
      return fc.constantFrom(...field.options.map((o) => o.value));
    case 'boolean':
      return fc.boolean();
    case 'text':
      return fc.string({ maxLength: field.maxLength });
  }
}

/** A partial sheet: any subset of the template's fields, each with a valid value. */
export function validSheetFor(template: SetupTemplate): fc.Arbitrary<Partial<Record<string, SetupFieldValue>>> {
  const model = Object.fromEntries(listFields(template).map((f) => [f.key, validValueFor(f)]));
  return fc.record(model, { requiredKeys: [] });
}

export type RangedField = Extract<TemplateField, { type: 'number' | 'integer' }>;

export function rangedFields(template: SetupTemplate): RangedField[] {
  return listFields(template).filter((f): f is RangedField => f.type === 'number' || f.type === 'integer');
}
