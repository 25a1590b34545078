import { act, fireEvent, screen, waitFor, within } from '@testing-library/react-native';
import EditSetupScreen from '../../app/setups/[id]/edit';
import { rememberCsrfToken } from '../../hooks/api';
import { editorKeys } from '../../hooks/editor';
import type { Me } from '../../shared/types/auth';
import type { SetupDetail } from '../../shared/types/setups';
import { renderWithQueries, stubFetch } from './support/render';

const mockDismissTo = jest.fn();
jest.mock('expo-router', () => ({
  router: { dismissTo: (href: string) => mockDismissTo(href) },
  useLocalSearchParams: () => ({ id: '7' }),
  useNavigation: () => ({ addListener: () => () => {}, dispatch: () => {} }),
  Link: ({ children }: { children: unknown }) => children,
  Redirect: () => null,
}));

const me: Me = {
  id: 2, handle: 'juno_braithwick', displayName: 'Juno Braithwick', email: 'juno@racers.example', emailVerified: true, pendingEmail: null,
  role: 'racer', bio: '', homeTrack: 'Hollow Pines Circuit', classesRaced: ['buggy-1-8-electric'], units: { length: 'mm', temperature: 'C' },
  hasPassword: true, githubLogin: null, createdAt: '2025-03-01T10:00:00.000Z',
};

const baseValues = { 'shock.rear.oil': 450, 'diff.centre.oil': 7000, 'susp.front.ride-height': 27 };

function setupDetail(overrides: Partial<SetupDetail> = {}): SetupDetail {
  return {
    id: 7, title: 'Hollow Pines — loose and dusty', visibility: 'public', shareToken: null,
    owner: { handle: 'juno_braithwick', displayName: 'Juno Braithwick' }, isOwner: true,
    car: { id: 3, nickname: 'Blue Stoat', kitName: 'Stoat 8E', makerName: 'Ottervale Kitworks', stock: false },
    vehicleClass: 'buggy-1-8-electric', templateVersion: 1,
    conditions: { trackType: 'loose-dusty', temperatureC: 24, grip: 'low' }, notesMarkdown: '', notesHtml: '',
    currentRevision: { id: 44, number: 4, values: baseValues, changeNote: 'Rear oil down.', createdAt: '2026-11-29T10:00:00.000Z' },
    revisions: [], photos: [], lineage: { forkedFrom: null, forkCount: 0, familyForkCount: 0 }, commentCount: 0, hidden: null, createdAt: '2026-11-01T10:00:00.000Z', updatedAt: '2026-11-29T10:00:00.000Z',
    ...overrides,
  };
}

const newer = {
  id: 55, number: 5, values: { ...baseValues, 'shock.rear.oil': 400, 'diff.centre.oil': 8000 },
  changeNote: 'Thicker centre diff for the long straight.', authorHandle: 'juno_braithwick', createdAt: '2026-11-30T18:00:00.000Z',
};

beforeEach(() => {
  mockDismissTo.mockReset();
  rememberCsrfToken('t');
});

function openShocks() {
  fireEvent.press(screen.getByRole('button', { name: /Shocks/, expanded: false }));
}

describe('the setup editor screen', () => {
  it('tells a racer who does not own the setup that only its owner can edit it', async () => {
    stubFetch(({ url }) => (url.endsWith('/api/me') ? { status: 200, body: { user: { ...me, handle: 'pell-strand' } } } : { status: 200, body: { setup: setupDetail({ isOwner: false }) } }));
    renderWithQueries(<EditSetupScreen />);
    expect(await screen.findByText('Only its owner can edit this setup')).toBeTruthy();
    expect(screen.getAllByRole('link', { name: 'Back to the setup' }).length).toBeGreaterThan(0);
  });

  it('offers a retry when the setup cannot be loaded', async () => {
    stubFetch(({ url }) => (url.endsWith('/api/me') ? { status: 200, body: { user: me } } : { status: 503, body: { error: { code: 'database_unavailable', message: 'The database is not answering.' } } }));
    renderWithQueries(<EditSetupScreen />);
    expect(await screen.findByText('The database is not answering.')).toBeTruthy();
    expect(screen.getByRole('button', { name: 'Try again' })).toBeTruthy();
  });

  it('will not save without a change note, and says why', async () => {
    const { calls } = stubFetch(({ url }) => (url.endsWith('/api/me') ? { status: 200, body: { user: me } } : { status: 200, body: { setup: setupDetail() } }));
    renderWithQueries(<EditSetupScreen />);
    await screen.findByText('Edit Hollow Pines — loose and dusty');
    openShocks();
    fireEvent.press(screen.getByRole('button', { name: 'Increase rear shock oil' }));
    expect(screen.getByText('1 field changed')).toBeTruthy();
    fireEvent.press(screen.getByRole('button', { name: 'Save revision 5' }));
    expect(await screen.findByText(/^Say what changed and why/)).toBeTruthy();
    expect(calls.filter((c) => c.method === 'POST')).toHaveLength(0);
  });

  it('keeps what was typed through a newer revision and saves on top of it with the racer’s choices', async () => {
    let saves = 0;
    const { calls } = stubFetch(({ url, method }) => {
      if (url.endsWith('/api/me')) return { status: 200, body: { user: me } };
      if (method === 'POST' && ++saves === 1) {
        return { status: 409, body: { error: { code: 'stale_revision', message: 'This setup changed since you opened it.', details: { currentRevision: newer } } } };
      }
      if (method === 'POST') {
        const saved = setupDetail({ currentRevision: { id: 66, number: 6, values: {}, changeNote: 'x', createdAt: '2026-12-01T10:00:00.000Z' } });
        return { status: 201, body: { setup: saved, warnings: { 'shock.rear.oil': 'Rear shock oil of 2000 cSt is unusual' } } };
      }
      return { status: 200, body: { setup: setupDetail() } };
    });
    const { client } = renderWithQueries(<EditSetupScreen />);
    await screen.findByText('Edit Hollow Pines — loose and dusty');
    openShocks();
    fireEvent.press(screen.getByRole('button', { name: 'Increase rear shock oil' }));
    fireEvent.changeText(screen.getByLabelText('Change note (required)'), 'Rear oil 450 → 475: landing flat off the double.');
    await act(async () => fireEvent.press(screen.getByRole('button', { name: 'Save revision 5' })));

    expect(await screen.findByText(/^Nothing you typed is lost/)).toBeTruthy();
    expect(screen.getByText('Yours: 475 cSt')).toBeTruthy();
    expect(screen.getByText('In revision 5: 400 cSt')).toBeTruthy();
    expect(screen.getByLabelText('Change note (required)').props.value).toBe('Rear oil 450 → 475: landing flat off the double.');

    fireEvent.press(screen.getByRole('button', { name: 'Use these choices' }));
    await act(async () => fireEvent.press(screen.getByRole('button', { name: 'Save revision 6' })));

    await waitFor(() => expect(mockDismissTo).toHaveBeenCalledWith('/setups/7'));
    const posts = calls.filter((c) => c.method === 'POST');
    expect(posts[0].body).toMatchObject({ baseRevisionId: 44, values: { 'shock.rear.oil': 475 } });
    expect(posts[1].body).toEqual({
      baseRevisionId: 55,
      values: { ...baseValues, 'shock.rear.oil': 475, 'diff.centre.oil': 8000 },
      changeNote: 'Rear oil 450 → 475: landing flat off the double.',
    });
    expect(client.getQueryData(editorKeys.savedNotice(7))).toEqual({ revisionNumber: 6, warnings: ['Rear shock oil of 2000 cSt is unusual'] });
  });

  it('shows the server’s refusal under the field it names', async () => {
    stubFetch(({ url, method }) => {
      if (url.endsWith('/api/me')) return { status: 200, body: { user: me } };
      if (method === 'POST') {
        return { status: 400, body: { error: { code: 'validation_failed', message: 'Some values on the sheet need fixing.', details: { 'shock.rear.oil': 'The server refuses this oil.' } } } };
      }
      return { status: 200, body: { setup: setupDetail() } };
    });
    renderWithQueries(<EditSetupScreen />);
    await screen.findByText('Edit Hollow Pines — loose and dusty');
    openShocks();
    fireEvent.press(screen.getByRole('button', { name: 'Increase rear shock oil' }));
    fireEvent.changeText(screen.getByLabelText('Change note (required)'), 'Thicker rear oil.');
    await act(async () => fireEvent.press(screen.getByRole('button', { name: 'Save revision 5' })));
    const alerts = await screen.findAllByRole('alert');
    expect(alerts.map((a) => within(a).queryByText('The server refuses this oil.')).filter(Boolean)).toHaveLength(1);
  });
});

describe('a draft left by the browser’s back button', () => {
  const stored = new Map<string, string>();
  const storage = {
    getItem: (key: string) => stored.get(key) ?? null,
    setItem: (key: string, value: string) => void stored.set(key, value),
    removeItem: (key: string) => void stored.delete(key),
  };
  beforeAll(() => {
    Object.defineProperty(window, 'sessionStorage', { value: storage, configurable: true });
  });
  afterAll(() => {
    Reflect.deleteProperty(window, 'sessionStorage');
  });

  it('comes back when the editor reopens, and can be discarded', async () => {
    stubFetch(({ url }) => (url.endsWith('/api/me') ? { status: 200, body: { user: me } } : { status: 200, body: { setup: setupDetail() } }));
    const first = renderWithQueries(<EditSetupScreen />);
    await screen.findByText('Edit Hollow Pines — loose and dusty');
    openShocks();
    fireEvent.press(screen.getByRole('button', { name: 'Increase rear shock oil' }));
    fireEvent.changeText(screen.getByLabelText('Change note (required)'), 'Half-typed reason');
    first.unmount();

    renderWithQueries(<EditSetupScreen />);
    await screen.findByText('Edit Hollow Pines — loose and dusty');
    expect(screen.getByText(/^You left this sheet without saving, so we kept 1 changed field and your change note/)).toBeTruthy();
    expect(screen.getByText('1 field changed')).toBeTruthy();
    expect(screen.getByLabelText('Change note (required)').props.value).toBe('Half-typed reason');

    fireEvent.press(screen.getByRole('button', { name: 'Discard my unsaved changes' }));
    expect(screen.getByText('No fields changed yet')).toBeTruthy();
    expect(stored.size).toBe(0);
  });
});
