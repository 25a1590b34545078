import { router, useLocalSearchParams } from 'expo-router';
import { useEffect, useMemo, useRef } from 'react';
import { StyleSheet, View, type TextInput } from 'react-native';
import { AppText } from '../../../components/AppText';
import { ChangeNoteField } from '../../../components/ChangeNoteField';
import { ConflictPanel } from '../../../components/ConflictPanel';
import { EditorNotOwner } from '../../../components/EditorNotOwner';
import { EditorSaveBar } from '../../../components/EditorSaveBar';
import { EditorScreen, useEditorNavigation } from '../../../components/EditorScreen';
import { EditorSection } from '../../../components/EditorSection';
import { EditorSectionIndex, type EditorIndexEntry } from '../../../components/EditorSectionIndex';
import { FieldRow, type FieldHandlers } from '../../../components/FieldRow';
import { FormErrorBanner } from '../../../components/FormErrorBanner';
import { Screen } from '../../../components/Screen';
import { SignedInGate } from '../../../components/SignedInGate';
import { ErrorState, LoadingState } from '../../../components/StatusViews';
import { UnsavedChangesGuard } from '../../../components/UnsavedChangesGuard';
import { UnsavedLeaveLink } from '../../../components/UnsavedLeaveLink';
import { UnsavedRestoredNotice } from '../../../components/UnsavedRestoredNotice';
import { ApiRequestError } from '../../../hooks/api';
import { signInHref, useMeQuery } from '../../../hooks/auth';
import {
  describeValue,
  fieldUnitLabel,
  formatFieldNumber,
  isChangeNoteRequired,
  readSaveError,
  useEditorDraft,
  useSavedRevisionNotice,
} from '../../../hooks/editor';
import { useSaveRevision, useSetupQuery } from '../../../hooks/setups';
import type { UnitPreferences } from '../../../shared/types/auth';
import type { SetupDetail } from '../../../shared/types/setups';
import { fieldsByKey, getTemplate, type TemplateField } from '../../../shared/types/templates';
import { space, useTheme } from '../../../theme';

type SetupQuery = ReturnType<typeof useSetupQuery>;

function unitsLine(units: UnitPreferences): string {
  return `Lengths in ${units.length === 'in' ? 'inches' : 'millimetres'}, temperatures in °${units.temperature}. You can change this in Settings.`;
}

function SetupEditor({ setup, units }: { setup: SetupDetail; units: UnitPreferences }) {
  const template = getTemplate(setup.vehicleClass);
  const { isWide } = useTheme();
  const draft = useEditorDraft(setup, template, units);
  const { state, actions, errors, warnings } = draft;
  const save = useSaveRevision(setup.id);
  const savedNotice = useSavedRevisionNotice(setup.id);
  // Wide screens have room for the whole sheet; on a phone one open section at a time stays scannable.
  const nav = useEditorNavigation(isWide ? template.sections.map((s) => s.key) : [template.sections[0].key]);
  const leaveApproved = useRef(false);
  const noteRef = useRef<TextInput>(null);
  const setupHref = `/setups/${setup.id}` as const;

  const changedKeys = useMemo(() => new Set(draft.changes.map((c) => c.key)), [draft.changes]);
  const entries: EditorIndexEntry[] = template.sections.map((s) => ({
    key: s.key,
    label: s.label,
    changedCount: s.fields.filter((f) => changedKeys.has(f.key)).length,
    problemCount: s.fields.filter((f) => errors[f.key]).length,
  }));
  const problemCount = entries.reduce((sum, e) => sum + e.problemCount, 0);

  // A newer revision turned up: bring the racer to the panel that explains it.
  const conflict = state.conflict;
  const conflictShown = conflict !== null;
  const { jumpTo } = nav;
  useEffect(() => {
    if (!conflictShown) return;
    // After the panel has been laid out, so the browser's scroll anchoring cannot move it off screen.
    const frame = requestAnimationFrame(() => jumpTo('conflict'));
    return () => cancelAnimationFrame(frame);
  }, [conflictShown, jumpTo]);

  const onSave = () => {
    const payload = actions.prepareSave();
    if (!payload) {
      const withProblem = entries.find((e) => e.problemCount > 0);
      if (withProblem) nav.jumpTo(withProblem.key);
      else if (!conflict) {
        nav.jumpTo('note');
        noteRef.current?.focus();
      }
      return;
    }
    save.mutate(payload, {
      onSuccess: (result) => {
        const serverWarnings = Object.entries(result.warnings).map(([key, message]) => warnings[key] ?? message);
        savedNotice.remember({ revisionNumber: result.setup.currentRevision.number, warnings: serverWarnings });
        actions.forget();
        leaveApproved.current = true;
        router.dismissTo(setupHref);
      },
      onError: (error) => {
        actions.rejected(error);
        if (!(error instanceof ApiRequestError) || error.code !== 'validation_failed') return;
        // The server's messages land under their fields: open those sections and go to the first.
        const refused = readSaveError(error).fields;
        const sections = template.sections.filter((s) => s.fields.some((f) => refused[f.key])).map((s) => s.key);
        nav.openAll(sections);
        if (sections[0]) nav.jumpTo(sections[0]);
      },
    });
  };

  const handlers: FieldHandlers = { onValue: actions.setValue, onText: actions.setText, onFinishTyping: actions.finishTyping, onStep: actions.step };
  const renderField = (field: TemplateField) => {
    const value = state.values[field.key];
    const numeric = field.type === 'number' || field.type === 'integer';
    const shown = numeric && typeof value === 'number' ? formatFieldNumber(field, value, units) : '';
    return (
      <FieldRow
        key={field.key}
        field={field}
        value={value}
        text={state.texts[field.key] ?? shown}
        unitLabel={numeric ? fieldUnitLabel(field, units) : ''}
        error={errors[field.key]}
        warning={warnings[field.key]}
        previous={changedKeys.has(field.key) ? describeValue(field, state.base.values[field.key], units) : undefined}
        handlers={handlers}
      />
    );
  };

  const fieldOf = (key: string) => fieldsByKey(template).get(key);
  return (
    <EditorScreen
      scrollRef={nav.scrollRef}
      columnRef={nav.columnRef}
      sideIndex={<EditorSectionIndex entries={entries} onJump={nav.jumpTo} variant="side" />}
      saveBar={
        <EditorSaveBar
          changedCount={draft.changes.length}
          problemCount={problemCount}
          nextRevisionNumber={conflict ? conflict.revision.number + 1 : draft.nextNumber}
          saving={save.isPending}
          conflictOpen={conflict !== null}
          onSave={onSave}
        />
      }
    >
      <View style={styles.header}>
        <UnsavedLeaveLink href={setupHref} label="Back to the setup" dirty={draft.dirty} leaveApproved={leaveApproved} onDiscard={actions.forget} />
        <AppText variant="title">Edit {setup.title}</AppText>
        <AppText tone="muted">
          {setup.car.nickname} · {template.label} · editing revision {state.base.number}
        </AppText>
        <AppText variant="caption" tone="muted">
          {unitsLine(units)}
        </AppText>
      </View>
      {state.restored && draft.dirty ? (
        <UnsavedRestoredNotice changedCount={draft.changes.length} hasNote={state.note.trim() !== ''} onDiscard={actions.discardRestored} />
      ) : null}
      {isWide ? null : <EditorSectionIndex entries={entries} onJump={nav.jumpTo} variant="chips" />}
      {conflict ? (
        <View ref={nav.anchor('conflict')}>
        <ConflictPanel
          revisionNumber={conflict.revision.number}
          authorHandle={conflict.revision.authorHandle}
          savedAt={conflict.revision.createdAt}
          changeNote={conflict.revision.changeNote}
          rows={conflict.rows.map((row) => {
            const field = fieldOf(row.key);
            return {
              key: row.key,
              label: field?.label ?? row.key,
              mine: field ? describeValue(field, row.mine, units) : String(row.mine),
              theirs: field ? describeValue(field, row.theirs, units) : String(row.theirs),
              editedByMe: row.editedByMe,
              editedByThem: row.editedByThem,
              choice: conflict.choices[row.key] ?? 'mine',
            };
          })}
          onChoose={actions.choose}
          onApply={actions.applyConflict}
        />
        </View>
      ) : null}
      <FormErrorBanner message={draft.formError} />
      {template.sections.map((section) => (
        <EditorSection
          key={section.key}
          label={section.label}
          fields={section.fields}
          expanded={nav.open.has(section.key)}
          onToggle={() => nav.toggle(section.key)}
          changedCount={entries.find((e) => e.key === section.key)?.changedCount ?? 0}
          problemCount={entries.find((e) => e.key === section.key)?.problemCount ?? 0}
          renderField={renderField}
          anchorRef={nav.anchor(section.key)}
        />
      ))}
      <View ref={nav.anchor('note')} style={styles.note}>
        <AppText variant="heading">Save this revision</AppText>
        <ChangeNoteField value={state.note} onChangeText={actions.setNote} required={isChangeNoteRequired(draft.nextNumber)} error={draft.noteError} inputRef={noteRef} />
      </View>
      <UnsavedChangesGuard active={draft.dirty} leaveApproved={leaveApproved} onDiscard={actions.forget} />
    </EditorScreen>
  );
}

function LoadStates({ setupId, setup }: { setupId: number; setup: SetupQuery }) {
  if (!Number.isSafeInteger(setupId) || setupId <= 0) {
    return <ErrorState title="No such setup" message="This address does not point to a setup. Open one from your garage." />;
  }
  if (setup.isPending) return <LoadingState label="Opening the setup sheet…" />;
  if (setup.error) {
    const missing = setup.error instanceof ApiRequestError && setup.error.status === 404;
    return missing ? (
      <ErrorState title="Setup not found" message="It may have been deleted, or it is private to another racer." />
    ) : (
      <ErrorState title="Could not open the setup" message={setup.error.message} onRetry={() => void setup.refetch()} />
    );
  }
  return <EditorNotOwner setupId={setupId} ownerHandle={setup.data.owner.handle} />;
}

export default function EditSetupScreen() {
  const params = useLocalSearchParams<{ id: string }>();
  const setupId = Number(params.id);
  const me = useMeQuery();
  const setup = useSetupQuery(setupId);
  if (me.data && setup.data?.isOwner) return <SetupEditor setup={setup.data} units={me.data.units} />;
  const valid = Number.isSafeInteger(setupId) && setupId > 0;
  return (
    <Screen title="Edit setup" back={valid ? { href: `/setups/${setupId}`, label: 'Back to the setup' } : { href: '/garage', label: 'Back to the garage' }}>
      <SignedInGate me={me} signInHref={signInHref(`/setups/${params.id}/edit`)}>
        {() => <LoadStates setupId={setupId} setup={setup} />}
      </SignedInGate>
    </Screen>
  );
}

const styles = StyleSheet.create({
  header: { gap: space.xs },
  note: { gap: space.md },
});
