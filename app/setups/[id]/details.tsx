import { router, useLocalSearchParams } from 'expo-router';
import { useRef } from 'react';
import { AppText } from '../../../components/AppText';
import { ButtonLink } from '../../../components/ButtonLink';
import { Card } from '../../../components/Card';
import { Screen } from '../../../components/Screen';
import { SetupDetailsForm } from '../../../components/SetupDetailsForm';
import { SetupDetailsFormFrame } from '../../../components/SetupDetailsFormFrame';
import { SignedInGate } from '../../../components/SignedInGate';
import { ErrorState, LoadingState } from '../../../components/StatusViews';
import { ApiRequestError } from '../../../hooks/api';
import { signInHref, useMeQuery } from '../../../hooks/auth';
import { describeError } from '../../../hooks/form';
import { useMarkdownPreview, useSetupQuery, useUpdateSetupMeta } from '../../../hooks/setups';
import type { UnitPreferences } from '../../../shared/types/auth';
import type { SetupDetail } from '../../../shared/types/setups';

type SetupQuery = ReturnType<typeof useSetupQuery>;

function DetailsEditor({ setup, units }: { setup: SetupDetail; units: UnitPreferences }) {
  const update = useUpdateSetupMeta(setup.id);
  const preview = useMarkdownPreview();
  const leaveApproved = useRef(false);
  const setupHref = `/setups/${setup.id}` as const;
  return (
    <SetupDetailsFormFrame>
      <SetupDetailsForm
        setupId={setup.id}
        saved={setup}
        units={units}
        pending={update.isPending}
        error={update.error}
        onSubmit={(changes) =>
          update.mutateAsync(changes).then(() => {
            leaveApproved.current = true;
            router.dismissTo(setupHref);
          })
        }
        preview={{
          markdown: preview.variables,
          html: preview.data,
          pending: preview.isPending,
          error: preview.error ? describeError(preview.error, []).formError : null,
        }}
        onPreview={(markdown) => preview.mutate(markdown)}
        leaveApproved={leaveApproved}
      />
    </SetupDetailsFormFrame>
  );
}

function NotOwner({ setup }: { setup: SetupDetail }) {
  return (
    <Card>
      <AppText variant="heading">Only its owner can edit these details</AppText>
      <AppText>This setup belongs to @{setup.owner.handle}. You can still read its notes and sheet on the setup page.</AppText>
      <ButtonLink href={`/setups/${setup.id}`} label="Back to the setup" />
    </Card>
  );
}

function LoadStates({ setupId, setup }: { setupId: number; setup: SetupQuery }) {
  if (!Number.isSafeInteger(setupId) || setupId <= 0) {
    return <ErrorState title="No such setup" message="This address does not point to a setup. Open one from your garage." />;
  }
  if (setup.isPending) return <LoadingState label="Opening the setup…" />;
  if (setup.error) {
    const missing = setup.error instanceof ApiRequestError && setup.error.status === 404;
    return missing ? (
      <ErrorState title="Setup not found" message="It may have been deleted, or it is private to another racer." />
    ) : (
      <ErrorState title="Could not open the setup" message={setup.error.message} onRetry={() => void setup.refetch()} />
    );
  }
  return <NotOwner setup={setup.data} />;
}

export default function SetupDetailsScreen() {
  const params = useLocalSearchParams<{ id: string }>();
  const setupId = Number(params.id);
  const me = useMeQuery();
  const setup = useSetupQuery(setupId);
  if (me.data && setup.data?.isOwner) return <DetailsEditor setup={setup.data} units={me.data.units} />;
  const valid = Number.isSafeInteger(setupId) && setupId > 0;
  return (
    <Screen title="Edit details" back={valid ? { href: `/setups/${setupId}`, label: 'Back to the setup' } : { href: '/garage', label: 'Back to the garage' }}>
      <SignedInGate me={me} signInHref={signInHref(`/setups/${params.id}/details`)}>
        {() => <LoadStates setupId={setupId} setup={setup} />}
      </SignedInGate>
    </Screen>
  );
}
