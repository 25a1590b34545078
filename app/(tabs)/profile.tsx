import { StyleSheet, View } from 'react-native';
import { AccountCard } from '../../components/AccountCard';
import { AppText } from '../../components/AppText';
import { Button } from '../../components/Button';
import { ButtonLink } from '../../components/ButtonLink';
import { Card } from '../../components/Card';
import { LinkList, type LinkListItem } from '../../components/LinkList';
import { Screen } from '../../components/Screen';
import { ErrorState, LoadingState } from '../../components/StatusViews';
import { VerifyEmailNotice } from '../../components/VerifyEmailNotice';
import { useMeQuery, useResendVerification, useSignOut } from '../../hooks/auth';
import { describeError } from '../../hooks/form';
import { useShowDevMailbox } from '../../hooks/mailbox';
import type { Me } from '../../shared/types/auth';
import { space } from '../../theme';

function SignedOut() {
  return (
    <Card>
      <AppText variant="heading">Your setups, your way</AppText>
      <AppText tone="muted">
        Sign in to keep every car’s setup sheet with the reason for each change, publish the ones that work and fork
        proven setups from other racers.
      </AppText>
      <View style={styles.actions}>
        <ButtonLink href="/sign-in" label="Sign in" />
        <ButtonLink href="/sign-up" label="Create an account" variant="secondary" />
      </View>
    </Card>
  );
}

function destinations(me: Me, showMailbox: boolean): LinkListItem[] {
  const items: LinkListItem[] = [
    { href: `/racers/${me.handle}`, label: 'Your public page', description: 'What other racers see' },
    { href: '/settings', label: 'Settings', description: 'Profile, units, e-mail, password and sign-in methods' },
    { href: '/reports', label: 'My reports', description: 'What you reported and what came of it' },
    { href: '/moderation/mine', label: 'Moderation of my posts', description: 'Anything moderators hid or warned about, and appeals' },
  ];
  // Moderators come here to work the queue, so it leads the list.
  if (me.role !== 'racer') {
    items.unshift(
      { href: '/moderation', label: 'Review queue', description: 'Reports and appeals waiting for a moderator' },
      { href: '/moderation/audit', label: 'Audit log', description: 'Every moderation and role action' },
    );
  }
  if (me.role === 'admin') items.push({ href: '/admin', label: 'Admin', description: 'Roles and suspensions' });
  if (showMailbox) items.push({ href: '/dev/mailbox', label: 'Mailbox', description: 'Mail the server sent (development only)' });
  return items;
}

function SignedIn({ me }: { me: Me }) {
  const resend = useResendVerification();
  const signOut = useSignOut();
  const showMailbox = useShowDevMailbox();
  // A changed address waits for its link; a new account's own address may not be confirmed yet.
  const unconfirmed = me.pendingEmail ?? (me.email && !me.emailVerified ? me.email : null);
  return (
    <>
      <AccountCard me={me} />
      {unconfirmed ? (
        <VerifyEmailNotice
          email={unconfirmed}
          onResend={() => resend.mutate({ email: unconfirmed })}
          pending={resend.isPending}
          sentMessage={resend.data?.message}
          error={describeError(resend.error, []).formError}
        />
      ) : null}
      <LinkList label="Your account" items={destinations(me, showMailbox)} />
      <Button
        label="Sign out"
        busyLabel="Signing out…"
        busy={signOut.isPending}
        variant="secondary"
        onPress={() => signOut.mutate()}
      />
      {signOut.isError ? <ErrorState title="Could not sign out" message={signOut.error.message} /> : null}
    </>
  );
}

export default function ProfileScreen() {
  const me = useMeQuery();
  return (
    <Screen title="Profile" subtitle="Your racer page, settings and sign-in.">
      {me.isPending ? <LoadingState label="Checking who is signed in…" /> : null}
      {me.isError && me.data === undefined ? (
        <ErrorState title="Could not check your sign-in" message={me.error.message} onRetry={() => void me.refetch()} />
      ) : null}
      {me.data === null ? <SignedOut /> : null}
      {me.data ? <SignedIn me={me.data} /> : null}
    </Screen>
  );
}

const styles = StyleSheet.create({
  actions: { flexDirection: 'row', flexWrap: 'wrap', gap: space.md, marginTop: space.sm },
});
