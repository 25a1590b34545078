import { useRef, useState, type ReactNode, type RefObject } from 'react';
import { StyleSheet, View, type TextInput } from 'react-native';
import type { CommentActions } from '../hooks/comments';
import type { UnitPreferences } from '../shared/types/auth';
import type { CommentDto, History } from '../shared/types/forks';
import type { VehicleClassKey } from '../shared/types/vehicleClasses';
import { space, useTheme } from '../theme';
import { AppText } from './AppText';
import { Card } from './Card';
import { CommentForm } from './CommentForm';
import { CommentThread, countVisibleComments } from './CommentThread';
import { RevisionChanges } from './RevisionChanges';
import { ModerationPill } from './ModerationPill';
import { LoadingState } from './StatusViews';
import { formatDay } from './SetupSheetFormat';
import { TextLink } from './TextLink';

export type HistoryRevision = History['revisions'][number];

export type RevisionChangesEntryProps = {
  revision: HistoryRevision;
  /** The setup's newest revision. */
  current: boolean;
  vehicleClass: VehicleClassKey;
  units: UnitPreferences;
  /** Changes and comments side by side on wide windows; comments below on phones. */
  wide: boolean;
  /** Top-level comments on this revision with their replies, or why there are none to show yet. */
  comments: CommentDto[] | 'loading' | 'unavailable';
  actions: CommentActions;
  signedIn: boolean | undefined;
  signInHref: string;
  compareLinks: { href: string; label: string }[];
  /** Moderators hid the change note: its author and moderators still read it, marked as hidden. */
  noteHidden?: boolean;
  /** A control to report the change note, where offered. */
  reportNote?: ReactNode;
  /** A report control per comment, where offered. */
  reportComment?: (comment: CommentDto) => ReactNode;
};

type Field = { key: string; label: string };

function Comments(props: RevisionChangesEntryProps & { field: Field | null; setField: (f: Field | null) => void; inputRef: RefObject<TextInput | null> }) {
  const { revision, comments, actions, signedIn, signInHref, field, setField, inputRef, reportComment } = props;
  const count = Array.isArray(comments) ? countVisibleComments(comments) : null;
  return (
    <View style={styles.stack} role="region" aria-label={`Comments on revision ${revision.number}`}>
      <AppText role="heading" aria-level={3} style={styles.bold}>
        {count === null ? 'Comments on this change' : `Comments on this change (${count})`}
      </AppText>
      {comments === 'loading' ? (
        <LoadingState label="Loading the comments…" />
      ) : comments === 'unavailable' ? (
        <AppText tone="muted">The comments could not load; try again from the top of the page.</AppText>
      ) : comments.length === 0 ? (
        <AppText tone="muted">No comments on this change yet.</AppText>
      ) : (
        <CommentThread comments={comments} actions={actions} signedIn={signedIn} signInHref={signInHref} label={`Comments on revision ${revision.number}`} report={reportComment} />
      )}
      <CommentForm
        label={`Comment on revision ${revision.number}`}
        submitLabel="Post comment"
        signedIn={signedIn}
        signInHref={signInHref}
        inputRef={inputRef}
        context={field ? { label: `On ${field.label}`, onClear: () => setField(null) } : undefined}
        onSubmit={(bodyMarkdown) =>
          actions.post({ bodyMarkdown, revisionId: revision.id, fieldKey: field?.key ?? null }).then(() => setField(null))
        }
      />
    </View>
  );
}

/** The note, or that moderators hid it (with its words for those who may still read them). */
function ChangeNote({ note, hidden }: { note: string; hidden: boolean }) {
  if (!hidden) return <AppText>{note || 'No change note.'}</AppText>;
  return (
    <View style={styles.hiddenNote}>
      <ModerationPill label="Change note hidden by moderators" tone="waiting" />
      {note ? <AppText tone="muted">{note}</AppText> : null}
    </View>
  );
}

/** One revision in the history: who changed what and why, links to compare it, and the talk about it. */
export function RevisionChangesEntry(props: RevisionChangesEntryProps) {
  const { revision, current, vehicleClass, units, wide, signedIn, compareLinks, noteHidden, reportNote } = props;
  const { colors } = useTheme();
  const [field, setField] = useState<Field | null>(null);
  const inputRef = useRef<TextInput>(null);
  const pickField = (picked: Field) => {
    setField(picked);
    inputRef.current?.focus();
  };
  const changes = (
    <View style={styles.stack}>
      <RevisionChanges
        changes={revision.changes}
        vehicleClass={vehicleClass}
        units={units}
        revisionNumber={revision.number}
        onCommentOnField={signedIn ? pickField : undefined}
      />
      {compareLinks.map((link) => (
        <TextLink key={link.href} href={link.href} label={link.label} />
      ))}
    </View>
  );
  const comments = <Comments {...props} field={field} setField={setField} inputRef={inputRef} />;
  return (
    <Card role="article" aria-label={`Revision ${revision.number}`}>
      <AppText variant="heading">
        Revision {revision.number}
        {current ? ' · current' : ''}
      </AppText>
      <View style={styles.meta}>
        <AppText variant="caption" tone="muted">
          {formatDay(revision.createdAt)} by
        </AppText>
        <TextLink href={`/racers/${revision.authorHandle}`} label={`@${revision.authorHandle}`} />
      </View>
      <ChangeNote note={revision.changeNote} hidden={Boolean(noteHidden)} />
      {reportNote}
      {wide ? (
        <View style={styles.columns}>
          <View style={styles.left}>{changes}</View>
          <View style={[styles.right, { borderColor: colors.border }]}>{comments}</View>
        </View>
      ) : (
        <>
          {changes}
          <View style={[styles.below, { borderColor: colors.border }]}>{comments}</View>
        </>
      )}
    </Card>
  );
}

const styles = StyleSheet.create({
  stack: { gap: space.sm },
  bold: { fontWeight: '700' },
  meta: { flexDirection: 'row', flexWrap: 'wrap', alignItems: 'center', gap: space.xs },
  columns: { flexDirection: 'row', alignItems: 'flex-start', gap: space.xl },
  left: { flex: 3, minWidth: 0 },
  right: { flex: 2, minWidth: 0, borderLeftWidth: 1, paddingLeft: space.lg },
  below: { borderTopWidth: 1, paddingTop: space.md },
  hiddenNote: { gap: space.xs },
});
