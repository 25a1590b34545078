import { useCallback, useState } from 'react';
import type { z } from '../shared/types/zod';
import { ApiRequestError } from './api';

/** Field name → the one message shown under that field. */
export type FieldErrors = Partial<Record<string, string>>;

export type DescribedError = { fieldErrors: FieldErrors; formError: string | null };

const NO_ERROR: DescribedError = { fieldErrors: {}, formError: null };

function detailMessage(value: unknown): string | null {
  if (typeof value === 'string') return value;
  if (Array.isArray(value)) return value.map(detailMessage).find((m) => m !== null) ?? null;
  if (value && typeof value === 'object' && 'message' in value && typeof value.message === 'string') return value.message;
  return null;
}

/** "units.length" and "units" both belong to the units control. */
function fieldOf(path: string): string {
  return path.split('.')[0];
}

/** The rate-limit wording, shared so every form says it the same way. */
export function rateLimitMessage(retryAfterSeconds: unknown): string {
  const seconds = typeof retryAfterSeconds === 'number' && retryAfterSeconds > 0 ? Math.ceil(retryAfterSeconds) : null;
  return seconds ? `Too many attempts. Try again in ${seconds} s.` : 'Too many attempts. Wait a moment and try again.';
}

/**
 * Splits a failed request into messages for the form's own fields and one message for the
 * form as a whole. Details for fields the form does not show still reach the racer, in the banner.
 */
export function describeError(error: unknown, fields: readonly string[]): DescribedError {
  if (!error) return NO_ERROR;
  if (!(error instanceof ApiRequestError)) {
    return { fieldErrors: {}, formError: error instanceof Error ? error.message : 'Something went wrong. Try again.' };
  }
  if (error.code === 'rate_limited') return { fieldErrors: {}, formError: rateLimitMessage(error.details?.retryAfterSeconds) };
  if (error.code !== 'validation_failed' || !error.details) return { fieldErrors: {}, formError: error.message };
  const fieldErrors: FieldErrors = {};
  const elsewhere: string[] = [];
  for (const [path, value] of Object.entries(error.details)) {
    const message = detailMessage(value);
    if (!message) continue;
    const field = fieldOf(path);
    if (fields.includes(field)) fieldErrors[field] ??= message;
    else elsewhere.push(message);
  }
  const formError = elsewhere.length > 0 ? elsewhere.join(' ') : Object.keys(fieldErrors).length > 0 ? null : error.message;
  return { fieldErrors, formError };
}

/** Zod's issues as one message per top-level field, first issue wins. */
export function issuesToFieldErrors(issues: readonly { path: readonly PropertyKey[]; message: string }[]): FieldErrors {
  const errors: FieldErrors = {};
  for (const issue of issues) {
    const field = issue.path.length > 0 ? String(issue.path[0]) : 'form';
    errors[field] ??= issue.message;
  }
  return errors;
}

export type UseFormOptions<V extends Record<string, unknown>, Out> = {
  initial: V;
  /** The same shared schema the server validates with, so racers hear about mistakes before sending. */
  schema: z.ZodType<Out>;
  onSubmit: (parsed: Out) => unknown;
  /** The last server failure (a mutation's error); its field details land next to the fields. */
  serverError: unknown;
  pending?: boolean;
  /** Empty the fields once the server accepted them (password forms). */
  clearOnSuccess?: boolean;
};

/** Form state that survives server errors: values stay, messages appear beside the fields. */
export function useForm<V extends Record<string, unknown>, Out>(options: UseFormOptions<V, Out>) {
  const { initial, schema, onSubmit, serverError, pending, clearOnSuccess } = options;
  const [values, setValues] = useState<V>(initial);
  const [clientErrors, setClientErrors] = useState<FieldErrors>({});
  // Server messages for a field disappear once the racer edits that field after that error.
  const [edited, setEdited] = useState<{ error: unknown; fields: string[] }>({ error: null, fields: [] });

  const server = describeError(serverError, Object.keys(initial));
  const editedFields = edited.error === serverError ? edited.fields : [];
  const fieldErrors: FieldErrors = {};
  for (const field of Object.keys(initial)) {
    fieldErrors[field] = clientErrors[field] ?? (editedFields.includes(field) ? undefined : server.fieldErrors[field]);
  }

  const setField = useCallback(
    <K extends keyof V & string>(field: K, value: V[K]) => {
      setValues((prev) => ({ ...prev, [field]: value }));
      setClientErrors((prev) => ({ ...prev, [field]: undefined }));
      setEdited((prev) => ({
        error: serverError,
        fields: [...(prev.error === serverError ? prev.fields : []), field],
      }));
    },
    [serverError],
  );

  const submit = useCallback(async () => {
    if (pending) return;
    const result = schema.safeParse(values);
    if (!result.success) {
      setClientErrors(issuesToFieldErrors(result.error.issues));
      return;
    }
    setClientErrors({});
    try {
      await onSubmit(result.data);
      if (clearOnSuccess) setValues(initial);
    } catch {
      // The caller's mutation holds the error; it comes back in as `serverError`.
    }
  }, [pending, schema, values, onSubmit, clearOnSuccess, initial]);

  return { values, setField, fieldErrors, formError: clientErrors.form ?? server.formError, submit, setValues };
}
