import { router, useLocalSearchParams } from 'expo-router';
import { MyLimitsNotice } from '../../../components/MyLimitsNotice';
import { commentReport, ReportControl } from '../../../components/ReportControl';
import { RevisionChangesEntry, type HistoryRevision } from '../../../components/RevisionChangesEntry';
import { SetupPageFrame } from '../../../components/SetupPageFrame';
import { EmptyState, ErrorState, LoadingState } from '../../../components/StatusViews';
import { ApiRequestError } from '../../../hooks/api';
import { signInHref, useMeQuery } from '../../../hooks/auth';
import { useCommentActions, useCommentsQuery } from '../../../hooks/comments';
import { useDisplayUnits } from '../../../hooks/garageUi';
import { compareHref, useHistoryQuery } from '../../../hooks/history';
import { useSetupQuery } from '../../../hooks/setups';
import type { CommentDto } from '../../../shared/types/forks';
import { useTheme } from '../../../theme';

function withShare(path: string, share?: string): string {
  return share ? `${path}?share=${encodeURIComponent(share)}` : path;
}

/** "Compare with revision 3" (the one before) and "Compare with the current revision" where they differ. */
function compareLinks(setupId: number, revisions: HistoryRevision[], index: number, share?: string) {
  const revision = revisions[index];
  const older = revisions[index + 1];
  const newest = revisions[0];
  const side = (number: number) => ({ setupId, revision: number, share });
  const links: { href: string; label: string }[] = [];
  if (older) links.push({ href: compareHref(side(older.number), side(revision.number)), label: `Compare with revision ${older.number}` });
  if (revision.number !== newest.number) {
    links.push({ href: compareHref(side(revision.number), side(newest.number)), label: `Compare with the current revision (${newest.number})` });
  }
  return links;
}

function isNotFound(error: unknown): boolean {
  return error instanceof ApiRequestError && error.status === 404;
}

export default function SetupHistoryScreen() {
  const params = useLocalSearchParams<{ id: string; share?: string }>();
  const id = Number(params.id);
  const share = typeof params.share === 'string' && params.share ? params.share : undefined;
  const { isWide } = useTheme();
  const units = useDisplayUnits();
  const me = useMeQuery();
  const setup = useSetupQuery(id, share);
  const history = useHistoryQuery(id, share);
  const comments = useCommentsQuery(id, share);
  const actions = useCommentActions(id, share);
  const setupPath = withShare(`/setups/${id}`, share);
  const valid = Number.isSafeInteger(id) && id > 0;
  const back = valid ? { href: setupPath, label: 'Back to the setup' } : { href: '/', label: 'Back to Discover' };

  if (!valid || isNotFound(setup.error) || isNotFound(history.error)) {
    return (
      <SetupPageFrame title="History" back={back}>
        <EmptyState
          title="No history to show"
          message="This setup is not shared with you or no longer exists. If someone sent you a link, ask them for the full one with “share=” in it."
          actionLabel="Find setups on Discover"
          onAction={() => router.replace('/')}
        />
      </SetupPageFrame>
    );
  }
  if (setup.isError || history.isError) {
    const retry = () => void Promise.all([setup.refetch(), history.refetch()]);
    return (
      <SetupPageFrame title="History" back={back}>
        <ErrorState title="The history could not load" message={(setup.error ?? history.error)?.message ?? ''} onRetry={retry} />
      </SetupPageFrame>
    );
  }
  if (setup.isPending || history.isPending) {
    return (
      <SetupPageFrame title="History" back={back}>
        <LoadingState label="Loading the history…" />
      </SetupPageFrame>
    );
  }
  const revisions = history.data.revisions;
  const byRevision = new Map<number, CommentDto[]>();
  for (const comment of comments.data ?? []) {
    if (comment.revisionId !== null) byRevision.set(comment.revisionId, [...(byRevision.get(comment.revisionId) ?? []), comment]);
  }
  const signedIn = me.isPending ? undefined : Boolean(me.data);
  const hiddenNotes = new Set(setup.data.revisions.filter((r) => r.noteHidden).map((r) => r.id));
  return (
    <SetupPageFrame title={`History of ${setup.data.title}`} back={back}>
      {comments.isError ? (
        <ErrorState title="The comments could not load" message={comments.error.message} onRetry={() => void comments.refetch()} />
      ) : null}
      {signedIn ? <MyLimitsNotice focus="comments" /> : null}
      {revisions.length === 0 ? (
        <EmptyState title="No revisions yet" message="Each time the sheet is saved with a change note, the change shows up here." />
      ) : (
        revisions.map((revision, i) => (
          <RevisionChangesEntry
            key={revision.id}
            revision={revision}
            current={i === 0}
            vehicleClass={setup.data.vehicleClass}
            units={units}
            wide={isWide}
            comments={comments.data ? (byRevision.get(revision.id) ?? []) : comments.isError ? 'unavailable' : 'loading'}
            actions={actions}
            signedIn={signedIn}
            signInHref={signInHref(withShare(`/setups/${id}/history`, share))}
            compareLinks={compareLinks(id, revisions, i, share)}
            noteHidden={hiddenNotes.has(revision.id)}
            reportNote={
              revision.changeNote ? (
                <ReportControl target={{ type: 'revision', id: revision.id }} ownerHandle={revision.authorHandle} what={`the change note of revision ${revision.number}`} />
              ) : null
            }
            reportComment={commentReport}
          />
        ))
      )}
    </SetupPageFrame>
  );
}
