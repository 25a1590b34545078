import { useLocalSearchParams } from 'expo-router';
import { NewPasswordForm } from '../components/NewPasswordForm';
import { Screen } from '../components/Screen';
import { EmptyState } from '../components/StatusViews';
import { StatusNote } from '../components/StatusNote';
import { TextLink } from '../components/TextLink';
import { useResetPassword } from '../hooks/auth';

export default function ResetPasswordScreen() {
  const { token } = useLocalSearchParams<{ token?: string }>();
  const reset = useResetPassword();
  const back = { href: '/sign-in', label: 'Back to Sign in' };
  if (!token) {
    return (
      <Screen title="Choose a new password" back={back}>
        <EmptyState
          title="This link is incomplete"
          message="Open the link from your e-mail again, or ask for a new one: mail programs sometimes cut long links short."
        />
        <TextLink href="/forgot-password" label="Ask for a new link" />
      </Screen>
    );
  }
  if (reset.isSuccess) {
    return (
      <Screen title="Choose a new password" back={back}>
        <StatusNote message={reset.data.message} />
        <TextLink href="/sign-in" label="Sign in with your new password" />
      </Screen>
    );
  }
  return (
    <Screen title="Choose a new password" subtitle="Pick one you do not use anywhere else." back={back}>
      <NewPasswordForm
        onSubmit={({ password }) => reset.mutateAsync({ token, password })}
        pending={reset.isPending}
        error={reset.error}
      />
      {reset.isError ? <TextLink href="/forgot-password" label="Ask for a new link" /> : null}
    </Screen>
  );
}
