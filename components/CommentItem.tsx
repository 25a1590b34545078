import { useState, type ReactNode } from 'react';
import { StyleSheet, View } from 'react-native';
import { describeError } from '../hooks/form';
import { COMMENT_EDIT_MINUTES, type CommentDto } from '../shared/types/forks';
import { space, useTheme } from '../theme';
import { AppText } from './AppText';
import { Button } from './Button';
import { CommentForm } from './CommentForm';
import { FormErrorBanner } from './FormErrorBanner';
import { HiddenNoticeBanner } from './HiddenNoticeBanner';
import { HtmlContent } from './HtmlContent';
import { formatDay } from './SetupSheetFormat';
import { TextLink } from './TextLink';

/** The writes a comment offers; each resolves when the server accepted it. */
export type CommentItemActions = {
  reply: (parent: CommentDto, bodyMarkdown: string) => Promise<unknown>;
  edit: (commentId: number, bodyMarkdown: string) => Promise<unknown>;
  remove: (commentId: number) => Promise<unknown>;
};

export type CommentItemProps = {
  comment: CommentDto;
  actions: CommentItemActions;
  signedIn: boolean | undefined;
  signInHref: string;
  /** The time the edit window is measured against, in ms since 1970; the clock's by default. */
  now: number;
  /** A reply draws no replies of its own: one level only. */
  isReply?: boolean;
  /** Ruled off from the comment above it. */
  ruled?: boolean;
  /** A report control for a comment (and each reply); absent where reporting is not offered. */
  report?: (comment: CommentDto) => ReactNode;
};

const MINUTE = 60_000;

/** "just now", "12 min ago", "3 h ago", then the day: recent talk reads as a conversation. */
export function formatCommentTime(iso: string, now: number): string {
  const at = Date.parse(iso);
  if (Number.isNaN(at)) return '';
  const minutes = Math.floor((now - at) / MINUTE);
  if (minutes < 1) return 'just now';
  if (minutes < 60) return `${minutes} min ago`;
  if (minutes < 24 * 60) return `${Math.floor(minutes / 60)} h ago`;
  return formatDay(iso);
}

/** The author may edit while the server says so and the window has not closed since the list loaded. */
export function canStillEdit(comment: CommentDto, now: number): boolean {
  return comment.canEdit && !comment.deleted && now < Date.parse(comment.createdAt) + COMMENT_EDIT_MINUTES * MINUTE;
}

type Mode = 'read' | 'edit' | 'reply' | 'confirm-delete';

function Meta({ comment, now }: { comment: CommentDto; now: number }) {
  return (
    <View style={styles.meta}>
      <TextLink href={`/racers/${comment.author.handle}`} label={`@${comment.author.handle}`} />
      <AppText variant="caption" tone="muted">
        {formatCommentTime(comment.createdAt, now)}
        {comment.editedAt && !comment.deleted ? ' · edited' : ''}
        {comment.fieldLabel ? ` · on ${comment.fieldLabel}` : ''}
      </AppText>
    </View>
  );
}

function DeleteConfirm({ comment, onDone, remove }: { comment: CommentDto; onDone: () => void; remove: CommentItemActions['remove'] }) {
  const [busy, setBusy] = useState(false);
  const [error, setError] = useState<string | null>(null);
  const confirm = async () => {
    setBusy(true);
    try {
      await remove(comment.id);
      onDone();
    } catch (err) {
      setError(describeError(err, []).formError);
      setBusy(false);
    }
  };
  return (
    <View style={styles.block}>
      <AppText role="alert">Delete this comment? Its words go; replies to it stay.</AppText>
      <FormErrorBanner message={error} />
      <View style={styles.row}>
        <Button label="Delete comment" variant="danger" busy={busy} busyLabel="Deleting…" onPress={() => void confirm()} />
        <Button label="Keep it" variant="secondary" disabled={busy} onPress={onDone} />
      </View>
    </View>
  );
}

function Actions({ comment, isReply, signedIn, now, setMode, report }: CommentItemProps & { setMode: (m: Mode) => void }) {
  if (comment.deleted) return null;
  const who = `@${comment.author.handle}`;
  const buttons = [
    !isReply && signedIn ? <Button key="reply" label="Reply" variant="secondary" accessibilityLabel={`Reply to ${who}`} onPress={() => setMode('reply')} /> : null,
    canStillEdit(comment, now) ? <Button key="edit" label="Edit" variant="secondary" accessibilityLabel="Edit your comment" onPress={() => setMode('edit')} /> : null,
    comment.canDelete ? (
      <Button key="delete" label="Delete" variant="danger" accessibilityLabel={`Delete the comment by ${who}`} onPress={() => setMode('confirm-delete')} />
    ) : null,
    report ? <View key="report">{report(comment)}</View> : null,
  ].filter(Boolean);
  return buttons.length > 0 ? <View style={styles.row}>{buttons}</View> : null;
}

/** One comment: who and when, its words (or that it was deleted), its actions and, for top-level ones, its replies. */
export function CommentItem(props: CommentItemProps) {
  const { comment, actions, signedIn, signInHref, now, isReply, ruled } = props;
  const { colors } = useTheme();
  const [mode, setMode] = useState<Mode>('read');
  const read = () => setMode('read');
  return (
    <View role="listitem" style={[styles.item, ruled ? { borderTopWidth: 1, borderColor: colors.border } : null]}>
      <Meta comment={comment} now={now} />
      {comment.hidden && !comment.deleted ? (
        // Only the author and moderators receive the notice; the author is the one given the text to edit.
        <HiddenNoticeBanner notice={comment.hidden} what="comment" isAuthor={comment.bodyMarkdown !== ''} />
      ) : null}
      {comment.deleted ? (
        <AppText tone="muted" style={styles.deleted}>
          This comment was deleted.
        </AppText>
      ) : mode === 'edit' ? (
        <CommentForm
          label="Edit your comment"
          submitLabel="Save changes"
          busyLabel="Saving…"
          initialValue={comment.bodyMarkdown}
          signedIn={signedIn}
          signInHref={signInHref}
          onSubmit={(body) => actions.edit(comment.id, body).then(read)}
          onCancel={read}
        />
      ) : (
        <HtmlContent html={comment.bodyHtml} />
      )}
      {mode === 'read' ? <Actions {...props} setMode={setMode} /> : null}
      {mode === 'confirm-delete' ? <DeleteConfirm comment={comment} remove={actions.remove} onDone={read} /> : null}
      {!isReply && (comment.replies.length > 0 || mode === 'reply') ? (
        <View style={[styles.replies, { borderColor: colors.border }]}>
          {comment.replies.length > 0 ? (
            <View role="list" aria-label={`Replies to @${comment.author.handle}`} style={styles.block}>
              {comment.replies.map((reply) => (
                <CommentItem key={reply.id} {...props} comment={reply} isReply ruled={false} />
              ))}
            </View>
          ) : null}
          {mode === 'reply' ? (
            <CommentForm
              label={`Reply to @${comment.author.handle}`}
              submitLabel="Post reply"
              signedIn={signedIn}
              signInHref={signInHref}
              onSubmit={(body) => actions.reply(comment, body).then(read)}
              onCancel={read}
            />
          ) : null}
        </View>
      ) : null}
    </View>
  );
}

const styles = StyleSheet.create({
  item: { gap: space.xs, paddingVertical: space.sm },
  meta: { flexDirection: 'row', flexWrap: 'wrap', alignItems: 'center', columnGap: space.sm },
  deleted: { fontStyle: 'italic' },
  block: { gap: space.sm },
  row: { flexDirection: 'row', flexWrap: 'wrap', gap: space.sm },
  // One level of replies, set in under a rule so the thread reads at a glance.
  replies: { borderLeftWidth: 2, paddingLeft: space.md, marginLeft: space.xs, gap: space.sm },
});
