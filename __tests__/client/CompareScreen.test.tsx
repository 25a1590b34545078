import { fireEvent, screen } from '@testing-library/react-native';
import CompareScreen from '../../app/compare';
import { compareHref } from '../../hooks/history';
import { revisionFixture, setupFixture } from './support/historyFixtures';
import { renderWithQueries, stubFetch } from './support/render';

const mockParams: { current: Record<string, string> } = { current: {} };
const mockSetParams = jest.fn();
jest.mock('expo-router', () => ({
  router: { setParams: (params: unknown) => mockSetParams(params), replace: () => {} },
  useLocalSearchParams: () => mockParams.current,
  Link: ({ children }: { children: unknown }) => children,
}));

const VALUES: Record<number, Record<string, number>> = {
  3: { 'shock.rear.oil': 450, 'susp.front.ride-height': 27, 'shock.front.oil': 400 },
  5: { 'shock.rear.oil': 500, 'susp.front.ride-height': 27, 'shock.front.oil': 400 },
};

/** The server as these screens see it: setup 7 is readable, setup 9 is not (404). */
function serve() {
  return stubFetch(({ url }) => {
    if (url.endsWith('/api/me')) return { status: 200, body: { user: null } };
    const revision = /\/api\/setups\/7\/revisions\/(\d+)/.exec(url);
    if (revision) {
      const number = Number(revision[1]);
      return VALUES[number]
        ? { status: 200, body: revisionFixture(number, VALUES[number]) }
        : { status: 404, body: { error: { code: 'not_found', message: 'No such revision.' } } };
    }
    if (/\/api\/setups\/7(\?|$)/.test(url)) return { status: 200, body: { setup: setupFixture() } };
    return { status: 404, body: { error: { code: 'not_found', message: 'Setup not found.' } } };
  });
}

beforeEach(() => mockSetParams.mockReset());

describe('the compare screen', () => {
  it('builds a shareable address with revision numbers and share tokens', () => {
    expect(compareHref({ setupId: 7, revision: 3 }, { setupId: 9, share: 'a b' })).toBe('/compare?a=7&ar=3&b=9&bs=a%20b');
  });

  it('compares two revisions of one setup and lets the racer pick another revision', async () => {
    mockParams.current = { a: '7', ar: '3', b: '7', br: '5' };
    serve();
    renderWithQueries(<CompareScreen />);
    expect(await screen.findByText('1 setting changed')).toBeTruthy();
    expect(screen.getByText('Compare revisions')).toBeTruthy();
    expect(screen.getByText('450 cSt → 500 cSt')).toBeTruthy();
    expect(screen.getByText(/^Stoat 8E · revision 3 · /)).toBeTruthy();
    fireEvent.press((await screen.findAllByRole('radio', { name: 'Revision 4' }))[0]);
    expect(mockSetParams).toHaveBeenCalledWith({ ar: '4' });
  });

  it('compares with the current revision when the address names none', async () => {
    mockParams.current = { a: '7', ar: '3', b: '7' };
    const { calls } = serve();
    renderWithQueries(<CompareScreen />);
    expect(await screen.findByText('450 cSt → 500 cSt')).toBeTruthy();
    expect(calls.some((c) => c.url.endsWith('/api/setups/7/revisions/5'))).toBe(true);
  });

  it('says so when a side is not shared with the viewer or no longer exists', async () => {
    mockParams.current = { a: '7', ar: '3', b: '9', bs: 'old-token' };
    const { calls } = serve();
    renderWithQueries(<CompareScreen />);
    expect(await screen.findByText(/This setup is not shared with you or no longer exists/)).toBeTruthy();
    expect(calls.some((c) => c.url.endsWith('/api/setups/9?share=old-token'))).toBe(true);
  });

  it('names a revision that does not exist', async () => {
    mockParams.current = { a: '7', ar: '12', b: '7', br: '5' };
    serve();
    renderWithQueries(<CompareScreen />);
    expect(await screen.findByText(/This setup has no revision 12/)).toBeTruthy();
  });

  it('asks for two setups when the address names none', () => {
    mockParams.current = {};
    serve();
    renderWithQueries(<CompareScreen />);
    expect(screen.getByText('Pick two setups to compare')).toBeTruthy();
  });
});
