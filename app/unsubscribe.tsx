import { useMutation, useQuery } from '@tanstack/react-query';
import { useLocalSearchParams } from 'expo-router';
import { EmailPreferencesUnsubscribe } from '../components/EmailPreferencesUnsubscribe';
import { Screen } from '../components/Screen';
import { ErrorState, LoadingState } from '../components/StatusViews';
import { ApiRequestError, apiMutate, apiRequest } from '../hooks/api';
import { describeError } from '../hooks/form';
import { unsubscribeInfoSchema, unsubscribeResponseSchema } from '../shared/types/community';

/** The link from a notification e-mail: says what it stops, then stops it in one click. No sign-in. */
export default function UnsubscribeScreen() {
  const { token } = useLocalSearchParams<{ token?: string }>();
  const link = typeof token === 'string' ? token : '';
  // Opening the page only reads; mail scanners that open links change nothing.
  const info = useQuery({
    queryKey: ['unsubscribe', link],
    queryFn: ({ signal }) => apiRequest(`/unsubscribe?token=${encodeURIComponent(link)}`, { schema: unsubscribeInfoSchema, signal }),
    enabled: link.length > 0,
    staleTime: Infinity,
  });
  const apply = useMutation({
    mutationFn: () => apiMutate('/unsubscribe', { body: { token: link }, schema: unsubscribeResponseSchema }),
  });
  const screen = { title: 'Stop notification e-mail', back: { href: '/', label: 'Go to Tunefork' } };

  if (!link) {
    return (
      <Screen {...screen}>
        <ErrorState title="This link is incomplete" message="Open the link from your e-mail again; mail programs sometimes cut long links short." />
      </Screen>
    );
  }
  if (info.isError) {
    return (
      <Screen {...screen}>
        <ErrorState
          title="That link did not work"
          message={describeError(info.error, []).formError ?? info.error.message}
          // A refused link stays refused; only a network or server failure is worth another try.
          onRetry={info.error instanceof ApiRequestError && info.error.status < 500 && info.error.status > 0 ? undefined : () => void info.refetch()}
        />
      </Screen>
    );
  }
  if (!info.data) {
    return (
      <Screen {...screen}>
        <LoadingState label="Checking your link…" />
      </Screen>
    );
  }
  return (
    <Screen {...screen}>
      <EmailPreferencesUnsubscribe
        info={info.data}
        onConfirm={() => apply.mutate()}
        pending={apply.isPending}
        doneMessage={apply.data?.message ?? null}
        error={describeError(apply.error, []).formError}
      />
    </Screen>
  );
}
