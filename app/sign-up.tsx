import { Redirect, useLocalSearchParams } from 'expo-router';
import { GithubButton } from '../components/GithubButton';
import { Screen } from '../components/Screen';
import { SignUpForm } from '../components/SignUpForm';
import { TextLink } from '../components/TextLink';
import { continueWithGithub, safeNextPath, signInHref, useMeQuery, useSignUp } from '../hooks/auth';

export default function SignUpScreen() {
  const params = useLocalSearchParams<{ next?: string }>();
  // New racers land on Profile by default, where the "check your inbox" notice waits.
  const next = safeNextPath(params.next);
  const me = useMeQuery();
  const signUp = useSignUp();
  if (me.data) return <Redirect href={next} />;
  return (
    <Screen
      title="Create your account"
      subtitle="Keep your setups, publish the ones that work, fork the ones that win."
      back={{ href: '/profile', label: 'Back to Profile' }}
    >
      <SignUpForm onSubmit={(values) => signUp.mutateAsync(values)} pending={signUp.isPending} error={signUp.error} />
      <GithubButton onPress={() => continueWithGithub(next)} />
      <TextLink href={signInHref(next)} label="Already racing with us? Sign in" />
    </Screen>
  );
}
