import { useLocalSearchParams } from 'expo-router';
import { AppText } from '../../../components/AppText';
import { OilsForToday } from '../../../components/OilsForToday';
import { SetupPageFrame } from '../../../components/SetupPageFrame';
import { SetupQueryGate } from '../../../components/SetupQueryGate';
import { useDisplayUnits } from '../../../hooks/garageUi';
import { formatForDisplay } from '../../../shared/compute/setup';

/** "Oils for today" for one setup: its current sheet's oils moved to today's track temperature. */
export default function SetupOilsScreen() {
  const params = useLocalSearchParams<{ id: string; share?: string }>();
  const id = Number(params.id);
  const share = typeof params.share === 'string' && params.share ? params.share : undefined;
  const units = useDisplayUnits();
  const back = { href: `/setups/${id}${share ? `?share=${encodeURIComponent(share)}` : ''}`, label: 'Back to the setup' };
  return (
    <SetupQueryGate id={id} share={share} titles={{ notFound: 'Oils for today', pending: 'Oils for today' }} back={() => back}>
      {(setup) => {
        const tuned = setup.conditions.temperatureC;
        return (
          <SetupPageFrame title="Oils for today" back={back}>
            <AppText tone="muted">
              “{setup.title}”, revision {setup.currentRevision.number}
              {tuned === null ? '' : `, tuned at ${formatForDisplay(tuned, 'temperature', units).text}`}.
            </AppText>
            <OilsForToday vehicleClass={setup.vehicleClass} values={setup.currentRevision.values} referenceTempC={tuned} />
          </SetupPageFrame>
        );
      }}
    </SetupQueryGate>
  );
}
