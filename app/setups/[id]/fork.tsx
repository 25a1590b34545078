import { router, useLocalSearchParams } from 'expo-router';
import { useState } from 'react';
import { AppText } from '../../../components/AppText';
import { ForkCarPicker } from '../../../components/ForkCarPicker';
import { ForkNewCarForm } from '../../../components/ForkNewCarForm';
import { ForkPreviewPanel } from '../../../components/ForkPreviewPanel';
import { ForkSignInPrompt } from '../../../components/ForkSignInPrompt';
import { Screen } from '../../../components/Screen';
import { EmptyState, ErrorState, LoadingState } from '../../../components/StatusViews';
import { TextField } from '../../../components/TextField';
import { ApiRequestError } from '../../../hooks/api';
import { signInHref, useMeQuery } from '../../../hooks/auth';
import { useKitsQuery } from '../../../hooks/catalog';
import { describeError, issuesToFieldErrors, type FieldErrors } from '../../../hooks/form';
import { canForkOnto, useForkPreview, useForkSetup } from '../../../hooks/forks';
import { useDisplayUnits } from '../../../hooks/garageUi';
import { useCreateCar, useGarageQuery, useSetupQuery } from '../../../hooks/setups';
import { forkRequestSchema, type StockChoice } from '../../../shared/types/forks';
import type { Car, SetupDetail } from '../../../shared/types/setups';
import { vehicleClassLabel } from '../../../shared/types/vehicleClasses';

type ForkTarget = { source: SetupDetail; share?: string; revisionId?: number };

const FORK_FIELDS = ['carId', 'title'] as const;

function AddCar({ source, onCreated, onCancel }: { source: SetupDetail; onCreated: (carId: number) => void; onCancel?: () => void }) {
  const kits = useKitsQuery();
  const create = useCreateCar();
  if (kits.isPending) return <LoadingState label="Loading the kits…" />;
  if (kits.isError) return <ErrorState title="The kits could not load" message={kits.error.message} onRetry={() => void kits.refetch()} />;
  const fitting = kits.data.filter((kit) => canForkOnto(source.vehicleClass, kit.vehicleClass));
  if (fitting.length === 0) {
    return <EmptyState title="No kit can take this setup yet" message="Kits are added by admins; check back soon." />;
  }
  const sourceKit = fitting.find((kit) => kit.name === source.car.kitName && kit.makerName === source.car.makerName);
  return (
    <ForkNewCarForm
      kits={fitting}
      initialKitId={sourceKit?.id ?? null}
      pending={create.isPending}
      error={create.error}
      onSubmit={(values) => create.mutateAsync(values).then((car) => onCreated(car.id))}
      onCancel={onCancel}
    />
  );
}

function previewCarError(error: unknown): string | undefined {
  if (!(error instanceof ApiRequestError) || error.status !== 400) return undefined;
  return describeError(error, ['carId']).fieldErrors.carId ?? error.message;
}

function ForkFlow({ source, share, revisionId, cars, otherCars }: ForkTarget & { cars: Car[]; /** Cars of another scale, not offered. */ otherCars: number }) {
  const units = useDisplayUnits();
  const [picked, setPicked] = useState<number | null>(null);
  const [adding, setAdding] = useState(cars.length === 0);
  const [title, setTitle] = useState(source.title);
  const [clientErrors, setClientErrors] = useState<FieldErrors>({});
  const fork = useForkSetup(source.id);
  const sameKit = cars.find((car) => car.kitName === source.car.kitName && car.makerName === source.car.makerName);
  const carId = cars.some((car) => car.id === picked) ? picked : (sameKit ?? cars[0])?.id ?? null;
  const showNewCar = adding || carId === null;
  const preview = useForkPreview(source.id, showNewCar ? null : carId, share, revisionId);
  const server = describeError(fork.error, FORK_FIELDS);
  const carError = clientErrors.carId ?? server.fieldErrors.carId ?? previewCarError(preview.error);

  const confirm = (stockChoices: Record<string, StockChoice>) => {
    const body = { carId: carId ?? 0, title: title.trim(), stockChoices, ...(revisionId ? { revisionId } : {}), ...(share ? { share } : {}) };
    const parsed = forkRequestSchema.safeParse(body);
    if (!parsed.success) return setClientErrors(issuesToFieldErrors(parsed.error.issues));
    setClientErrors({});
    fork.mutate(body, { onSuccess: (setup) => router.replace(`/setups/${setup.id}`) });
  };

  if (showNewCar) {
    return (
      <>
        {cars.length === 0 ? (
          <AppText>
            {otherCars > 0 ? 'None of your cars can take this setup: it' : 'This setup'} is for a {vehicleClassLabel(source.vehicleClass)} (
            {source.car.makerName} {source.car.kitName}). Add the car you race and your copy goes onto it.
          </AppText>
        ) : null}
        <AddCar
          source={source}
          onCreated={(id) => {
            setPicked(id);
            setAdding(false);
          }}
          onCancel={cars.length > 0 ? () => setAdding(false) : undefined}
        />
      </>
    );
  }
  return (
    <>
      <ForkCarPicker cars={cars} value={carId} onChange={setPicked} error={carError} onAddCar={() => setAdding(true)} disabled={fork.isPending} />
      <TextField
        label="Title for your copy"
        hint="It starts with the original’s title; change it if you like."
        value={title}
        onChangeText={(text) => {
          setTitle(text);
          setClientErrors((prev) => ({ ...prev, title: undefined }));
          if (fork.error) fork.reset();
        }}
        error={clientErrors.title ?? server.fieldErrors.title}
        maxLength={120}
        editable={!fork.isPending}
      />
      {preview.isPending ? (
        <LoadingState label="Checking what your car needs…" />
      ) : preview.isError ? (
        previewCarError(preview.error) ? null : (
          <ErrorState title="The preview could not load" message={preview.error.message} onRetry={() => void preview.refetch()} />
        )
      ) : (
        <ForkPreviewPanel
          key={`${carId}`}
          preview={preview.data}
          units={units}
          onConfirm={confirm}
          pending={fork.isPending}
          error={clientErrors.stockChoices ?? clientErrors.form ?? server.formError}
        />
      )}
    </>
  );
}

function ForkGarage(target: ForkTarget) {
  const garage = useGarageQuery();
  if (garage.isPending) return <LoadingState label="Loading your cars…" />;
  if (garage.isError) return <ErrorState title="Your cars could not load" message={garage.error.message} onRetry={() => void garage.refetch()} />;
  const cars = garage.data.cars.filter((car) => canForkOnto(target.source.vehicleClass, car.vehicleClass));
  return <ForkFlow {...target} cars={cars} otherCars={garage.data.cars.length - cars.length} />;
}

function ForkSource({ id, share, revisionId }: { id: number; share?: string; revisionId?: number }) {
  const setup = useSetupQuery(id, share);
  if (setup.isPending) return <LoadingState label="Loading the setup…" />;
  if (setup.isError) {
    if (setup.error instanceof ApiRequestError && setup.error.status === 404) {
      return (
        <EmptyState
          title="No setup at this address"
          message="It may be private, deleted, or the link is missing the part after “share=”. Ask whoever sent it for the full link."
          actionLabel="Find setups on Discover"
          onAction={() => router.replace('/')}
        />
      );
    }
    return <ErrorState title="This setup could not load" message={setup.error.message} onRetry={() => void setup.refetch()} />;
  }
  return <ForkGarage source={setup.data} share={share} revisionId={revisionId} />;
}

export default function ForkScreen() {
  const params = useLocalSearchParams<{ id: string; share?: string; revisionId?: string }>();
  const id = Number(params.id);
  const share = typeof params.share === 'string' && params.share ? params.share : undefined;
  const revisionId = typeof params.revisionId === 'string' && /^\d+$/.test(params.revisionId) ? Number(params.revisionId) : undefined;
  const me = useMeQuery();
  const shareQuery = share ? `?share=${encodeURIComponent(share)}` : '';
  const here = `/setups/${params.id}/fork${shareQuery}${revisionId ? `${shareQuery ? '&' : '?'}revisionId=${revisionId}` : ''}`;
  const back = { href: `/setups/${params.id}${shareQuery}`, label: 'Back to the setup' };
  const valid = Number.isSafeInteger(id) && id > 0;
  return (
    <Screen title="Start from this setup" subtitle="Copy it into your garage, with what you have: your car, your kit’s parts." back={back}>
      {!valid ? (
        <EmptyState title="No setup at this address" message="Check the address, or find a setup on Discover." actionLabel="Find setups on Discover" onAction={() => router.replace('/')} />
      ) : me.isPending ? (
        <LoadingState label="Checking who is signed in…" />
      ) : me.error && me.data === undefined ? (
        <ErrorState title="Could not check your sign-in" message={me.error.message} onRetry={() => void me.refetch()} />
      ) : !me.data ? (
        <ForkSignInPrompt signInHref={signInHref(here)} signUpHref={`/sign-up?next=${encodeURIComponent(here)}`} />
      ) : (
        <ForkSource id={id} share={share} revisionId={revisionId} />
      )}
    </Screen>
  );
}
