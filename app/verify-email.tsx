import { useLocalSearchParams } from 'expo-router';
import { useEffect, useRef } from 'react';
import { ResendVerificationCard } from '../components/ResendVerificationCard';
import { Screen } from '../components/Screen';
import { ErrorState, LoadingState } from '../components/StatusViews';
import { StatusNote } from '../components/StatusNote';
import { TextLink } from '../components/TextLink';
import { useMeQuery, useResendVerification, useVerifyEmail } from '../hooks/auth';

export default function VerifyEmailScreen() {
  const { token } = useLocalSearchParams<{ token?: string }>();
  const verify = useVerifyEmail();
  const resend = useResendVerification();
  const me = useMeQuery();
  // Tokens work once: a second request (React's strict-mode double effect, a re-render) would fail.
  const sentFor = useRef<string | null>(null);
  const { mutate } = verify;
  useEffect(() => {
    if (!token || sentFor.current === token) return;
    sentFor.current = token;
    mutate(token);
  }, [token, mutate]);

  const knownEmail = me.data?.pendingEmail ?? me.data?.email ?? '';
  const resendCard = (
    <ResendVerificationCard
      // The address arrives with the session; start the form again once it is known.
      key={knownEmail}
      onSubmit={(values) => resend.mutateAsync(values)}
      pending={resend.isPending}
      error={resend.error}
      sentMessage={resend.data?.message}
      initialEmail={knownEmail}
    />
  );
  const back = { href: '/profile', label: 'Back to Profile' };

  if (!token) {
    return (
      <Screen title="Confirm your e-mail address" back={back}>
        <ErrorState title="This link is incomplete" message="Open the link from your e-mail again; mail programs sometimes cut long links short." />
        {resendCard}
      </Screen>
    );
  }
  if (verify.isError) {
    return (
      <Screen title="Confirm your e-mail address" back={back}>
        <ErrorState title="That link did not work" message={verify.error.message} onRetry={() => mutate(token)} />
        {resendCard}
      </Screen>
    );
  }
  if (verify.isSuccess) {
    return (
      <Screen title="Confirm your e-mail address" back={back}>
        <StatusNote message={verify.data.message} />
        {me.data ? <TextLink href="/profile" label="Go to your profile" /> : <TextLink href="/sign-in" label="Sign in" />}
      </Screen>
    );
  }
  return (
    <Screen title="Confirm your e-mail address" back={back}>
      <LoadingState label="Checking your link…" />
    </Screen>
  );
}
