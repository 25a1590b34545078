import { useState, type ReactNode } from 'react';
import { StyleSheet, View } from 'react-native';
import { AdminUserRow } from '../components/AdminUserRow';
import { Card } from '../components/Card';
import { Screen } from '../components/Screen';
import { SignedInGate } from '../components/SignedInGate';
import { TextLink } from '../components/TextLink';
import { EmptyState, ErrorState, LoadingState } from '../components/StatusViews';
import { TextField } from '../components/TextField';
import { useAdminUsersQuery, useChangeRole, useSuspendUser, useUnsuspendUser } from '../hooks/admin';
import { signInHref, useMeQuery } from '../hooks/auth';
import { describeError } from '../hooks/form';
import { useDebouncedValue } from '../hooks/useDebouncedValue';
import type { AdminUser } from '../shared/types/auth';
import { space } from '../theme';

const SEARCH_PAUSE_MS = 300;

function forRow(mutation: { variables?: { id: number }; isPending: boolean; error: unknown }, id: number) {
  const mine = mutation.variables?.id === id;
  return { pending: mine && mutation.isPending, error: mine ? mutation.error : null };
}

function UserRows({ users }: { users: AdminUser[] }) {
  const role = useChangeRole();
  const suspend = useSuspendUser();
  const unsuspend = useUnsuspendUser();
  return (
    <Card>
      <View role="list">
        {users.map((user, index) => {
          const [r, s, u] = [forRow(role, user.id), forRow(suspend, user.id), forRow(unsuspend, user.id)];
          return (
            <AdminUserRow
              key={user.id}
              first={index === 0}
              user={user}
              onChangeRole={(next) => role.mutate({ id: user.id, role: next })}
              onSuspend={(values) => suspend.mutateAsync({ id: user.id, ...values })}
              onUnsuspend={() => unsuspend.mutate({ id: user.id })}
              pending={r.pending ? 'role' : s.pending ? 'suspend' : u.pending ? 'unsuspend' : null}
              error={describeError(r.error ?? u.error, []).formError}
              suspendError={s.error}
            />
          );
        })}
      </View>
    </Card>
  );
}

function AdminPanel() {
  const [search, setSearch] = useState('');
  const query = useDebouncedValue(search, SEARCH_PAUSE_MS);
  const users = useAdminUsersQuery(query, true);
  let list: ReactNode;
  if (users.isPending) list = <LoadingState label="Loading accounts…" />;
  else if (users.isError)
    list = <ErrorState title="Accounts could not load" message={users.error.message} onRetry={() => void users.refetch()} />;
  else if (users.data.length === 0)
    list = (
      <EmptyState
        title={query.trim() ? 'Nobody matches that search' : 'No accounts yet'}
        message={query.trim() ? 'Try part of a handle, a display name or an e-mail address.' : 'Accounts appear here as racers sign up.'}
      />
    );
  else list = <UserRows users={users.data} />;
  return (
    <>
      <View style={styles.links}>
        <TextLink href="/moderation" label="Review queue" />
        <TextLink href="/moderation/audit" label="Audit log" />
      </View>
      <TextField
        label="Search accounts"
        hint="Handle, display name or e-mail address."
        value={search}
        onChangeText={setSearch}
        autoCapitalize="none"
        autoCorrect={false}
        returnKeyType="search"
      />
      {list}
    </>
  );
}

export default function AdminScreen() {
  const me = useMeQuery();
  return (
    <Screen title="Admin" subtitle="Roles and suspensions for every account." back={{ href: '/profile', label: 'Back to Profile' }}>
      <SignedInGate me={me} signInHref={signInHref('/admin')}>
        {(signedIn) =>
          signedIn.role === 'admin' ? (
            <AdminPanel />
          ) : (
            <EmptyState
              title="Admins only"
              message="This page is for Tunefork's admins. If you think you should have access, ask one of them."
            />
          )
        }
      </SignedInGate>
    </Screen>
  );
}

const styles = StyleSheet.create({
  links: { flexDirection: 'row', flexWrap: 'wrap', columnGap: space.lg },
});
