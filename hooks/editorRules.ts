import { diffSetupValues } from '../shared/compute/setup';
import type { UnitPreferences } from '../shared/types/auth';
import { revisionCreateSchema, staleRevisionDetailsSchema } from '../shared/types/setups';
import { fieldsByKey, validateSetupValues, type SetupFieldValue, type SetupTemplate, type SetupValues } from '../shared/types/templates';
import type { z } from '../shared/types/zod';
import { ApiRequestError } from './api';
import { fieldUnitLabel, formatFieldNumber, joinUnit, parseFieldText, type NumericField } from './editorFields';

/** The editor's rules: the server's checks in the racer's units, the change note, conflicts and save errors. */
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

