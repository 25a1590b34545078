import { z } from '../zod';
import { fieldsByKey, listFields } from './lookup';
import {
  choiceMessage,
  positionMessage,
  rangeMessage,
  SHEET_SHAPE_MESSAGE,
  unknownFieldMessage,
} from './messages';
import type { SetupFieldValue, SetupTemplate, SetupValues, TemplateField } from './types';

/** Decimal places a step is written with: 0.5 → 1, 0.05 → 2, 25 → 0. */
export function decimalsOf(step: number): number {
  const [, fraction = ''] = String(step).split('.');
  return fraction.length;
}

function roundTo(value: number, decimals: number): number {
  const factor = 10 ** decimals;
  // `+ 0` turns -0 into 0 so a stored sheet never shows "-0".
  return Math.round(value * factor) / factor + 0;
}

/**
 * Steps are respected loosely: a value off the step grid (27.3 mm where the editor steps by 0.5) is
 * accepted, because racers measure with calipers and convert from inches, but it is rounded to the
 * step's decimal places so conversion noise (27.299999 mm) is never stored. Hard limits are checked
 * before rounding; they are written with no more decimals than the step, so rounding a value
 * inside them keeps it inside.
 */
function numericSchema(field: Extract<TemplateField, { type: 'number' | 'integer' }>) {
  const outOfRange = rangeMessage(field);
  const base =
    field.type === 'integer'
      ? z.number({ error: `${field.label} must be a whole number` }).int({ error: `${field.label} must be a whole number` })
      : z.number({ error: `${field.label} must be a number` });
  const decimals = decimalsOf(field.step);
  return base
    .min(field.min, { error: outOfRange })
    .max(field.max, { error: outOfRange })
    .transform((value) => roundTo(value, decimals));
}

function buildFieldSchema(field: TemplateField): z.ZodType<SetupFieldValue> {
  switch (field.type) {
    case 'number':
    case 'integer':
      return numericSchema(field);
    case 'position': {
      const message = positionMessage(field);
      return z
        .number({ error: message })
        .int({ error: message })
        .min(field.min, { error: message })
        .max(field.max, { error: message });
    }
    case 'choice': {
      const values = field.options.map((o) => o.value) as [string, ...string[]];
      return z.enum(values, { error: choiceMessage(field) });
    }
    case 'boolean':
      return z.boolean({ error: `${field.label} must be yes or no` });
    case 'text':
      return z
        .string({ error: `${field.label} must be text` })
        .max(field.maxLength, { error: `${field.label} must be at most ${field.maxLength} characters` });
  }
}

const fieldSchemaCache = new WeakMap<TemplateField, z.ZodType<SetupFieldValue>>();

/** The schema for one field's value, messages written for racers. */
export function fieldValueSchema(field: TemplateField): z.ZodType<SetupFieldValue> {
  let schema = fieldSchemaCache.get(field);
  if (!schema) {
    schema = buildFieldSchema(field);
    fieldSchemaCache.set(field, schema);
  }
  return schema;
}

/**
 * Schema for a sheet's values `{ [fieldKey]: value }`. Every field is optional (partial sheets are
 * allowed); unknown keys, wrong types and out-of-range numbers are refused, each with an issue at
 * the field's own path. Plausible ranges are not checked here: they only warn, see
 * `validateSetupValues`.
 */
export function buildValuesSchema(template: SetupTemplate): z.ZodType<SetupValues> {
  const shape = Object.fromEntries(
    listFields(template).map((field) => [field.key, fieldValueSchema(field).optional()]),
  );
  const unknownField = z.custom(() => false, {
    error: (issue) => unknownFieldMessage(template, String(issue.path?.[0] ?? '')),
  });
  const sheet = z.object(shape, { error: SHEET_SHAPE_MESSAGE }).catchall(unknownField);
  // The object parser skips an own "__proto__" key (it can arrive through JSON.parse) instead of
  // reporting it, so it is refused up front rather than dropped without a word.
  const guarded = z.preprocess((input, ctx) => {
    if (isPlainRecord(input) && Object.hasOwn(input, '__proto__') && !fieldsByKey(template).has('__proto__')) {
      ctx.addIssue({ code: 'custom', path: ['__proto__'], message: unknownFieldMessage(template, '__proto__'), input });
    }
    return input;
  }, sheet);
  return guarded as unknown as z.ZodType<SetupValues>;
}

export function isPlainRecord(value: unknown): value is Record<string, unknown> {
  return typeof value === 'object' && value !== null && !Array.isArray(value);
}
