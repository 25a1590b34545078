import { useLocalSearchParams } from 'expo-router';
import { MailMessage } from '../../../components/MailMessage';
import { Screen } from '../../../components/Screen';
import { EmptyState, ErrorState, LoadingState } from '../../../components/StatusViews';
import { linksIn, useMailboxQuery } from '../../../hooks/mailbox';

export default function MailboxMessageScreen() {
  const { id } = useLocalSearchParams<{ id: string }>();
  // The mailbox answers with whole messages, so one message is read from the same list.
  const mailbox = useMailboxQuery();
  const back = { href: '/dev/mailbox', label: 'Back to Mailbox' };
  if (mailbox.isPending) {
    return (
      <Screen title="Mail" back={back}>
        <LoadingState label="Opening the mail…" />
      </Screen>
    );
  }
  if (mailbox.isError) {
    return (
      <Screen title="Mail" back={back}>
        <ErrorState title="The mailbox could not load" message={mailbox.error.message} onRetry={() => void mailbox.refetch()} />
      </Screen>
    );
  }
  const message = mailbox.data.find((m) => String(m.id) === id);
  if (!message) {
    return (
      <Screen title="Mail" back={back}>
        <EmptyState title="That mail is gone" message="It is not in the mailbox any more, or the address is mistyped." />
      </Screen>
    );
  }
  return (
    <Screen title="Mail" back={back}>
      <MailMessage message={message} links={linksIn(message.text)} />
    </Screen>
  );
}
