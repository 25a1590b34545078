import { router, useLocalSearchParams } from 'expo-router';
import { AppText } from '../../../components/AppText';
import { OilsForToday } from '../../../components/OilsForToday';
import { SetupPageFrame } from '../../../components/SetupPageFrame';
import { EmptyState, ErrorState, LoadingState } from '../../../components/StatusViews';
import { ApiRequestError } from '../../../hooks/api';
import { useDisplayUnits } from '../../../hooks/garageUi';
import { useSetupQuery } from '../../../hooks/setups';
import { formatForDisplay } from '../../../shared/compute/setup';

/** "Oils for today" for one setup: its current sheet's oils moved to today's track temperature. */
export default function SetupOilsScreen() {
  const params = useLocalSearchParams<{ id: string; share?: string }>();
  const id = Number(params.id);
  const share = typeof params.share === 'string' && params.share ? params.share : undefined;
  const setup = useSetupQuery(id, share);
  const units = useDisplayUnits();
  const back = { href: `/setups/${id}${share ? `?share=${encodeURIComponent(share)}` : ''}`, label: 'Back to the setup' };
  if (!Number.isSafeInteger(id) || id <= 0 || (setup.isError && setup.error instanceof ApiRequestError && setup.error.status === 404)) {
    return (
      <SetupPageFrame title="Oils for today" back={{ href: '/', label: 'Back to Discover' }}>
        <EmptyState
          title="No setup at this address"
          message="It may be private, deleted, or the link is missing the part after “share=”. Ask whoever sent it for the full link."
          actionLabel="Find setups on Discover"
          onAction={() => router.replace('/')}
        />
      </SetupPageFrame>
    );
  }
  if (setup.isPending) {
    return (
      <SetupPageFrame title="Oils for today" back={back}>
        <LoadingState label="Loading the setup…" />
      </SetupPageFrame>
    );
  }
  if (setup.isError) {
    return (
      <SetupPageFrame title="Oils for today" back={back}>
        <ErrorState title="This setup could not load" message={setup.error.message} onRetry={() => void setup.refetch()} />
      </SetupPageFrame>
    );
  }
  const tuned = setup.data.conditions.temperatureC;
  return (
    <SetupPageFrame title="Oils for today" back={back}>
      <AppText tone="muted">
        “{setup.data.title}”, revision {setup.data.currentRevision.number}
        {tuned === null ? '' : `, tuned at ${formatForDisplay(tuned, 'temperature', units).text}`}.
      </AppText>
      <OilsForToday vehicleClass={setup.data.vehicleClass} values={setup.data.currentRevision.values} referenceTempC={tuned} />
    </SetupPageFrame>
  );
}
