import { AppText } from '../../components/AppText';
import { ComingSoon } from '../../components/ComingSoon';
import { HealthBadge } from '../../components/HealthBadge';
import { KitList } from '../../components/KitList';
import { Screen } from '../../components/Screen';
import { EmptyState, ErrorState, LoadingState } from '../../components/StatusViews';
import { TrackList } from '../../components/TrackList';
import { useKitsQuery, useTracksQuery } from '../../hooks/catalog';
import { useHealthQuery } from '../../hooks/health';

function ServerStatus() {
  const health = useHealthQuery();
  if (health.isPending) return <HealthBadge state="checking" />;
  if (health.isError) return <HealthBadge state="down" detail={health.error.message} />;
  return <HealthBadge state="ok" />;
}

function Kits() {
  const kits = useKitsQuery();
  if (kits.isPending) return <LoadingState label="Loading kits…" />;
  if (kits.isError)
    return <ErrorState title="Kits could not load" message={kits.error.message} onRetry={() => void kits.refetch()} />;
  if (kits.data.length === 0)
    return <EmptyState title="No kits yet" message="An admin adds kits and their stock setups; check back soon." />;
  return <KitList kits={kits.data} />;
}

function Tracks() {
  const tracks = useTracksQuery();
  if (tracks.isPending) return <LoadingState label="Loading tracks…" />;
  if (tracks.isError)
    return <ErrorState title="Tracks could not load" message={tracks.error.message} onRetry={() => void tracks.refetch()} />;
  if (tracks.data.length === 0)
    return <EmptyState title="No tracks yet" message="Tracks appear here once racers add them." />;
  return <TrackList tracks={tracks.data} />;
}

export default function DiscoverScreen() {
  return (
    <Screen title="Discover" subtitle="Proven setups for your kit and tonight's track.">
      <ServerStatus />
      <ComingSoon
        heading="Setups to start from"
        points={[
          'Public setups filtered by class, kit, track surface and temperature',
          'Sorted by newest, most forked, or best for a chosen track type',
          'Search across titles, notes, kits and racers',
        ]}
      />
      <AppText variant="heading">Kits</AppText>
      <Kits />
      <AppText variant="heading">Tracks</AppText>
      <Tracks />
    </Screen>
  );
}
