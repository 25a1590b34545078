import { Redirect, useLocalSearchParams } from 'expo-router';
import { GithubButton } from '../components/GithubButton';
import { Screen } from '../components/Screen';
import { SignInForm } from '../components/SignInForm';
import { SuspensionAppealCard, suspensionAppealToken } from '../components/SuspensionAppealCard';
import { TextLink } from '../components/TextLink';
import { continueWithGithub, safeNextPath, useMeQuery, useSignIn } from '../hooks/auth';
import { useSuspensionAppeal } from '../hooks/moderation';

export default function SignInScreen() {
  const params = useLocalSearchParams<{ next?: string; error?: string }>();
  const next = safeNextPath(params.next);
  const me = useMeQuery();
  const signIn = useSignIn();
  const appeal = useSuspensionAppeal();
  const appealToken = suspensionAppealToken(signIn.error);
  // Signing in fills the session cache, which lands here too: one way onward for both cases.
  if (me.data) return <Redirect href={next} />;
  return (
    <Screen title="Sign in" subtitle="Welcome back. Your garage is where you left it." back={{ href: '/profile', label: 'Back to Profile' }}>
      <SignInForm
        onSubmit={(values) => signIn.mutateAsync(values)}
        pending={signIn.isPending}
        error={signIn.error}
        notice={typeof params.error === 'string' ? params.error : null}
      />
      {appealToken ? <SuspensionAppealCard key={appealToken} onSubmit={(text) => appeal.mutateAsync({ appealToken, text })} /> : null}
      <TextLink href="/forgot-password" label="Forgot your password?" />
      <GithubButton onPress={() => continueWithGithub(next)} />
      <TextLink href={`/sign-up?next=${encodeURIComponent(next)}`} label="New to Tunefork? Create an account" />
    </Screen>
  );
}
