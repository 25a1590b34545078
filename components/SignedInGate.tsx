import { Redirect } from 'expo-router';
import type { ReactNode } from 'react';
import type { Me } from '../shared/types/auth';
import { ErrorState, LoadingState } from './StatusViews';

export type SignedInGateProps = {
  /** The signed-in racer query: undefined while loading, null when signed out. */
  me: { data: Me | null | undefined; isPending: boolean; error: Error | null; refetch: () => unknown };
  /** Where the sign-in screen sends the racer back to. */
  signInHref: string;
  children: (me: Me) => ReactNode;
};

/** Renders `children` for a signed-in racer; everyone else goes to sign-in and comes back after. */
export function SignedInGate({ me, signInHref, children }: SignedInGateProps) {
  if (me.isPending) return <LoadingState label="Checking who is signed in…" />;
  if (me.error && me.data === undefined)
    return <ErrorState title="Could not check your sign-in" message={me.error.message} onRetry={() => void me.refetch()} />;
  if (!me.data) return <Redirect href={signInHref} />;
  return <>{children(me.data)}</>;
}
