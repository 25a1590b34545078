import { StyleSheet, View } from 'react-native';
import { ApiRequestError } from '../hooks/api';
import { signInHref, useMeQuery } from '../hooks/auth';
import { useCommentActions, useCommentsQuery } from '../hooks/comments';
import { space } from '../theme';
import { AppText } from './AppText';
import { Card } from './Card';
import { CommentForm } from './CommentForm';
import { CommentThread, countVisibleComments } from './CommentThread';
import { MyLimitsNotice } from './MyLimitsNotice';
import { commentReport } from './ReportControl';
import { ErrorState, LoadingState } from './StatusViews';
import { TextLink } from './TextLink';

export type SetupCommentsProps = {
  setupId: number;
  /** The share token that opened an unlisted setup; sent with every read and write. */
  share?: string;
};

function withShare(path: string, share?: string): string {
  return share ? `${path}?share=${encodeURIComponent(share)}` : path;
}

function Heading({ count }: { count: number | null }) {
  return <AppText variant="heading">{count === null ? 'Comments' : `Comments (${count})`}</AppText>;
}

/**
 * The talk about a setup as a whole (comments on single changes live on its history page):
 * loads its own data, so any screen can place it with just the setup's id.
 */
export function SetupComments({ setupId, share }: SetupCommentsProps) {
  const comments = useCommentsQuery(setupId, share);
  const me = useMeQuery();
  const actions = useCommentActions(setupId, share);
  const signedIn = me.isPending ? undefined : Boolean(me.data);
  const here = withShare(`/setups/${setupId}`, share);
  if (comments.isPending) {
    return (
      <Card>
        <Heading count={null} />
        <LoadingState label="Loading the comments…" />
      </Card>
    );
  }
  if (comments.isError) {
    const missing = comments.error instanceof ApiRequestError && comments.error.status === 404;
    return missing ? (
      <ErrorState title="Comments unavailable" message="This setup is not shared with you or no longer exists." />
    ) : (
      <ErrorState title="The comments could not load" message={comments.error.message} onRetry={() => void comments.refetch()} />
    );
  }
  const onSetup = comments.data.filter((c) => c.revisionId === null);
  const onChanges = countVisibleComments(comments.data.filter((c) => c.revisionId !== null));
  return (
    <Card role="region" aria-label="Comments on this setup">
      <Heading count={countVisibleComments(onSetup)} />
      {onSetup.length === 0 ? (
        <AppText tone="muted">No comments yet. Ask about a setting, or say how it ran at your track.</AppText>
      ) : (
        <CommentThread comments={onSetup} actions={actions} signedIn={signedIn} signInHref={signInHref(here)} label="Comments on this setup" report={commentReport} />
      )}
      {onChanges > 0 ? (
        <View style={styles.row}>
          <AppText variant="caption" tone="muted">
            {onChanges === 1 ? '1 more comment is' : `${onChanges} more comments are`} on single changes.
          </AppText>
          <TextLink href={withShare(`/setups/${setupId}/history`, share)} label="Read them in the history" />
        </View>
      ) : null}
      {signedIn ? <MyLimitsNotice focus="comments" /> : null}
      <CommentForm
        label="Comment on this setup"
        submitLabel="Post comment"
        signedIn={signedIn}
        signInHref={signInHref(here)}
        onSubmit={(bodyMarkdown) => actions.post({ bodyMarkdown, revisionId: null, fieldKey: null })}
      />
    </Card>
  );
}

const styles = StyleSheet.create({
  row: { flexDirection: 'row', flexWrap: 'wrap', alignItems: 'center', columnGap: space.sm },
});
