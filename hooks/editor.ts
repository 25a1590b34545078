import { useQuery, useQueryClient } from '@tanstack/react-query';
import { useEffect, useMemo, useRef, useState } from 'react';
import {
  MM_PER_INCH,
  celsiusToFahrenheit,
  diffSetupValues,
  displayUnitLabel,
  mmToInches,
  parseFromDisplay,
  type FieldChange,
} from '../shared/compute/setup';
import type { UnitPreferences } from '../shared/types/auth';
import { revisionCreateSchema, setupValuesSchema, staleRevisionDetailsSchema, type RevisionCreate, type SetupDetail } from '../shared/types/setups';
import { fieldsByKey, validateSetupValues, type SetupFieldValue, type SetupTemplate, type SetupValues, type TemplateField } from '../shared/types/templates';
import { decimalsOf } from '../shared/types/templates/valuesSchema';
import { z } from '../shared/types/zod';
import { ApiRequestError } from './api';

export type NumericField = Extract<TemplateField, { type: 'number' | 'integer' }>;
type Converted = 'in' | 'F';

function convertedUnit(field: NumericField, units: UnitPreferences): Converted | null {
  if (field.unit === 'mm' && units.length === 'in') return 'in';
  if (field.unit === '°C' && units.temperature === 'F') return 'F';
  return null;
}

const kindOf = (field: NumericField) => (field.unit === 'mm' ? 'length' : field.unit === '°C' ? 'temperature' : 'stored');
const storedLabel = (field: NumericField) => (field.unit === 'deg' ? '°' : (field.unit ?? ''));

/** The unit a racer reads this field in: their length and temperature choice, anything else as stored. */
export function fieldUnitLabel(field: NumericField, units: UnitPreferences): string {
  return displayUnitLabel(kindOf(field), units, storedLabel(field));
}

const SCALE: Record<Converted, number> = { in: 1 / MM_PER_INCH, F: 9 / 5 };

// Enough places that typing the shown number back stores the same value: 1.25 mm needs 0.0492 in,
// where the usual thousandths (0.049) would come back as 1.24 mm.
function shownDecimals(field: NumericField, unit: Converted): number {
  return Math.max(0, Math.floor(decimalsOf(field.step) - Math.log10(SCALE[unit])) + 1);
}

/** A stored number as the racer types it, without the unit: 27.5 → "27.5", or "1.083" in inches. */
export function formatFieldNumber(field: NumericField, valueSi: number, units: UnitPreferences): string {
  const unit = convertedUnit(field, units);
  if (!unit) return String(valueSi);
  const text = (unit === 'in' ? mmToInches(valueSi) : celsiusToFahrenheit(valueSi)).toFixed(shownDecimals(field, unit));
  return Number(text) === 0 ? text.replace('-', '') : text;
}

function roundToStep(field: NumericField, value: number): number {
  const factor = 10 ** decimalsOf(field.step);
  return Math.round(value * factor) / factor + 0;
}

const NICE_STEPS = [0.001, 0.002, 0.005, 0.01, 0.02, 0.025, 0.05, 0.1, 0.125, 0.25, 0.5, 1, 2, 5, 10, 20, 50, 100];

/** The stepper's increment in the racer's unit: the stored step converted, then rounded to a number people use. */
export function displayStep(field: NumericField, units: UnitPreferences): number {
  const unit = convertedUnit(field, units);
  if (!unit) return field.step;
  const raw = field.step * SCALE[unit];
  return NICE_STEPS.reduce((best, s) => (Math.abs(Math.log(s / raw)) < Math.abs(Math.log(best / raw)) ? s : best));
}

/** One press of − or +: moves by the step in the racer's unit and stays inside the field's limits. */
export function stepFieldValue(field: NumericField, current: SetupFieldValue | undefined, direction: 1 | -1, units: UnitPreferences): number {
  const clamp = (v: number) => roundToStep(field, Math.min(field.max, Math.max(field.min, v)));
  if (typeof current !== 'number') return clamp(field.plausible?.min ?? field.min);
  const unit = convertedUnit(field, units);
  let next = current + direction * field.step;
  if (unit) {
    const shown = Number(formatFieldNumber(field, current, units)) + direction * displayStep(field, units);
    const converted = roundToStep(field, parseFromDisplay(shown, kindOf(field), units));
    // Rounding back to the stored grid can swallow a small inch step; then move by the stored step.
    if (converted !== current) next = converted;
  }
  return clamp(next);
}

export type ParsedText = { ok: true; value: number | undefined } | { ok: false; error: string };

/** Reads what was typed into a number field back into the stored unit; empty clears the field. */
export function parseFieldText(field: NumericField, text: string, units: UnitPreferences): ParsedText {
  let typed = text.trim();
  if (typed === '') return { ok: true, value: undefined };
  if (!typed.includes('.')) typed = typed.replace(',', '.');
  try {
    const value = parseFromDisplay(typed, kindOf(field), units, storedLabel(field));
    // Whole-number fields keep a typed fraction so the check can say so instead of rounding quietly.
    return { ok: true, value: field.type === 'integer' && !convertedUnit(field, units) ? value : roundToStep(field, value) };
  } catch {
    return { ok: false, error: `Type a number for ${field.label.toLowerCase()}, such as ${field.step < 1 ? '27.5' : '12'}, with a dot for decimals.` };
  }
}

const joinUnit = (number: string, unit: string) => (unit === '' || unit === '°' || unit === '%' ? `${number}${unit}` : `${number} ${unit}`);

/** Any stored value in words, for "was …" notes and the conflict list. */
export function describeValue(field: TemplateField, value: SetupFieldValue | undefined, units: UnitPreferences): string {
  if (value === undefined || value === '') return 'not set';
  switch (field.type) {
    case 'number':
    case 'integer':
      return typeof value === 'number' ? joinUnit(formatFieldNumber(field, value, units), fieldUnitLabel(field, units)) : String(value);
    case 'choice':
      return field.options.find((o) => o.value === value)?.label ?? String(value);
    case 'boolean':
      return value === true ? 'Yes' : 'No';
    case 'position':
      return `Hole ${String(value)}`;
    case 'text':
      return `“${String(value)}”`;
  }
}

export type DraftCheck = { errors: Record<string, string>; warnings: Record<string, string> };

/** The server's own rules (validateSetupValues), with limits worded in the racer's units. */
export function checkDraft(template: SetupTemplate, values: SetupValues, texts: Record<string, string>, units: UnitPreferences): DraftCheck {
  const result = validateSetupValues(template, values);
  const fields = fieldsByKey(template);
  const errors: Record<string, string> = {};
  const warnings: Record<string, string> = {};
  const shown = (f: NumericField, v: number) => joinUnit(formatFieldNumber(f, v, units), fieldUnitLabel(f, units));
  for (const [key, message] of Object.entries(result.errors)) {
    const field = fields.get(key);
    const value = values[key];
    const outside = field && (field.type === 'number' || field.type === 'integer') && typeof value === 'number' && (value < field.min || value > field.max);
    errors[key] = outside ? `${field.label} must be between ${shown(field, field.min)} and ${shown(field, field.max)}.` : message;
  }
  for (const [key, text] of Object.entries(texts)) {
    const field = fields.get(key);
    const parsed = field && (field.type === 'number' || field.type === 'integer') ? parseFieldText(field, text, units) : null;
    if (parsed && !parsed.ok) errors[key] = parsed.error;
  }
  for (const key of Object.keys(result.warnings)) {
    const field = fields.get(key);
    if (!field || errors[key] || (field.type !== 'number' && field.type !== 'integer') || !field.plausible) continue;
    warnings[key] = `Unusual for a ${template.label}: most racers run ${shown(field, field.plausible.min)} to ${shown(field, field.plausible.max)}. Worth checking the number and its unit.`;
  }
  return { errors, warnings };
}

/** Every save after the sheet's first revision needs a note; editing always makes revision 2 or later. */
export function isChangeNoteRequired(nextRevisionNumber: number): boolean {
  return nextRevisionNumber > 1;
}

export function changeNoteError(note: string, nextRevisionNumber: number): string | null {
  if (!isChangeNoteRequired(nextRevisionNumber) && note.trim() === '') return null;
  const parsed = revisionCreateSchema.shape.changeNote.safeParse(note);
  return parsed.success ? null : (parsed.error.issues[0]?.message ?? 'Add a change note.');
}

export type StaleRevision = z.infer<typeof staleRevisionDetailsSchema>['currentRevision'];
export type ConflictChoice = 'mine' | 'theirs';
export type ConflictRow = {
  key: string;
  mine: SetupFieldValue | undefined;
  theirs: SetupFieldValue | undefined;
  editedByMe: boolean;
  /** False when the newer revision kept the value both started from, and only the racer changed it. */
  editedByThem: boolean;
};
export type EditorConflict = { revision: StaleRevision; rows: ConflictRow[]; choices: Record<string, ConflictChoice> };

/**
 * Every field where the newer revision and the draft disagree. What the racer typed defaults to
 * "keep mine"; a field they never touched defaults to the newer value, because keeping the old one
 * would quietly undo the newer save with a number nobody typed.
 */
export function buildConflict(base: SetupValues, mine: SetupValues, revision: StaleRevision): EditorConflict {
  const rows = diffSetupValues(revision.values, mine).map(({ key, before, after }) => ({
    key,
    theirs: before,
    mine: after,
    editedByMe: !Object.is(base[key], mine[key]),
    editedByThem: !Object.is(base[key], revision.values[key]),
  }));
  const choices = Object.fromEntries(rows.map((r): [string, ConflictChoice] => [r.key, r.editedByMe ? 'mine' : 'theirs']));
  return { revision, rows, choices };
}

/** The draft after the racer's choices, to be saved on top of the newer revision. */
export function mergeConflict(mine: SetupValues, conflict: EditorConflict): SetupValues {
  const merged = { ...mine };
  for (const row of conflict.rows) {
    if (conflict.choices[row.key] !== 'theirs') continue;
    if (row.theirs === undefined) delete merged[row.key];
    else merged[row.key] = row.theirs;
  }
  return merged;
}

export type ServerRejection = { fields: Record<string, string>; form: string | null; conflict: StaleRevision | null };

/** Sorts a failed save into a newer revision, messages for fields (and the note), or one for the form. */
export function readSaveError(error: unknown): ServerRejection {
  const none = { fields: {}, form: null, conflict: null };
  if (!(error instanceof ApiRequestError)) return { ...none, form: error instanceof Error ? error.message : 'The save failed. Try again.' };
  if (error.status === 409 && error.code === 'stale_revision') {
    const details = staleRevisionDetailsSchema.safeParse(error.details);
    if (details.success) return { ...none, conflict: details.data.currentRevision };
  }
  if (error.code !== 'validation_failed' || !error.details) return { ...none, form: error.message };
  const fields: Record<string, string> = {};
  for (const [path, message] of Object.entries(error.details)) {
    if (typeof message === 'string') fields[path.replace(/^values\./, '')] = message;
  }
  return { ...none, fields, form: error.message };
}

const storedDraftSchema = z.object({
  base: z.object({ id: z.number().int(), number: z.number().int(), values: setupValuesSchema }),
  values: setupValuesSchema,
  note: z.string(),
});
export type StoredDraft = z.infer<typeof storedDraftSchema>;

// The browser's back button resets the navigator without a beforeRemove event, so on the web an
// unsaved draft is also kept in this tab's sessionStorage and comes back when the editor reopens.
function draftStore(): Storage | null {
  try {
    return typeof window !== 'undefined' && window.sessionStorage ? window.sessionStorage : null;
  } catch {
    return null; // storage switched off in the browser: the leave warnings still stand
  }
}

const storageKey = (setupId: number) => `tunefork.editor-draft.${setupId}`;

export function readStoredDraft(setupId: number): StoredDraft | null {
  try {
    const raw = draftStore()?.getItem(storageKey(setupId));
    const parsed = raw ? storedDraftSchema.safeParse(JSON.parse(raw)) : null;
    return parsed?.success ? parsed.data : null;
  } catch {
    return null;
  }
}

export function writeStoredDraft(setupId: number, draft: StoredDraft | null): void {
  try {
    if (draft) draftStore()?.setItem(storageKey(setupId), JSON.stringify(draft));
    else draftStore()?.removeItem(storageKey(setupId));
  } catch {
    // A full or blocked store only loses the back-button safety net.
  }
}

type Base = StoredDraft['base'];
type DraftState = {
  base: Base;
  values: SetupValues;
  /** Raw text of number fields being typed in, so "1." or a typo is never replaced under the racer's fingers. */
  texts: Record<string, string>;
  note: string;
  server: ServerRejection;
  conflict: EditorConflict | null;
  /** A save was tried: from now an empty note is shown as a problem. */
  attempted: boolean;
  /** The draft came back from an earlier visit rather than from the current revision. */
  restored: boolean;
};

const NO_REJECTION: ServerRejection = { fields: {}, form: null, conflict: null };

function withValue(values: SetupValues, key: string, value: SetupFieldValue | undefined): SetupValues {
  const next = { ...values };
  if (value === undefined) delete next[key];
  else next[key] = value;
  return next;
}

function without<T>(record: Record<string, T>, key: string): Record<string, T> {
  const { [key]: _gone, ...rest } = record;
  return rest;
}

/** The editor's draft: values in stored units, what changed against the base revision, checks and conflicts. */
export function useEditorDraft(setup: SetupDetail, template: SetupTemplate, units: UnitPreferences) {
  const fresh = (): DraftState => {
    const { id, number, values } = setup.currentRevision;
    return { base: { id, number, values }, values, texts: {}, note: '', server: NO_REJECTION, conflict: null, attempted: false, restored: false };
  };
  // A draft kept on an older base is restored as it was: saving it meets the conflict panel.
  const [state, setState] = useState<DraftState>(() => {
    const stored = readStoredDraft(setup.id);
    return stored ? { ...fresh(), ...stored, restored: true } : fresh();
  });
  const forgotten = useRef(false);
  const check = useMemo(() => checkDraft(template, state.values, state.texts, units), [template, state.values, state.texts, units]);
  const changes: FieldChange[] = useMemo(() => diffSetupValues(state.base.values, state.values), [state.base.values, state.values]);
  const nextNumber = state.base.number + 1;
  const noteError = state.attempted || state.note !== '' ? (state.server.fields.changeNote ?? changeNoteError(state.note, nextNumber)) : null;

  const edit = (key: string, update: (s: DraftState) => Partial<DraftState>) =>
    setState((s) => ({ ...s, ...update(s), server: { ...s.server, fields: without(s.server.fields, key) } }));

  const actions = {
    setValue: (key: string, value: SetupFieldValue | undefined) =>
      edit(key, (s) => ({ values: withValue(s.values, key, value), texts: without(s.texts, key) })),
    setText: (field: NumericField, text: string) =>
      edit(field.key, (s) => {
        const parsed = parseFieldText(field, text, units);
        return { texts: { ...s.texts, [field.key]: text }, values: parsed.ok ? withValue(s.values, field.key, parsed.value) : s.values };
      }),
    /** Leaving a number field shows the value as it will be stored, once it reads as a number. */
    finishTyping: (field: NumericField) =>
      setState((s) => (field.key in s.texts && parseFieldText(field, s.texts[field.key], units).ok ? { ...s, texts: without(s.texts, field.key) } : s)),
    step: (field: NumericField, direction: 1 | -1) =>
      edit(field.key, (s) => ({ values: withValue(s.values, field.key, stepFieldValue(field, s.values[field.key], direction, units)), texts: without(s.texts, field.key) })),
    setNote: (note: string) => setState((s) => ({ ...s, note, server: { ...s.server, fields: without(s.server.fields, 'changeNote') } })),
    choose: (key: string, choice: ConflictChoice) =>
      setState((s) => (s.conflict ? { ...s, conflict: { ...s.conflict, choices: { ...s.conflict.choices, [key]: choice } } } : s)),
    /** Applies the choices and moves the base to the newer revision, so the next save goes on top of it. */
    applyConflict: () =>
      setState((s) => {
        if (!s.conflict) return s;
        const { id, number, values } = s.conflict.revision;
        const texts = Object.fromEntries(Object.entries(s.texts).filter(([key]) => s.conflict!.choices[key] !== 'theirs'));
        return { ...s, base: { id, number, values }, values: mergeConflict(s.values, s.conflict), texts, conflict: null, server: NO_REJECTION };
      }),
    /** The request to send, or null (with the problems now showing) when something must be fixed first. */
    prepareSave: (): RevisionCreate | null => {
      setState((s) => ({ ...s, attempted: true, server: NO_REJECTION }));
      const blocked = state.conflict || Object.keys(check.errors).length > 0 || changeNoteError(state.note, nextNumber) !== null;
      return blocked ? null : { baseRevisionId: state.base.id, values: state.values, changeNote: state.note.trim() };
    },
    /** After a save, or once the racer chose to leave without saving: nothing to bring back. */
    forget: () => {
      forgotten.current = true;
      writeStoredDraft(setup.id, null);
    },
    discardRestored: () => {
      writeStoredDraft(setup.id, null);
      setState(fresh());
    },
    rejected: (error: unknown) =>
      setState((s) => {
        const server = readSaveError(error);
        return server.conflict ? { ...s, server: NO_REJECTION, conflict: buildConflict(s.base.values, s.values, server.conflict) } : { ...s, server };
      }),
  };

  const fields = fieldsByKey(template);
  const errors = { ...Object.fromEntries(Object.entries(state.server.fields).filter(([key]) => fields.has(key))), ...check.errors };
  // Messages about no field on the sheet (the sheet as a whole, the base revision) go to the banner.
  const elsewhere = Object.entries(state.server.fields).filter(([key]) => !fields.has(key) && key !== 'changeNote');
  const formError = [state.server.form, ...elsewhere.map(([, message]) => message)].filter(Boolean).join(' ') || null;
  const dirty = changes.length > 0 || state.note.trim() !== '';
  useEffect(() => {
    if (forgotten.current) return;
    writeStoredDraft(setup.id, dirty ? { base: state.base, values: state.values, note: state.note } : null);
  }, [setup.id, dirty, state.base, state.values, state.note]);
  return { state, changes, errors, warnings: check.warnings, noteError, formError, nextNumber, dirty, actions };
}

export const editorKeys = {
  savedNotice: (setupId: number) => ['editor', 'saved-notice', setupId] as const,
};

/** What the setup page tells the racer after a save: the new revision and the values worth a second look. */
export type SavedRevisionNotice = { revisionNumber: number; warnings: string[] };

/**
 * The editor leaves a notice here before it navigates back; the setup page reads and dismisses it.
 * Client-side only (never fetched), so it lives in the query cache rather than the URL.
 */
export function useSavedRevisionNotice(setupId: number) {
  const queryClient = useQueryClient();
  const key = editorKeys.savedNotice(setupId);
  const { data } = useQuery<SavedRevisionNotice | null>({ queryKey: key, queryFn: () => null, enabled: false, staleTime: Infinity });
  return {
    notice: data ?? null,
    remember: (notice: SavedRevisionNotice) => queryClient.setQueryData(key, notice),
    dismiss: () => queryClient.setQueryData(key, null),
  };
}
