import fc from 'fast-check';
import {
  TEMPLATES,
  buildValuesSchema,
  fieldsByKey,
  validateSetupValues,
  type SetupTemplate,
} from '../../../shared/types/templates';
import { rangedFields, validSheetFor } from './arbitraries';

const templates: Array<[string, SetupTemplate]> = Object.entries(TEMPLATES);

describe.each(templates)('values for the %s template', (_key, template) => {
  const schema = buildValuesSchema(template);

  it('validate whenever every value lies inside its field’s range', () => {
    fc.assert(
      fc.property(validSheetFor(template), (sheet) => {
        const result = validateSetupValues(template, sheet);
        expect(result.errors).toEqual({});
        expect(result.ok).toBe(true);
        expect(Object.keys(result.values).sort()).toEqual(Object.keys(sheet).sort());
        expect(schema.safeParse(sheet).success).toBe(true);
      }),
    );
  });

  it('stay inside the hard limits after rounding, and rounding twice changes nothing', () => {
    fc.assert(
      fc.property(validSheetFor(template), (sheet) => {
        const { values } = validateSetupValues(template, sheet);
        for (const [key, value] of Object.entries(values)) {
          const field = fieldsByKey(template).get(key)!;
          if (field.type === 'number' || field.type === 'integer') {
            expect(value as number).toBeGreaterThanOrEqual(field.min);
            expect(value as number).toBeLessThanOrEqual(field.max);
          }
        }
        expect(validateSetupValues(template, values).values).toEqual(values);
      }),
    );
  });

  it('warn exactly for the numbers outside their plausible band', () => {
    fc.assert(
      fc.property(validSheetFor(template), (sheet) => {
        const { values, warnings } = validateSetupValues(template, sheet);
        const unusual = Object.entries(values)
          .filter(([key, value]) => {
            const field = fieldsByKey(template).get(key)!;
            if ((field.type !== 'number' && field.type !== 'integer') || !field.plausible) return false;
            return (value as number) < field.plausible.min || (value as number) > field.plausible.max;
          })
          .map(([key]) => key);
        expect(Object.keys(warnings).sort()).toEqual(unusual.sort());
      }),
    );
  });

  it('refuse any number past a hard limit, naming the field and its limits', () => {
    const fields = rangedFields(template);
    fc.assert(
      fc.property(
        fc.constantFrom(...fields),
        fc.boolean(),
        fc.integer({ min: 1, max: 1000 }),
        (field, above, stepsOut) => {
          const value = above ? field.max + stepsOut * field.step : field.min - stepsOut * field.step;
          const result = validateSetupValues(template, { [field.key]: value });
          expect(result.ok).toBe(false);
          expect(result.errors[field.key]).toMatch(new RegExp(`^${escape(field.label)} must be between ${field.min} and ${field.max}`));
        },
      ),
    );
  });
});

function escape(text: string): string {
  return text.replace(/[.*+?^${}()|[\]\\]/g, '\\$&');
}
