import { act, fireEvent, screen, waitFor } from '@testing-library/react-native';
import type { ReactElement } from 'react';
import ForkScreen from '../../app/setups/[id]/fork';
import { rememberCsrfToken } from '../../hooks/api';
import type { Me } from '../../shared/types/auth';
import type { ForkPreview } from '../../shared/types/forks';
import type { Garage, SetupDetail } from '../../shared/types/setups';
import { renderWithQueries, stubFetch } from './support/render';

const mockReplace = jest.fn();
const mockParams: { id: string; share?: string } = { id: '7' };
jest.mock('expo-router', () => ({
  router: { replace: (href: string) => mockReplace(href) },
  useLocalSearchParams: () => mockParams,
  // The link's address travels on its child, so a test can read where it goes.
  Link: ({ children, href }: { children: ReactElement; href: string }) => jest.requireActual('react').cloneElement(children, { href }),
  Redirect: () => null,
}));

const rafi: Me = {
  id: 5, handle: 'rafi_new', displayName: 'Rafi', email: 'rafi@racers.example', emailVerified: true, pendingEmail: null,
  role: 'racer', bio: '', homeTrack: '', classesRaced: ['buggy-1-8-electric'], units: { length: 'mm', temperature: 'C' },
  hasPassword: true, githubLogin: null, createdAt: '2026-10-01T10:00:00.000Z',
};

function setupDetail(overrides: Partial<SetupDetail> = {}): SetupDetail {
  return {
    id: 7, title: 'Hollow Pines — loose and dusty', visibility: 'public', shareToken: null,
    owner: { handle: 'juno_braithwick', displayName: 'Juno Braithwick' }, isOwner: false,
    car: { id: 3, nickname: 'Blue Stoat', kitName: 'Stoat 8E', makerName: 'Ottervale Kitworks', stock: false },
    vehicleClass: 'buggy-1-8-electric', templateVersion: 1,
    conditions: { trackType: 'loose-dusty', temperatureC: 24, grip: 'low' }, notesMarkdown: '', notesHtml: '',
    currentRevision: { id: 44, number: 4, values: { 'chassis.centre-brace': 'stiff' }, changeNote: 'Stiffer brace.', createdAt: '2026-11-29T10:00:00.000Z' },
    revisions: [], photos: [], lineage: { forkedFrom: null, forkCount: 2, familyForkCount: 2 }, commentCount: 0, hidden: null,
    createdAt: '2026-11-01T10:00:00.000Z', updatedAt: '2026-11-29T10:00:00.000Z',
    ...overrides,
  };
}

const car = (id: number, nickname: string, kitName: string, vehicleClass: 'buggy-1-8-electric' | 'buggy-1-10-2wd', stock: boolean) => ({
  id, nickname, kitId: id, kitName, makerName: 'Ottervale Kitworks', vehicleClass, stock, photoUrl: null, createdAt: '2026-10-02T10:00:00.000Z', setups: [],
});

const preview: ForkPreview = {
  source: { setupId: 7, revisionId: 44, revisionNumber: 4, title: 'Hollow Pines — loose and dusty', ownerHandle: 'juno_braithwick', vehicleClass: 'buggy-1-8-electric', kitName: 'Stoat 8E' },
  target: { carId: 12, nickname: 'First Stoat', kitName: 'Stoat 8E', vehicleClass: 'buggy-1-8-electric', stock: true },
  checkedOptionParts: true,
  optionParts: [
    { key: 'chassis.centre-brace', label: 'Centre chassis brace', section: 'Chassis', value: 'stiff', stockValue: 'standard' },
    { key: 'susp.front.arm-stiffness', label: 'Front arm stiffness', section: 'Suspension', value: 'hard', stockValue: 'medium' },
  ],
  dropped: [],
  filledFromStock: [],
};

type Answer = { status: number; body?: unknown };

function serve(garage: Garage, extra: (url: string, method: string) => Answer | undefined = () => undefined) {
  return stubFetch(({ url, method }) => {
    const special = extra(url, method);
    if (special) return special;
    if (url.endsWith('/api/me')) return { status: 200, body: { user: rafi } };
    if (url.endsWith('/api/garage')) return { status: 200, body: garage };
    if (url.includes('/fork-preview')) return { status: 200, body: preview };
    if (url.endsWith('/api/setups/7/forks')) return { status: 201, body: { setup: setupDetail({ id: 31, isOwner: true, visibility: 'private' }) } };
    return { status: 200, body: { setup: setupDetail() } };
  });
}

beforeEach(() => {
  mockReplace.mockReset();
  delete mockParams.share;
  rememberCsrfToken('t');
});

describe('starting from someone else’s setup', () => {
  it('offers only cars of the same scale and sends the car, title and option-part choices', async () => {
    const garage = { cars: [car(9, 'Little Wren', 'Wren 10', 'buggy-1-10-2wd', true), car(12, 'First Stoat', 'Stoat 8E', 'buggy-1-8-electric', true)] };
    const { calls } = serve(garage);
    renderWithQueries(<ForkScreen />);
    await screen.findByText('What your copy will hold');
    expect(screen.getByRole('radio', { name: /First Stoat/ })).toBeChecked();
    expect(screen.queryByRole('radio', { name: /Little Wren/ })).toBeNull();
    expect(calls.find((c) => c.url.includes('/fork-preview'))?.url).toBe('/api/setups/7/fork-preview?carId=12');

    fireEvent.changeText(screen.getByLabelText('Title for your copy'), 'Hollow Pines, my first try');
    fireEvent.press(screen.getByRole('radio', { name: /^Centre chassis brace: keep the original/ }));
    await act(async () => fireEvent.press(screen.getByRole('button', { name: 'Start from this setup' })));

    await waitFor(() => expect(mockReplace).toHaveBeenCalledWith('/setups/31'));
    expect(calls.find((c) => c.method === 'POST')?.body).toEqual({
      carId: 12,
      title: 'Hollow Pines, my first try',
      stockChoices: { 'chassis.centre-brace': 'keep', 'susp.front.arm-stiffness': 'stock' },
    });
  });

  it('keeps the racer on the page with the title message when the title is emptied', async () => {
    const { calls } = serve({ cars: [car(12, 'First Stoat', 'Stoat 8E', 'buggy-1-8-electric', true)] });
    renderWithQueries(<ForkScreen />);
    await screen.findByText('What your copy will hold');
    fireEvent.changeText(screen.getByLabelText('Title for your copy'), '   ');
    fireEvent.press(screen.getByRole('button', { name: 'Start from this setup' }));
    expect(await screen.findByText('Give the fork a title.')).toBeTruthy();
    expect(calls.filter((c) => c.method === 'POST')).toHaveLength(0);
  });

  it('shows the server’s refusal of the car beside the car picker', async () => {
    serve({ cars: [car(12, 'First Stoat', 'Stoat 8E', 'buggy-1-8-electric', true)] }, (url) =>
      url.includes('/fork-preview')
        ? { status: 400, body: { error: { code: 'validation_failed', message: 'Check the highlighted fields.', details: { carId: 'Pick a car of the same scale as the setup.' } } } }
        : undefined,
    );
    renderWithQueries(<ForkScreen />);
    expect(await screen.findByText('Pick a car of the same scale as the setup.')).toBeTruthy();
    expect(screen.queryByRole('button', { name: 'Start from this setup' })).toBeNull();
  });

  it('adds a car on the spot when none fits, starting on the setup’s kit marked stock', async () => {
    let garage: Garage = { cars: [car(9, 'Little Wren', 'Wren 10', 'buggy-1-10-2wd', true)] };
    const kits = [
      { id: 1, slug: 'ottervale-stoat-8n', name: 'Stoat 8N', makerName: 'Ottervale Kitworks', vehicleClass: 'buggy-1-8-nitro', releasedYear: 2024 },
      { id: 2, slug: 'ottervale-stoat-8e', name: 'Stoat 8E', makerName: 'Ottervale Kitworks', vehicleClass: 'buggy-1-8-electric', releasedYear: 2025 },
      { id: 3, slug: 'cinderfell-wren-10', name: 'Wren 10', makerName: 'Cinderfell Racing Models', vehicleClass: 'buggy-1-10-2wd', releasedYear: 2023 },
    ];
    const { calls } = serve(garage, (url, method) => {
      if (url.endsWith('/api/kits')) return { status: 200, body: { kits } };
      if (url.endsWith('/api/cars') && method === 'POST') {
        const added = car(12, 'My Stoat 8E', 'Stoat 8E', 'buggy-1-8-electric', true);
        garage = { cars: [...garage.cars, added] };
        return { status: 201, body: { car: { ...added, setups: undefined } } };
      }
      if (url.endsWith('/api/garage')) return { status: 200, body: garage };
      return undefined;
    });
    renderWithQueries(<ForkScreen />);
    expect(await screen.findByText('Add the car you race')).toBeTruthy();
    expect(screen.getByText(/^None of your cars can take this setup: it is for a 1\/8 electric buggy \(Ottervale Kitworks Stoat 8E\)/)).toBeTruthy();
    expect(screen.getByRole('radio', { name: /Ottervale Kitworks Stoat 8E/ })).toBeChecked();
    expect(screen.getByRole('radio', { name: /Ottervale Kitworks Stoat 8N/ })).not.toBeChecked();
    expect(screen.queryByRole('radio', { name: /Wren 10/ })).toBeNull();
    expect(screen.getByRole('checkbox', { name: /Stock: no option parts fitted/ })).toBeChecked();
    await act(async () => fireEvent.press(screen.getByRole('button', { name: 'Add the car' })));

    expect(await screen.findByText('What your copy will hold')).toBeTruthy();
    expect(calls.find((c) => c.url.endsWith('/api/cars'))?.body).toEqual({ kitId: 2, nickname: 'My Stoat 8E', stock: true });
    expect(screen.getByRole('radio', { name: /My Stoat 8E/ })).toBeChecked();
  });

  it('asks a signed-out visitor to sign in and brings them back with the share code', async () => {
    mockParams.share = 'abc123';
    stubFetch(({ url }) => (url.endsWith('/api/me') ? { status: 200, body: { user: null } } : { status: 200, body: { setup: setupDetail() } }));
    renderWithQueries(<ForkScreen />);
    const signIn = await screen.findByRole('link', { name: 'Sign in' });
    expect(signIn.props.href).toBe(`/sign-in?next=${encodeURIComponent('/setups/7/fork?share=abc123')}`);
    expect(screen.getByRole('link', { name: 'Back to the setup' }).props.href).toBe('/setups/7?share=abc123');
  });
});
