import { router } from 'expo-router';
import type { ReactNode } from 'react';
import { ApiRequestError } from '../hooks/api';
import { useSetupQuery } from '../hooks/setups';
import type { SetupDetail } from '../shared/types/setups';
import { SetupPageFrame } from './SetupPageFrame';
import { EmptyState, ErrorState, LoadingState } from './StatusViews';

type Back = { href: string; label: string };
const TO_DISCOVER: Back = { href: '/', label: 'Back to Discover' };

export type SetupQueryGateProps = {
  id: number;
  share?: string;
  /** Page titles while there is no setup to name the page after. */
  titles: { notFound: string; pending: string };
  /** Where "back" leads; the setup is undefined until it has loaded. */
  back: (setup: SetupDetail | undefined) => Back;
  /** The page once the setup has loaded. */
  children: (setup: SetupDetail) => ReactNode;
};

/**
 * Loads one setup for a setup screen and shows the same not-found, loading and error states on
 * every such screen; the screen itself only renders the loaded setup.
 */
export function SetupQueryGate({ id, share, titles, back, children }: SetupQueryGateProps) {
  const setup = useSetupQuery(id, share);
  if (!Number.isSafeInteger(id) || id <= 0 || (setup.isError && setup.error instanceof ApiRequestError && setup.error.status === 404)) {
    return (
      <SetupPageFrame title={titles.notFound} back={TO_DISCOVER}>
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
      <SetupPageFrame title={titles.pending} back={back(undefined)}>
        <LoadingState label="Loading the setup…" />
      </SetupPageFrame>
    );
  }
  if (setup.isError) {
    return (
      <SetupPageFrame title={titles.pending} back={back(undefined)}>
        <ErrorState title="This setup could not load" message={setup.error.message} onRetry={() => void setup.refetch()} />
      </SetupPageFrame>
    );
  }
  return <>{children(setup.data)}</>;
}
