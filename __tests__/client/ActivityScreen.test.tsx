import { fireEvent, screen, waitFor } from '@testing-library/react-native';
import type { ReactElement } from 'react';
import ActivityScreen from '../../app/(tabs)/activity';
import { rememberCsrfToken } from '../../hooks/api';
import type { Me } from '../../shared/types/auth';
import type { FeedItem, FeedPage, FeedSuggestions } from '../../shared/types/community';
import { renderWithQueries, stubFetch } from './support/render';

jest.mock('expo-router', () => ({
  Link: ({ children, href }: { children: ReactElement; href: string }) => jest.requireActual('react').cloneElement(children, { href }),
}));

const rafi: Me = {
  id: 5, handle: 'rafi_new', displayName: 'Rafi', email: 'rafi@racers.example', emailVerified: true, pendingEmail: null,
  role: 'racer', bio: '', homeTrack: '', classesRaced: ['buggy-1-8-electric'], units: { length: 'mm', temperature: 'C' },
  hasPassword: true, githubLogin: null, createdAt: '2026-10-01T10:00:00.000Z',
};

function setupItem(id: number, title: string): FeedItem {
  return { kind: 'setup', id, createdAt: '2026-12-01T10:00:00.000Z', actor: { handle: 'juno_braithwick', displayName: 'Juno' }, setup: { id, title, vehicleClass: 'buggy-1-8-electric' } };
}

beforeEach(() => {
  rememberCsrfToken('t');
});

describe('the Activity tab', () => {
  it('loads older pages with the cursor the server gave', async () => {
    const pages: Record<string, FeedPage> = {
      first: { items: [setupItem(2, 'Newer sheet')], nextCursor: 'CURSOR-1' },
      second: { items: [setupItem(1, 'Older sheet')], nextCursor: null },
    };
    const { calls } = stubFetch(({ url }) => {
      if (url.endsWith('/api/me')) return { status: 200, body: { user: rafi } };
      return { status: 200, body: url.includes('cursor=CURSOR-1') ? pages.second : pages.first };
    });
    renderWithQueries(<ActivityScreen />);
    expect(await screen.findByRole('link', { name: 'Newer sheet' }, { timeout: 5_000 })).toBeTruthy();
    fireEvent.press(screen.getByRole('button', { name: 'Show older activity' }));
    expect(await screen.findByRole('link', { name: 'Older sheet' })).toBeTruthy();
    expect(screen.getByText("That is everything so far. Older changes are in each setup’s history.")).toBeTruthy();
    expect(calls.map((c) => c.url).filter((u) => u.includes('/feed'))).toEqual(['/api/feed', '/api/feed?cursor=CURSOR-1']);
  });

  it('checks for new activity on request, from the first page again', async () => {
    let newest = 'Newer sheet';
    const { calls } = stubFetch(({ url }) => {
      if (url.endsWith('/api/me')) return { status: 200, body: { user: rafi } };
      return { status: 200, body: { items: [setupItem(9, newest)], nextCursor: null } };
    });
    renderWithQueries(<ActivityScreen />);
    expect(await screen.findByRole('link', { name: 'Newer sheet' })).toBeTruthy();
    newest = 'Brand-new sheet';
    fireEvent.press(screen.getByRole('button', { name: 'Check for new activity' }));
    expect(await screen.findByRole('link', { name: 'Brand-new sheet' })).toBeTruthy();
    expect(calls.filter((c) => c.url === '/api/feed')).toHaveLength(2);
  });

  it('suggests racers to follow when the feed is empty, and follows one', async () => {
    const suggestions: FeedSuggestions = {
      classes: ['buggy-1-8-electric'],
      racers: [{ handle: 'juno_braithwick', displayName: 'Juno', forkCount: 12, setupCount: 3 }],
    };
    const { calls } = stubFetch(({ url, method }) => {
      if (url.endsWith('/api/me')) return { status: 200, body: { user: rafi } };
      if (url.endsWith('/feed/suggestions')) return { status: 200, body: suggestions };
      if (url.endsWith('/follow') && method === 'POST') {
        return { status: 200, body: { follow: { handle: 'juno_braithwick', followerCount: 1, followingCount: 0, followedByMe: true, canFollow: true } } };
      }
      return { status: 200, body: { items: [], nextCursor: null } };
    });
    renderWithQueries(<ActivityScreen />);
    expect(await screen.findByText('Nothing here yet')).toBeTruthy();
    expect(await screen.findByText('Their setups are forked most in the 1/8 electric buggy class.')).toBeTruthy();
    expect(screen.getByText('Juno · 12 forks · 3 public setups')).toBeTruthy();
    fireEvent.press(screen.getByRole('button', { name: 'Follow @juno_braithwick' }));
    await waitFor(() => expect(calls.some((c) => c.method === 'POST' && c.url === '/api/racers/juno_braithwick/follow')).toBe(true));
    // Following changes the feed: it is asked for again.
    await waitFor(() => expect(calls.filter((c) => c.url === '/api/feed')).toHaveLength(2));
  });

  it('says what went wrong and retries', async () => {
    let fail = true;
    stubFetch(({ url }) => {
      if (url.endsWith('/api/me')) return { status: 200, body: { user: rafi } };
      if (fail) return { status: 500, body: { error: { code: 'internal', message: 'Something went wrong on our side. Please try again.' } } };
      return { status: 200, body: { items: [setupItem(3, 'Back again')], nextCursor: null } };
    });
    renderWithQueries(<ActivityScreen />);
    expect(await screen.findByText('Your feed could not load')).toBeTruthy();
    fail = false;
    fireEvent.press(screen.getByRole('button', { name: 'Try again' }));
    expect(await screen.findByRole('link', { name: 'Back again' })).toBeTruthy();
  });

  it('asks a signed-out visitor to sign in', async () => {
    stubFetch(() => ({ status: 200, body: { user: null } }));
    renderWithQueries(<ActivityScreen />);
    expect(await screen.findByRole('link', { name: 'Sign in' })).toBeTruthy();
  });
});
