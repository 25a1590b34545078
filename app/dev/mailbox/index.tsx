import { Button } from '../../../components/Button';
import { MailboxList } from '../../../components/MailboxList';
import { Screen } from '../../../components/Screen';
import { EmptyState, ErrorState, LoadingState } from '../../../components/StatusViews';
import { ApiRequestError } from '../../../hooks/api';
import { useMailboxQuery } from '../../../hooks/mailbox';

export default function MailboxScreen() {
  const mailbox = useMailboxQuery();
  const back = { href: '/profile', label: 'Back to Profile' };
  const subtitle = 'Mail the server sent while developing: verification and reset links land here instead of a real inbox.';
  if (mailbox.isPending) {
    return (
      <Screen title="Mailbox" subtitle={subtitle} back={back}>
        <LoadingState label="Opening the mailbox…" />
      </Screen>
    );
  }
  if (mailbox.isError) {
    const absent = mailbox.error instanceof ApiRequestError && mailbox.error.status === 404;
    return (
      <Screen title="Mailbox" subtitle={subtitle} back={back}>
        {absent ? (
          <EmptyState title="No mailbox here" message="The mailbox only exists while the server runs in development." />
        ) : (
          <ErrorState title="The mailbox could not load" message={mailbox.error.message} onRetry={() => void mailbox.refetch()} />
        )}
      </Screen>
    );
  }
  return (
    <Screen title="Mailbox" subtitle={subtitle} back={back}>
      <Button
        label="Check for new mail"
        busyLabel="Checking…"
        busy={mailbox.isFetching}
        variant="secondary"
        onPress={() => void mailbox.refetch()}
      />
      {mailbox.data.length === 0 ? (
        <EmptyState
          title="No mail yet"
          message="Sign up, change your e-mail address or ask for a password reset, then check again."
        />
      ) : (
        <MailboxList messages={mailbox.data} />
      )}
    </Screen>
  );
}
