import { EmailRequestForm } from '../components/EmailRequestForm';
import { Screen } from '../components/Screen';
import { StatusNote } from '../components/StatusNote';
import { TextLink } from '../components/TextLink';
import { useForgotPassword } from '../hooks/auth';

export default function ForgotPasswordScreen() {
  const forgot = useForgotPassword();
  return (
    <Screen
      title="Forgot your password?"
      subtitle="Tell us the address you signed up with and we will mail you a link to choose a new one."
      back={{ href: '/sign-in', label: 'Back to Sign in' }}
    >
      <StatusNote message={forgot.data?.message} />
      <EmailRequestForm
        onSubmit={(values) => forgot.mutateAsync(values)}
        pending={forgot.isPending}
        error={forgot.error}
        submitLabel={forgot.isSuccess ? 'Send another link' : 'Send the link'}
        busyLabel="Sending…"
      />
      <TextLink href="/sign-in" label="Remembered it? Sign in" />
    </Screen>
  );
}
