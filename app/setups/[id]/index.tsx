import { router, useLocalSearchParams } from 'expo-router';
import { useState } from 'react';
import { EditorSavedNotice } from '../../../components/EditorSavedNotice';
import { HiddenNoticeBanner } from '../../../components/HiddenNoticeBanner';
import { LineageCard } from '../../../components/LineageCard';
import { NewAccountLimitsNotice } from '../../../components/NewAccountLimitsNotice';
import { PhotoGallery } from '../../../components/PhotoGallery';
import { PhotoUploader } from '../../../components/PhotoUploader';
import { PhotoViewer } from '../../../components/PhotoViewer';
import { ReportControl } from '../../../components/ReportControl';
import { RevisionList } from '../../../components/RevisionList';
import { SafetyNote } from '../../../components/SafetyNote';
import { SetupActions } from '../../../components/SetupActions';
import { SetupNotes } from '../../../components/SetupNotes';
import { SetupOverview } from '../../../components/SetupOverview';
import { SetupComments } from '../../../components/SetupComments';
import { SetupColumns, SetupPageFrame } from '../../../components/SetupPageFrame';
import { SetupQueryGate } from '../../../components/SetupQueryGate';
import { SetupSheet } from '../../../components/SetupSheet';
import { SummaryCard } from '../../../components/SummaryCard';
import { TextLink } from '../../../components/TextLink';
import { TrackTypeVotes } from '../../../components/TrackTypeVotes';
import { SyncBanner } from '../../../components/SyncBanner';
import { VisibilityControl } from '../../../components/VisibilityControl';
import { signInHref, useMeQuery } from '../../../hooks/auth';
import { useSavedRevisionNotice } from '../../../hooks/editor';
import { describeError } from '../../../hooks/form';
import { useUpstreamQuery } from '../../../hooks/forks';
import { useMyLimitsQuery } from '../../../hooks/reports';
import { shareLinkFor, useDisplayUnits, usePhotoUpload } from '../../../hooks/garageUi';
import { useDeleteSetup, useDeleteSetupPhoto, useUpdateSetupMeta } from '../../../hooks/setups';
import { MAX_PHOTOS_PER_SETUP, type Photo, type SetupDetail } from '../../../shared/types/setups';
import { useTheme } from '../../../theme';

function messageOf(error: unknown): string | null {
  return describeError(error, []).formError;
}

function OwnerVisibility({ setup }: { setup: SetupDetail }) {
  const update = useUpdateSetupMeta(setup.id);
  const shown = update.isPending && update.variables.visibility ? update.variables.visibility : setup.visibility;
  return (
    <VisibilityControl
      value={shown}
      onChange={(visibility) => update.mutate({ visibility })}
      pending={update.isPending}
      error={messageOf(update.error)}
      shareLink={setup.shareToken ? shareLinkFor(setup.id, setup.shareToken) : null}
    />
  );
}

function Photos({ setup }: { setup: SetupDetail }) {
  const [open, setOpen] = useState<Photo | null>(null);
  const upload = usePhotoUpload(setup.id);
  const remove = useDeleteSetupPhoto(setup.id);
  const limits = useMyLimitsQuery(setup.isOwner);
  // New accounts add photos once their e-mail is verified: say so before they pick a file.
  const barred = limits.data?.limited && !limits.data.photosAllowed ? limits.data : null;
  const uploader = !setup.isOwner ? undefined : setup.photos.length >= MAX_PHOTOS_PER_SETUP ? null : barred ? (
    <NewAccountLimitsNotice limits={barred} focus="photos" />
  ) : (
    <PhotoUploader
      onPick={(file, caption) => upload.start(file, caption || undefined)}
      progress={upload.progress}
      error={messageOf(upload.error)}
      done={upload.isSuccess}
    />
  );
  return (
    <>
      <PhotoGallery photos={setup.photos} onOpen={setOpen} uploader={uploader} />
      <PhotoViewer
        photo={open}
        onClose={() => {
          setOpen(null);
          remove.reset();
        }}
        onDelete={setup.isOwner && open ? () => remove.mutate(open.id, { onSuccess: () => setOpen(null) }) : undefined}
        deleting={remove.isPending}
        deleteError={messageOf(remove.error)}
        report={open ? <ReportControl target={{ type: 'photo', id: open.id }} ownerHandle={setup.owner.handle} what="this photo" /> : null}
      />
    </>
  );
}

/** For the owner of a fork whose original is still there: how many of its changes wait for a look. */
function UpstreamBanner({ setup }: { setup: SetupDetail }) {
  const from = setup.lineage.forkedFrom;
  const enabled = setup.isOwner && from?.available === true;
  const upstream = useUpstreamQuery(setup.id, enabled);
  // A failed check only hides the banner: the page itself is what the racer came for.
  if (!from?.available || !enabled || upstream.data?.status !== 'available') return null;
  const sinceFork = upstream.data.syncedRevisionNumber === from.revisionNumber;
  return <SyncBanner setupId={setup.id} count={upstream.data.rows.length} sinceFork={sinceFork} />;
}

function Lineage({ setup, share }: { setup: SetupDetail; share?: string }) {
  const me = useMeQuery();
  const fork = `/setups/${setup.id}/fork${share ? `?share=${encodeURIComponent(share)}` : ''}`;
  return <LineageCard setup={setup} share={share} signedIn={me.isPending ? undefined : Boolean(me.data)} signInHref={signInHref(fork)} />;
}

function SetupBody({ setup, share }: { setup: SetupDetail; share?: string }) {
  const { isWide } = useTheme();
  const units = useDisplayUnits();
  const remove = useDeleteSetup(setup.id);
  const saved = useSavedRevisionNotice(setup.id);
  const values = setup.currentRevision.values;
  const oilsHref = `/setups/${setup.id}/oils${share ? `?share=${encodeURIComponent(share)}` : ''}`;
  const summary = (
    <>
      <SummaryCard vehicleClass={setup.vehicleClass} values={values} units={units} />
      <TextLink href={oilsHref} label="Oils for today’s temperature" />
    </>
  );
  const safety = <SafetyNote vehicleClass={setup.vehicleClass} />;
  const sheet = <SetupSheet vehicleClass={setup.vehicleClass} values={values} units={units} openAll={isWide} />;
  const notes = <SetupNotes notesHtml={setup.notesHtml} editHref={setup.isOwner ? `/setups/${setup.id}/details` : undefined} />;
  const sharing = setup.isOwner ? <OwnerVisibility setup={setup} /> : null;
  const rest = (
    <>
      <Photos setup={setup} />
      <RevisionList revisions={setup.revisions} />
    </>
  );
  return (
    <>
      {setup.hidden ? <HiddenNoticeBanner notice={setup.hidden} what="setup" isAuthor={setup.isOwner} /> : null}
      {saved.notice ? <EditorSavedNotice notice={saved.notice} onDismiss={saved.dismiss} /> : null}
      <UpstreamBanner setup={setup} />
      <SetupOverview setup={setup} units={units} />
      <Lineage setup={setup} share={share} />
      {setup.visibility === 'public' ? <TrackTypeVotes setupId={setup.id} isOwner={setup.isOwner} share={share} /> : null}
      <SetupActions
        setupId={setup.id}
        title={setup.title}
        isOwner={setup.isOwner}
        share={share}
        onDelete={() => remove.mutate(undefined, { onSuccess: () => router.replace('/garage') })}
        deleting={remove.isPending}
        deleteError={messageOf(remove.error)}
        report={<ReportControl target={{ type: 'setup', id: setup.id }} ownerHandle={setup.owner.handle} what="this setup" />}
      />
      {/* Phones read top to bottom: figures first, then the sheet; wide screens put them side by side. */}
      <SetupColumns
        left={isWide ? <>{sheet}{notes}</> : <>{summary}{sheet}{notes}</>}
        right={isWide ? <>{summary}{sharing}{rest}{safety}</> : <>{sharing}{safety}{rest}</>}
      />
      <SetupComments setupId={setup.id} share={share} />
    </>
  );
}

export default function SetupScreen() {
  const params = useLocalSearchParams<{ id: string; share?: string }>();
  const share = typeof params.share === 'string' && params.share ? params.share : undefined;
  const back = (setup: SetupDetail | undefined) =>
    setup?.isOwner ? { href: '/garage', label: 'Back to Garage' } : { href: '/', label: 'Back to Discover' };
  return (
    <SetupQueryGate id={Number(params.id)} share={share} titles={{ notFound: 'Setup not found', pending: 'Setup' }} back={back}>
      {(setup) => (
        <SetupPageFrame title={setup.title} back={back(setup)}>
          <SetupBody setup={setup} share={share} />
        </SetupPageFrame>
      )}
    </SetupQueryGate>
  );
}
