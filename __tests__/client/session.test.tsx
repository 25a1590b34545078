import { fireEvent, screen } from '@testing-library/react-native';
import { Button } from '../../components/Button';
import { AppText } from '../../components/AppText';
import { adminKeys } from '../../hooks/admin';
import { rememberCsrfToken } from '../../hooks/api';
import { authKeys, safeNextPath, useMeQuery, useSignOut } from '../../hooks/auth';
import type { Me } from '../../shared/types/auth';
import { renderWithQueries, stubFetch, testQueryClient } from './support/render';

const me: Me = {
  id: 3, handle: 'fenna', displayName: 'Fenna Rooks', email: 'fenna@example.test', emailVerified: true, pendingEmail: null,
  role: 'admin', bio: '', homeTrack: 'Old Kiln Indoor', classesRaced: ['buggy-1-8-nitro'], units: { length: 'mm', temperature: 'C' },
  hasPassword: true, githubLogin: null, createdAt: '2025-03-01T10:00:00.000Z',
};

// Two siblings, as on a real screen: the one showing who is signed in is not the one signing out,
// so nothing re-renders it except the cache itself.
function WhoIsSignedIn() {
  const current = useMeQuery();
  return <AppText>{current.data ? `Signed in as ${current.data.handle}` : current.data === null ? 'Signed out' : 'Checking'}</AppText>;
}

function SignOutButton() {
  const signOut = useSignOut();
  return <Button label="Sign out" onPress={() => signOut.mutate()} />;
}

function SessionHarness() {
  return (
    <>
      <WhoIsSignedIn />
      <SignOutButton />
    </>
  );
}

describe('signing out', () => {
  it('empties the whole cache and shows the signed-out state on screens already open', async () => {
    rememberCsrfToken('t');
    stubFetch(({ url }) => (url.endsWith('/api/auth/sign-out') ? { status: 204 } : { status: 200, body: { user: null } }));
    const client = testQueryClient();
    client.setQueryData(authKeys.me(), me);
    client.setQueryData(adminKeys.users(''), [{ id: 1 }]);
    renderWithQueries(<SessionHarness />, client);
    expect(screen.getByText('Signed in as fenna')).toBeTruthy();
    fireEvent.press(screen.getByRole('button', { name: 'Sign out' }));
    expect(await screen.findByText('Signed out')).toBeTruthy();
    expect(client.getQueryData(adminKeys.users(''))).toBeUndefined();
  });
});

describe('safeNextPath', () => {
  it.each([
    ['/settings', '/settings'],
    ['/racers/fenna?tab=bio', '/racers/fenna?tab=bio'],
    ['//elsewhere.example/steal', '/profile'],
    ['https://elsewhere.example/', '/profile'],
    ['/\\elsewhere.example', '/profile'],
    [undefined, '/profile'],
    [['/a', '/b'], '/profile'],
  ])('follows %p to %p after sign-in', (next, expected) => {
    expect(safeNextPath(next)).toBe(expected);
  });
});
