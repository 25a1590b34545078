import type { z } from '../zod';
import { fieldsByKey } from './lookup';
import { plausibleWarning } from './messages';
import type { SetupTemplate, SetupValues } from './types';
import { buildValuesSchema, fieldValueSchema, isPlainRecord } from './valuesSchema';

/** Key for a problem with the sheet as a whole (not an object), which no field key can equal. */
export const SHEET_ERROR_KEY = '_sheet';

export interface SetupValidationResult {
  ok: boolean;
  /** The cleaned values; when not ok, only the fields that passed, so a draft can keep them. */
  values: SetupValues;
  /** Refusals by field key, one message each. */
  errors: Record<string, string>;
  /** Accepted but unusual values by field key, from the plausible ranges. */
  warnings: Record<string, string>;
}

const schemaCache = new WeakMap<SetupTemplate, z.ZodType<SetupValues>>();

function valuesSchemaFor(template: SetupTemplate): z.ZodType<SetupValues> {
  let schema = schemaCache.get(template);
  if (!schema) {
    schema = buildValuesSchema(template);
    schemaCache.set(template, schema);
  }
  return schema;
}

// Object.fromEntries keeps a key such as "__proto__" as a plain own property.
function firstMessageByKey(issues: readonly z.core.$ZodIssue[]): Record<string, string> {
  const byKey = new Map<string, string>();
  for (const issue of issues) {
    const key = issue.path.length > 0 ? String(issue.path[0]) : SHEET_ERROR_KEY;
    if (!byKey.has(key)) byKey.set(key, issue.message);
  }
  return Object.fromEntries(byKey);
}

function passingFields(template: SetupTemplate, input: unknown, errors: Record<string, string>): SetupValues {
  if (!isPlainRecord(input)) return {};
  const entries: Array<[string, SetupValues[string]]> = [];
  for (const [key, raw] of Object.entries(input)) {
    const field = fieldsByKey(template).get(key);
    if (!field || Object.hasOwn(errors, key) || raw === undefined) continue;
    const parsed = fieldValueSchema(field).safeParse(raw);
    if (parsed.success) entries.push([key, parsed.data]);
  }
  return Object.fromEntries(entries);
}

function plausibilityWarnings(template: SetupTemplate, values: SetupValues): Record<string, string> {
  const entries: Array<[string, string]> = [];
  for (const [key, value] of Object.entries(values)) {
    const field = fieldsByKey(template).get(key);
    if (!field || (field.type !== 'number' && field.type !== 'integer') || !field.plausible) continue;
    if (typeof value !== 'number') continue;
    if (value < field.plausible.min || value > field.plausible.max) {
      entries.push([key, plausibleWarning(field, value, template)]);
    }
  }
  return Object.fromEntries(entries);
}

/**
 * Checks a (possibly partial) sheet against its template. Errors refuse the sheet; warnings only
 * flag values outside the usual range for the class, which the racer may keep.
 */
export function validateSetupValues(template: SetupTemplate, values: unknown): SetupValidationResult {
  const parsed = valuesSchemaFor(template).safeParse(values);
  if (parsed.success) {
    const clean = Object.fromEntries(Object.entries(parsed.data).filter(([, v]) => v !== undefined));
    return { ok: true, values: clean, errors: {}, warnings: plausibilityWarnings(template, clean) };
  }
  const errors = firstMessageByKey(parsed.error.issues);
  const kept = passingFields(template, values, errors);
  return { ok: false, values: kept, errors, warnings: plausibilityWarnings(template, kept) };
}
