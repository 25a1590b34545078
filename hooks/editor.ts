import { useQuery, useQueryClient } from '@tanstack/react-query';
import { useEffect, useMemo, useRef, useState } from 'react';
import { diffSetupValues, type FieldChange } from '../shared/compute/setup';
import type { UnitPreferences } from '../shared/types/auth';
import { revisionCreateSchema, type RevisionCreate, type SetupDetail } from '../shared/types/setups';
import { fieldsByKey, type SetupFieldValue, type SetupTemplate, type SetupValues } from '../shared/types/templates';
import { readStoredDraft, writeStoredDraft, type StoredDraft } from './editorDraftStorage';
import { parseFieldText, stepFieldValue, type NumericField } from './editorFields';
import { buildConflict, changeNoteError, checkDraft, mergeConflict, readSaveError, type ConflictChoice, type EditorConflict, type ServerRejection } from './editorRules';

// The editor's helpers live in three modules by concern; screens import them all from here.
export * from './editorDraftStorage';
export * from './editorFields';
export * from './editorRules';


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
