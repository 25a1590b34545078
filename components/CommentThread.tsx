import type { ReactNode } from 'react';
import { View } from 'react-native';
import type { CommentDto } from '../shared/types/forks';
import { CommentItem, type CommentItemActions } from './CommentItem';

export type CommentThreadProps = {
  /** Top-level comments, oldest first, each with its replies. */
  comments: CommentDto[];
  actions: CommentItemActions;
  /** Undefined while the sign-in is being checked; false offers a sign-in link instead of reply boxes. */
  signedIn: boolean | undefined;
  signInHref: string;
  /** Names the list for screen readers, e.g. "Comments on revision 4". */
  label: string;
  /** Clock for "5 min ago" and the edit window, in ms since 1970; for tests. */
  now?: number;
  /** A report control per comment, where reporting is offered. */
  report?: (comment: CommentDto) => ReactNode;
};

/** Comments and replies that are not deleted: what a count beside a heading says. */
export function countVisibleComments(comments: CommentDto[]): number {
  return comments.reduce((n, c) => n + (c.deleted ? 0 : 1) + c.replies.filter((r) => !r.deleted).length, 0);
}

/** Comments with one level of replies: who, when, edited or deleted, and reply, edit and delete where allowed. */
export function CommentThread({ comments, actions, signedIn, signInHref, label, now = Date.now(), report }: CommentThreadProps) {
  return (
    <View role="list" aria-label={label}>
      {comments.map((comment, i) => (
        <CommentItem key={comment.id} comment={comment} actions={actions} signedIn={signedIn} signInHref={signInHref} now={now} ruled={i > 0} report={report} />
      ))}
    </View>
  );
}
