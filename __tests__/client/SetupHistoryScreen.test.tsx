import { act, fireEvent, screen, within } from '@testing-library/react-native';
import SetupHistoryScreen from '../../app/setups/[id]/history';
import { SetupComments } from '../../components/SetupComments';
import { rememberCsrfToken } from '../../hooks/api';
import { commentFixture, historyFixture, setupFixture, signedInJuno } from './support/historyFixtures';
import { renderWithQueries, stubFetch } from './support/render';

const mockParams: { current: Record<string, string> } = { current: {} };
jest.mock('expo-router', () => ({
  router: { replace: () => {} },
  useLocalSearchParams: () => mockParams.current,
  Link: ({ children }: { children: unknown }) => children,
}));

const onRevision5 = commentFixture({
  id: 21,
  revisionId: 55,
  revisionNumber: 5,
  fieldKey: 'shock.rear.oil',
  fieldLabel: 'Rear shock oil',
  bodyHtml: '<p>Why 500 at the rear?</p>',
  replies: [commentFixture({ id: 22, parentId: 21, revisionId: 55, author: { handle: 'juno_braithwick', displayName: 'Juno Braithwick' }, bodyHtml: '<p>Landing flat off the double.</p>' })],
});
const onSetup = commentFixture({ id: 31 });

type Answer = { status: number; body?: unknown };

function serve(overrides: (url: string, method: string) => Answer | undefined = () => undefined) {
  return stubFetch(({ url, method }) => {
    const custom = overrides(url, method);
    if (custom) return custom;
    if (url.endsWith('/api/me')) return { status: 200, body: { user: signedInJuno } };
    if (url.includes('/api/setups/7/history')) return { status: 200, body: historyFixture };
    if (url.includes('/api/setups/7/comments') && method === 'GET') return { status: 200, body: { comments: [onSetup, onRevision5] } };
    if (url.includes('/api/setups/7/comments')) return { status: 201, body: { comment: commentFixture({ id: 40 }) } };
    if (/\/api\/setups\/7(\?|$)/.test(url)) return { status: 200, body: { setup: setupFixture() } };
    return { status: 404, body: { error: { code: 'not_found', message: 'Setup not found.' } } };
  });
}

beforeEach(() => rememberCsrfToken('t'));

describe('the history screen', () => {
  it('shows each revision newest first with its changes, compare links and the comments on it', async () => {
    mockParams.current = { id: '7', share: 'tok' };
    const { calls } = serve();
    renderWithQueries(<SetupHistoryScreen />);
    // Revisions and comments arrive separately; wait for both.
    await screen.findByText('Why 500 at the rear?');
    const newest = screen.getByLabelText('Revision 5');
    expect(within(newest).getByText('Rear oil up for the ruts.')).toBeTruthy();
    expect(within(newest).getByText('450 cSt → 500 cSt')).toBeTruthy();
    expect(within(newest).getByRole('link', { name: 'Compare with revision 4' })).toBeTruthy();
    expect(within(newest).getByText('Why 500 at the rear?')).toBeTruthy();
    expect(within(newest).getByText(/on Rear shock oil/)).toBeTruthy();
    expect(within(newest).getByText('Landing flat off the double.')).toBeTruthy();
    // The setup-level comment belongs to the setup page, not to a change.
    expect(screen.queryByText('Ran this at Saltmarsh Raceway: spot on.')).toBeNull();
    const older = screen.getByLabelText('Revision 4');
    expect(within(older).getByText('27.0 mm → 26.0 mm')).toBeTruthy();
    expect(within(older).getByRole('link', { name: 'Compare with the current revision (5)' })).toBeTruthy();
    expect(calls.some((c) => c.url.endsWith('/api/setups/7/history?share=tok'))).toBe(true);
  });

  it('comments on one field of a change, carrying the share token', async () => {
    mockParams.current = { id: '7', share: 'tok' };
    const { calls } = serve();
    renderWithQueries(<SetupHistoryScreen />);
    // The per-field action appears once the sign-in is known.
    fireEvent.press(await screen.findByRole('button', { name: 'Comment on Front ride height' }));
    const older = screen.getByLabelText('Revision 4');
    expect(within(older).getByText('On Front ride height')).toBeTruthy();
    fireEvent.changeText(within(older).getByLabelText('Comment on revision 4'), 'Did it still clear the kerbs?');
    await act(async () => fireEvent.press(within(older).getByRole('button', { name: 'Post comment' })));
    const post = calls.find((c) => c.method === 'POST');
    expect(post?.url).toMatch(/\/api\/setups\/7\/comments$/);
    expect(post?.body).toEqual({ bodyMarkdown: 'Did it still clear the kerbs?', revisionId: 45, fieldKey: 'susp.front.ride-height', parentId: null, share: 'tok' });
  });

  it('says the setup is not shared or gone when the server answers 404', async () => {
    mockParams.current = { id: '9' };
    serve();
    renderWithQueries(<SetupHistoryScreen />);
    expect(await screen.findByText(/This setup is not shared with you or no longer exists/)).toBeTruthy();
  });
});

describe('SetupComments', () => {
  it('shows only the setup-level comments with their count, and points to the ones on changes', async () => {
    serve();
    renderWithQueries(<SetupComments setupId={7} />);
    expect(await screen.findByText('Comments (1)')).toBeTruthy();
    expect(screen.getByText('Ran this at Saltmarsh Raceway: spot on.')).toBeTruthy();
    expect(screen.queryByText('Why 500 at the rear?')).toBeNull();
    expect(screen.getByText('2 more comments are on single changes.')).toBeTruthy();
  });

  it('posts a comment on the setup and loads the list and the setup again', async () => {
    const { calls } = serve();
    renderWithQueries(<SetupComments setupId={7} share="tok" />);
    fireEvent.changeText(await screen.findByLabelText('Comment on this setup'), 'What tires for the wet?');
    const readsBefore = calls.filter((c) => c.method === 'GET' && c.url.includes('/comments')).length;
    await act(async () => fireEvent.press(screen.getByRole('button', { name: 'Post comment' })));
    expect(calls.find((c) => c.method === 'POST')?.body).toEqual({ bodyMarkdown: 'What tires for the wet?', revisionId: null, fieldKey: null, parentId: null, share: 'tok' });
    expect(calls.filter((c) => c.method === 'GET' && c.url.includes('/comments')).length).toBeGreaterThan(readsBefore);
    expect(screen.getByLabelText('Comment on this setup')).toHaveDisplayValue('');
  });

  it('offers a sign-in link to readers who are not signed in', async () => {
    serve((url) => (url.endsWith('/api/me') ? { status: 200, body: { user: null } } : undefined));
    renderWithQueries(<SetupComments setupId={7} />);
    expect(await screen.findByRole('link', { name: 'Sign in to comment' })).toBeTruthy();
  });

  it('offers a retry when the comments cannot load', async () => {
    serve((url) => (url.includes('/comments') ? { status: 503, body: { error: { code: 'database_unavailable', message: 'The database is not answering.' } } } : undefined));
    renderWithQueries(<SetupComments setupId={7} />);
    expect(await screen.findByText('The database is not answering.')).toBeTruthy();
    expect(screen.getByRole('button', { name: 'Try again' })).toBeTruthy();
  });
});
