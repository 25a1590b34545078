import { router, useLocalSearchParams } from 'expo-router';
import { ButtonLink } from '../../../components/ButtonLink';
import { Card } from '../../../components/Card';
import { AppText } from '../../../components/AppText';
import { SetupPageFrame } from '../../../components/SetupPageFrame';
import { SignedInGate } from '../../../components/SignedInGate';
import { StatusNote } from '../../../components/StatusNote';
import { EmptyState, ErrorState, LoadingState } from '../../../components/StatusViews';
import { SyncReview } from '../../../components/SyncReview';
import { ApiRequestError } from '../../../hooks/api';
import { signInHref, useMeQuery } from '../../../hooks/auth';
import { useSavedRevisionNotice } from '../../../hooks/editor';
import { describeError } from '../../../hooks/form';
import { isStaleUpstream, useApplyUpstream, useUpstreamQuery } from '../../../hooks/forks';
import { useDisplayUnits } from '../../../hooks/garageUi';
import { useSetupQuery } from '../../../hooks/setups';
import type { UnitPreferences } from '../../../shared/types/auth';
import type { SetupDetail } from '../../../shared/types/setups';

function Outcome({ title, message, setupId, linkLabel = 'Back to your setup' }: { title: string; message: string; setupId: number; linkLabel?: string }) {
  return (
    <Card role="status">
      <AppText variant="heading">{title}</AppText>
      <AppText tone="muted">{message}</AppText>
      <ButtonLink href={`/setups/${setupId}`} label={linkLabel} variant="secondary" />
    </Card>
  );
}

const STALE_NOTE = 'The original (or your fork) changed meanwhile — here is the fresh view.';

function SyncBody({ setup }: { setup: SetupDetail }) {
  const units = useDisplayUnits();
  const upstream = useUpstreamQuery(setup.id);
  const apply = useApplyUpstream(setup.id);
  const saved = useSavedRevisionNotice(setup.id);
  const stale = isStaleUpstream(apply.error);
  const onApplied = (result: { setup: SetupDetail; taken: number }) => {
    // The setup page then says which revision the taken values became.
    if (result.taken > 0) saved.remember({ revisionNumber: result.setup.currentRevision.number, warnings: [] });
    // Back to the setup page the racer came from (or to a fresh one when sync was opened directly).
    router.dismissTo(`/setups/${setup.id}`);
  };
  return <SyncContent setup={setup} upstream={upstream} apply={apply} onApplied={onApplied} units={units} notice={stale ? STALE_NOTE : null} />;
}

type SyncContentProps = {
  setup: SetupDetail;
  upstream: ReturnType<typeof useUpstreamQuery>;
  apply: ReturnType<typeof useApplyUpstream>;
  onApplied: (result: { setup: SetupDetail; taken: number }) => void;
  units: UnitPreferences;
  /** Why the view was just refreshed, if it was. */
  notice: string | null;
};

function SyncContent(props: SyncContentProps) {
  const view = props.upstream.data;
  // The review shows the notice beside its Apply button, where the racer is looking; other outcomes on top.
  if (view?.status === 'available' && view.rows.length > 0) return <SyncView {...props} />;
  return (
    <>
      <StatusNote tone="caution" message={props.notice} />
      <SyncView {...props} />
    </>
  );
}

function SyncView({ setup, upstream, apply, onApplied, units, notice }: SyncContentProps) {
  if (upstream.isPending) return <LoadingState label="Comparing with the original…" />;
  if (upstream.isError) {
    return <ErrorState title="The original’s changes could not load" message={upstream.error.message} onRetry={() => void upstream.refetch()} />;
  }
  const view = upstream.data;
  if (view.status === 'not-a-fork') {
    return <Outcome title="This setup is not a fork" message="Only a setup started from someone else’s can take that setup’s later changes." setupId={setup.id} />;
  }
  if (view.status === 'unavailable') {
    return <Outcome title="Original unavailable" message="The original is no longer available; your fork is unchanged." setupId={setup.id} />;
  }
  if (view.rows.length === 0) {
    return (
      <Outcome
        title="Up to date"
        message={`Nothing new to take: your fork has looked at every change of “${view.original.title}” up to its revision ${view.original.revisionNumber}.`}
        setupId={setup.id}
      />
    );
  }
  return (
    <SyncReview
      // A fresh view (after either side moved) starts with fresh choices.
      key={`${view.mineRevisionId}:${view.original.revisionId}`}
      upstream={view}
      vehicleClass={setup.vehicleClass}
      units={units}
      pending={apply.isPending}
      notice={notice}
      error={isStaleUpstream(apply.error) ? null : describeError(apply.error, []).formError}
      onApply={({ take, dismiss }) =>
        apply.mutate(
          { baseRevisionId: view.mineRevisionId, theirsRevisionId: view.original.revisionId, take, dismiss },
          { onSuccess: onApplied },
        )
      }
    />
  );
}

function SyncSetup({ id }: { id: number }) {
  const setup = useSetupQuery(id);
  if (setup.isPending) return <LoadingState label="Loading your setup…" />;
  if (setup.isError) {
    if (setup.error instanceof ApiRequestError && setup.error.status === 404) {
      return <EmptyState title="No setup at this address" message="It may have been deleted." actionLabel="Go to your garage" onAction={() => router.replace('/garage')} />;
    }
    return <ErrorState title="This setup could not load" message={setup.error.message} onRetry={() => void setup.refetch()} />;
  }
  if (!setup.data.isOwner) {
    return <Outcome title="Only the fork’s owner can take changes" message="Fork this setup to keep your own copy and take the original’s later changes." setupId={id} linkLabel="Back to the setup" />;
  }
  return <SyncBody setup={setup.data} />;
}

export default function SyncScreen() {
  const params = useLocalSearchParams<{ id: string }>();
  const id = Number(params.id);
  const me = useMeQuery();
  const valid = Number.isSafeInteger(id) && id > 0;
  return (
    <SetupPageFrame title="Changes in the original" back={{ href: valid ? `/setups/${id}` : '/garage', label: valid ? 'Back to the setup' : 'Back to Garage' }}>
      <SignedInGate me={me} signInHref={signInHref(`/setups/${params.id}/sync`)}>
        {() =>
          valid ? (
            <SyncSetup id={id} />
          ) : (
            <EmptyState title="No setup at this address" message="Check the address." actionLabel="Go to your garage" onAction={() => router.replace('/garage')} />
          )
        }
      </SignedInGate>
    </SetupPageFrame>
  );
}
