import { act, fireEvent, screen, waitFor } from '@testing-library/react-native';
import SyncScreen from '../../app/setups/[id]/sync';
import { rememberCsrfToken } from '../../hooks/api';
import { editorKeys } from '../../hooks/editor';
import type { Me } from '../../shared/types/auth';
import type { Upstream } from '../../shared/types/forks';
import type { SetupDetail } from '../../shared/types/setups';
import { renderWithQueries, stubFetch } from './support/render';

const mockDismissTo = jest.fn();
jest.mock('expo-router', () => ({
  router: { replace: jest.fn(), dismissTo: (href: string) => mockDismissTo(href) },
  useLocalSearchParams: () => ({ id: '31' }),
  Link: ({ children }: { children: unknown }) => children,
  Redirect: () => null,
}));

const rafi: Me = {
  id: 5, handle: 'rafi_new', displayName: 'Rafi', email: 'rafi@racers.example', emailVerified: true, pendingEmail: null,
  role: 'racer', bio: '', homeTrack: '', classesRaced: ['buggy-1-8-electric'], units: { length: 'mm', temperature: 'C' },
  hasPassword: true, githubLogin: null, createdAt: '2026-10-01T10:00:00.000Z',
};

function fork(revision: number): SetupDetail {
  return {
    id: 31, title: 'Hollow Pines, my first try', visibility: 'private', shareToken: null, isOwner: true,
    owner: { handle: 'rafi_new', displayName: 'Rafi' },
    car: { id: 12, nickname: 'First Stoat', kitName: 'Stoat 8E', makerName: 'Ottervale Kitworks', stock: true },
    vehicleClass: 'buggy-1-8-electric', templateVersion: 1,
    conditions: { trackType: null, temperatureC: null, grip: null }, notesMarkdown: '', notesHtml: '',
    currentRevision: { id: 90 + revision, number: revision, values: {}, changeNote: 'x', createdAt: '2026-12-01T10:00:00.000Z' },
    revisions: [], photos: [],
    lineage: { forkedFrom: { available: true, setupId: 7, title: 'Hollow Pines — loose and dusty', ownerHandle: 'juno_braithwick', revisionNumber: 4, share: null }, forkCount: 0, familyForkCount: 1 },
    commentCount: 0, hidden: null, createdAt: '2026-11-30T10:00:00.000Z', updatedAt: '2026-12-01T10:00:00.000Z',
  };
}

const original = { setupId: 7, title: 'Hollow Pines — loose and dusty', ownerHandle: 'juno_braithwick', revisionId: 61, revisionNumber: 6 };
const spur = { key: 'gear.spur', label: 'Spur gear', section: 'Gearing', base: 46, theirs: 48, mine: 46, status: 'theirs-only' as const };
const oil = { key: 'shock.rear.oil', label: 'Rear shock oil', section: 'Shocks', base: 450, theirs: 500, mine: 450, status: 'theirs-only' as const };

function serve(upstreams: Upstream[], apply: { status: number; body?: unknown }[] = []) {
  let reads = 0;
  let writes = 0;
  return stubFetch(({ url, method }) => {
    if (url.endsWith('/api/me')) return { status: 200, body: { user: rafi } };
    if (url.endsWith('/upstream') && method === 'GET') return { status: 200, body: upstreams[Math.min(reads++, upstreams.length - 1)] };
    if (url.endsWith('/upstream')) return apply[writes++];
    return { status: 200, body: { setup: fork(2) } };
  });
}

beforeEach(() => {
  mockDismissTo.mockReset();
  rememberCsrfToken('t');
});

describe('taking the original’s changes', () => {
  it('sends the revisions it was looking at and opens the setup on the new revision', async () => {
    const { calls } = serve(
      [{ status: 'available', original, syncedRevisionNumber: 4, mineRevisionId: 92, rows: [spur, oil] }],
      [{ status: 201, body: { setup: fork(3), taken: 1 } }],
    );
    const { client } = renderWithQueries(<SyncScreen />);
    fireEvent.press(await screen.findByRole('checkbox', { name: 'Take the original’s Spur gear' }));
    await act(async () => fireEvent.press(screen.getByRole('button', { name: 'Apply 1 change' })));
    await waitFor(() => expect(mockDismissTo).toHaveBeenCalledWith('/setups/31'));
    expect(calls.find((c) => c.method === 'POST')?.body).toEqual({ baseRevisionId: 92, theirsRevisionId: 61, take: ['gear.spur'], dismiss: [] });
    expect(client.getQueryData(editorKeys.savedNotice(31))).toEqual({ revisionNumber: 3, warnings: [] });
  });

  it('shows the fresh view with a note when the original moved meanwhile (409)', async () => {
    const moved = { ...original, revisionId: 62, revisionNumber: 7 };
    const { calls } = serve(
      [
        { status: 'available', original, syncedRevisionNumber: 4, mineRevisionId: 92, rows: [spur] },
        { status: 'available', original: moved, syncedRevisionNumber: 4, mineRevisionId: 92, rows: [spur, oil] },
      ],
      [{ status: 409, body: { error: { code: 'upstream_moved', message: 'The original changed since you looked.' } } }],
    );
    renderWithQueries(<SyncScreen />);
    fireEvent.press(await screen.findByRole('checkbox', { name: 'Take the original’s Spur gear' }));
    await act(async () => fireEvent.press(screen.getByRole('button', { name: 'Apply 1 change' })));
    expect(await screen.findByText('The original (or your fork) changed meanwhile — here is the fresh view.')).toBeTruthy();
    // One card per field of the fresh view, each naming the original's new revision.
    expect(await screen.findAllByText('Original now (revision 7)')).toHaveLength(2);
    // Fresh view, fresh choices: nothing is ticked until the racer looks again.
    expect(screen.getByRole('checkbox', { name: 'Take the original’s Spur gear' })).not.toBeChecked();
    expect(calls.filter((c) => c.url.endsWith('/upstream') && c.method === 'GET')).toHaveLength(2);
    expect(mockDismissTo).not.toHaveBeenCalled();
  });

  it('says the fork is unchanged when the original is gone', async () => {
    serve([{ status: 'unavailable' }]);
    renderWithQueries(<SyncScreen />);
    expect(await screen.findByText('The original is no longer available; your fork is unchanged.')).toBeTruthy();
  });

  it('says when there is nothing new to take', async () => {
    serve([{ status: 'available', original, syncedRevisionNumber: 6, mineRevisionId: 92, rows: [] }]);
    renderWithQueries(<SyncScreen />);
    expect(await screen.findByText('Up to date')).toBeTruthy();
  });
});
