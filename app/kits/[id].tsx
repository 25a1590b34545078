import { router, useLocalSearchParams } from 'expo-router';
import { AppText } from '../../components/AppText';
import { Card } from '../../components/Card';
import { KitSetupList } from '../../components/KitSetupList';
import { KitSetupStockSheet } from '../../components/KitSetupStockSheet';
import { Screen } from '../../components/Screen';
import { EmptyState, ErrorState, LoadingState } from '../../components/StatusViews';
import { ApiRequestError } from '../../hooks/api';
import { useKitSetups } from '../../hooks/forks';
import { useDisplayUnits } from '../../hooks/garageUi';
import { useKitStockQuery } from '../../hooks/setups';
import type { KitSetupList as KitSetups } from '../../shared/types/forks';
import { vehicleClassLabel } from '../../shared/types/vehicleClasses';
import { useTheme } from '../../theme';

const BACK = { href: '/', label: 'Back to Discover' };

function StockSheet({ kitId }: { kitId: number }) {
  const stock = useKitStockQuery(kitId);
  const units = useDisplayUnits();
  const { isWide } = useTheme();
  // A kit without a stock sheet simply has nothing to show here; other failures say so.
  if (stock.isPending || (stock.error instanceof ApiRequestError && stock.error.status === 404)) return null;
  if (stock.isError) return <ErrorState title="The stock sheet could not load" message={stock.error.message} onRetry={() => void stock.refetch()} />;
  return <KitSetupStockSheet stock={stock.data} units={units} openAll={isWide} />;
}

function KitBody({ data }: { data: KitSetups }) {
  const { kit, setups } = data;
  return (
    <>
      <Card>
        <AppText variant="caption" tone="muted">
          Maker
        </AppText>
        <AppText>{kit.makerName}</AppText>
        <AppText variant="caption" tone="muted">
          Class
        </AppText>
        <AppText>{vehicleClassLabel(kit.vehicleClass)}</AppText>
      </Card>
      <StockSheet kitId={kit.id} />
      <AppText variant="heading">Public setups{setups.length > 0 ? ` (${setups.length})` : ''}</AppText>
      {setups.length === 0 ? (
        <EmptyState
          title={`No public setups for the ${kit.name} yet`}
          message="When racers publish a setup for this kit it appears here, ready to start from. Have one that works? Publish it from your garage."
          actionLabel="Go to your garage"
          onAction={() => router.push('/garage')}
        />
      ) : (
        <>
          <AppText tone="muted">Newest first. Open one and choose “Fork this setup” to start from it on your own car.</AppText>
          <KitSetupList setups={setups} />
        </>
      )}
    </>
  );
}

export default function KitScreen() {
  const params = useLocalSearchParams<{ id: string }>();
  const id = Number(params.id);
  const valid = Number.isSafeInteger(id) && id > 0;
  const kit = useKitSetups(valid ? id : 0);
  if (!valid || (kit.error instanceof ApiRequestError && kit.error.status === 404)) {
    return (
      <Screen title="Kit not found" back={BACK}>
        <EmptyState title="No kit at this address" message="Pick a kit from the list on Discover." actionLabel="Find kits on Discover" onAction={() => router.replace('/')} />
      </Screen>
    );
  }
  if (kit.isPending) {
    return (
      <Screen title="Kit" back={BACK}>
        <LoadingState label="Loading the kit…" />
      </Screen>
    );
  }
  if (kit.isError) {
    return (
      <Screen title="Kit" back={BACK}>
        <ErrorState title="This kit could not load" message={kit.error.message} onRetry={() => void kit.refetch()} />
      </Screen>
    );
  }
  return (
    <Screen title={`${kit.data.kit.makerName} ${kit.data.kit.name}`} subtitle="Public setups racers run on this kit." back={BACK}>
      <KitBody data={kit.data} />
    </Screen>
  );
}
