import { AppText } from './AppText';
import { Card } from './Card';
import { EmailRequestForm } from './EmailRequestForm';
import { StatusNote } from './StatusNote';

export type ResendVerificationCardProps = {
  onSubmit: (values: { email: string }) => unknown;
  pending: boolean;
  error: unknown;
  /** The server's answer once a link went out. */
  sentMessage?: string | null;
  initialEmail?: string;
};

/** Asks for a fresh verification link when the one in hand is spent or lost. */
export function ResendVerificationCard({ onSubmit, pending, error, sentMessage, initialEmail }: ResendVerificationCardProps) {
  return (
    <Card>
      <AppText variant="heading">Need a new link?</AppText>
      <AppText tone="muted">Links work once and expire after a while. We can mail you a fresh one.</AppText>
      <StatusNote message={sentMessage} />
      <EmailRequestForm
        onSubmit={onSubmit}
        pending={pending}
        error={error}
        initialEmail={initialEmail}
        submitLabel="Send a new link"
        busyLabel="Sending…"
      />
    </Card>
  );
}
