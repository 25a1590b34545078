import { fireEvent, screen, waitFor } from '@testing-library/react-native';
import RunScreen from '../../app/runs/[id]';
import TrackDayScreen from '../../app/track-days/[id]';
import TrackDaysScreen from '../../app/track-days/index';
import NewTrackDayScreen from '../../app/track-days/new';
import { formatTrackDayDate, todayIsoDate } from '../../hooks/trackDays';
import type { Garage } from '../../shared/types/setups';
import { setupFixture, signedInJuno } from './support/historyFixtures';
import { renderWithQueries, stubFetch } from './support/render';
import { runFixture, trackDayFixture } from './support/trackDayFixtures';

const mockParams: { current: Record<string, string> } = { current: {} };
const mockReplace = jest.fn();
const mockPush = jest.fn();
jest.mock('expo-router', () => ({
  router: { replace: (href: string) => mockReplace(href), push: (href: string) => mockPush(href) },
  useLocalSearchParams: () => mockParams.current,
  Link: ({ children }: { children: unknown }) => children,
  Redirect: () => null,
}));

const TRACKS = [
  { id: 2, slug: 'saltmarsh-raceway', name: 'Saltmarsh Raceway', surface: 'hard-packed', indoor: false, notes: '' },
  { id: 1, slug: 'old-kiln-indoor', name: 'Old Kiln Indoor', surface: 'indoor-clay', indoor: true, notes: '' },
];

const GARAGE: Garage = {
  cars: [
    {
      id: 3, nickname: 'Blue Stoat', kitId: 2, kitName: 'Stoat 8E', makerName: 'Ottervale Kitworks', vehicleClass: 'buggy-1-8-electric',
      stock: false, photoUrl: null, createdAt: '2026-11-01T10:00:00.000Z',
      setups: [{ id: 7, title: 'Hollow Pines — loose and dusty', visibility: 'public', carId: 3, vehicleClass: 'buggy-1-8-electric', revisionCount: 5, updatedAt: '2026-11-30T18:00:00.000Z', conditions: { trackType: 'loose-dusty', temperatureC: 24, grip: 'low' } }],
    },
  ],
};

const NOT_FOUND = { status: 404, body: { error: { code: 'not_found', message: 'Not found.' } } };

type Answer = { status: number; body?: unknown };
/** Juno signed in, with her garage, the tracks, setup 7 and day 4; `extra` answers anything else. */
function serve(
  extra: (call: { url: string; method: string; body: unknown }) => Answer | undefined = () => undefined,
  units: { length: 'mm' | 'in'; temperature: 'C' | 'F' } = signedInJuno.units,
) {
  return stubFetch((call) => {
    const answer = extra(call);
    if (answer) return answer;
    const { url, method } = call;
    if (url.endsWith('/api/auth/csrf')) return { status: 200, body: { csrfToken: 'test-token' } };
    if (url.endsWith('/api/me')) return { status: 200, body: { user: { ...signedInJuno, units } } };
    if (url.endsWith('/api/tracks') && method === 'GET') return { status: 200, body: { tracks: TRACKS } };
    if (url.endsWith('/api/garage')) return { status: 200, body: GARAGE };
    if (url.endsWith('/api/setups/7')) return { status: 200, body: { setup: setupFixture({ isOwner: true }) } };
    return NOT_FOUND;
  });
}

beforeEach(() => {
  mockReplace.mockReset();
  mockPush.mockReset();
});

describe('logging a track day', () => {
  it('starts at today, converts the racer’s °F to °C and opens the new day', async () => {
    mockParams.current = { carId: '3' };
    const { calls } = serve(({ url, method }) => (url.endsWith('/api/track-days') && method === 'POST' ? { status: 201, body: { trackDay: trackDayFixture() } } : undefined), { length: 'in', temperature: 'F' });
    renderWithQueries(<NewTrackDayScreen />);
    fireEvent.press(await screen.findByRole('radio', { name: /Saltmarsh Raceway/ }));
    expect(screen.getByLabelText('Date').props.value).toBe(todayIsoDate());
    fireEvent.changeText(screen.getByLabelText('Track temperature (°F)'), '88');
    fireEvent.changeText(screen.getByLabelText('Humidity (%)'), '40');
    fireEvent.press(screen.getByRole('radio', { name: 'Damp' }));
    fireEvent.press(screen.getByRole('button', { name: 'Save the day' }));
    await waitFor(() => expect(mockReplace).toHaveBeenCalledWith('/track-days/4?carId=3'));
    const post = calls.find((c) => c.method === 'POST' && c.url.endsWith('/api/track-days'));
    expect(post?.body).toEqual({
      date: todayIsoDate(),
      trackId: 2,
      conditions: { airTempC: null, trackTempC: 31.1, humidityPct: 40, moisture: 'damp', grip: null },
      notes: '',
    });
  });

  it('asks for a track and a usable date and temperature before sending anything', async () => {
    mockParams.current = {};
    const { calls } = serve();
    renderWithQueries(<NewTrackDayScreen />);
    await screen.findByRole('radio', { name: /Saltmarsh Raceway/ });
    fireEvent.changeText(screen.getByLabelText('Date'), '2026-02-30');
    fireEvent.changeText(screen.getByLabelText('Air temperature (°C)'), '75');
    fireEvent.press(screen.getByRole('button', { name: 'Save the day' }));
    expect(screen.getByText('Type the date as YYYY-MM-DD, such as 2026-12-05.')).toBeTruthy();
    expect(screen.getByText('Pick a track.')).toBeTruthy();
    expect(screen.getByText('Between -30 °C and 60 °C.')).toBeTruthy();
    expect(calls.some((c) => c.method === 'POST')).toBe(false);
  });

  it('adds a missing track inline and picks it', async () => {
    mockParams.current = {};
    const created = { id: 9, slug: 'brackwater-dunes', name: 'Brackwater Dunes', surface: 'loose-dusty', indoor: false, notes: '' };
    let tracks: unknown[] = TRACKS;
    const { calls } = serve(({ url, method }) => {
      if (!url.endsWith('/api/tracks')) return undefined;
      if (method === 'GET') return { status: 200, body: { tracks } };
      tracks = [...TRACKS, created];
      return { status: 201, body: { track: created } };
    });
    renderWithQueries(<NewTrackDayScreen />);
    fireEvent.press(await screen.findByRole('button', { name: 'Add a track that is not in the list' }));
    fireEvent.press(screen.getByRole('button', { name: 'Add the track' }));
    expect(screen.getByText('Pick the surface the track has most of the year.')).toBeTruthy();
    fireEvent.changeText(screen.getByLabelText('Track name'), 'Brackwater Dunes');
    fireEvent.press(screen.getByRole('radio', { name: 'Loose and dusty' }));
    fireEvent.press(screen.getByRole('button', { name: 'Add the track' }));
    await waitFor(() => expect(screen.getByRole('radio', { name: /Brackwater Dunes/ })).toBeChecked());
    expect(calls.find((c) => c.method === 'POST')?.body).toEqual({ name: 'Brackwater Dunes', surface: 'loose-dusty', indoor: false, notes: '' });
  });
});

describe('the track days list', () => {
  it('asks the server for one car’s days and offers to log the first', async () => {
    mockParams.current = { carId: '3' };
    const { calls } = serve(({ url }) => (url.endsWith('/api/track-days?carId=3') ? { status: 200, body: { trackDays: [] } } : undefined));
    renderWithQueries(<TrackDaysScreen />);
    expect(await screen.findByText('No track days for Blue Stoat yet')).toBeTruthy();
    fireEvent.press(screen.getByRole('button', { name: 'Log a track day' }));
    expect(mockPush).toHaveBeenCalledWith('/track-days/new?carId=3');
    expect(calls.some((c) => c.url.endsWith('/api/track-days?carId=3'))).toBe(true);
  });

  it('lists days newest first with their track, runs and conditions', async () => {
    mockParams.current = {};
    const summary = (id: number, date: string) => ({ ...trackDayFixture({ id, date }), runs: undefined, runCount: 2, lapCount: 31, carIds: [3] });
    serve(({ url }) => (url.endsWith('/api/track-days') ? { status: 200, body: { trackDays: [summary(1, '2026-11-02'), summary(2, '2026-12-05')] } } : undefined));
    renderWithQueries(<TrackDaysScreen />);
    const rows = await screen.findAllByRole('link', { name: /Saltmarsh Raceway · Hard-packed outdoor · 2 runs · 31 laps$/ });
    expect(rows).toHaveLength(2);
    const dates = screen.getAllByText(/2026/);
    expect(dates.map((d) => d.props.children)).toEqual([formatTrackDayDate('2026-12-05'), formatTrackDayDate('2026-11-02')]);
    expect(screen.getAllByText('Track 15 °C · Air 12 °C · 70 % humidity · Damp · Medium grip')).toHaveLength(2);
  });
});

describe('adding a run on the day page', () => {
  it('picks the only car and setup, defaults to the current revision and saves the laps typed', async () => {
    mockParams.current = { id: '4' };
    const saved = runFixture({ id: 12, laps: [32.5, 62.345], feelNotes: 'Pushes mid-corner.', revision: { id: 55, number: 5 } });
    const { calls } = serve(({ url, method }) => {
      if (url.endsWith('/api/track-days/4') && method === 'GET') return { status: 200, body: { trackDay: trackDayFixture({ runs: [runFixture()] }) } };
      if (url.endsWith('/api/track-days/4/runs') && method === 'POST') return { status: 201, body: { run: saved } };
      return undefined;
    });
    renderWithQueries(<TrackDayScreen />);
    expect(await screen.findByText('Blue Stoat · Hollow Pines — loose and dusty · revision 4')).toBeTruthy();
    expect(await screen.findByRole('radio', { name: /Revision 5 \(current\)/ })).toBeChecked();
    for (const lap of ['32.5', '1:02.345']) {
      fireEvent.changeText(screen.getByLabelText('Lap time'), lap);
      fireEvent(screen.getByLabelText('Lap time'), 'submitEditing', { nativeEvent: { text: lap } });
    }
    fireEvent.changeText(screen.getByLabelText('How the car felt (optional)'), 'Pushes mid-corner.');
    fireEvent.press(screen.getByRole('button', { name: 'Save the run' }));
    expect(await screen.findByText('Run 2 saved with 2 laps.')).toBeTruthy();
    expect(calls.find((c) => c.method === 'POST')?.body).toEqual({
      carId: 3, setupId: 7, revisionId: 55, label: '', laps: [32.5, 62.345], includedSlowLaps: [], feelNotes: 'Pushes mid-corner.',
    });
    // The form is ready for the next run: same car and setup, no laps.
    expect(screen.getByText('No laps yet.')).toBeTruthy();
  });

  it('refuses a run without laps before sending it', async () => {
    mockParams.current = { id: '4' };
    const { calls } = serve(({ url }) => (url.endsWith('/api/track-days/4') ? { status: 200, body: { trackDay: trackDayFixture() } } : undefined));
    renderWithQueries(<TrackDayScreen />);
    await screen.findByRole('radio', { name: /Revision 5 \(current\)/ });
    fireEvent.press(screen.getByRole('button', { name: 'Save the run' }));
    expect(screen.getByText('Add at least one lap time, typed or from a lap file.')).toBeTruthy();
    expect(calls.some((c) => c.method === 'POST')).toBe(false);
  });
});

describe('a run’s statistics', () => {
  const laps = [32.61, 32.48, 32.7, 32.55, 32.66, 32.52, 32.58, 32.64, 58.2, 32.5];

  it('shows the figures from the counted laps and puts a set-aside lap back in', async () => {
    mockParams.current = { id: '1', day: '4' };
    let run = runFixture({ laps });
    const { calls } = serve(({ url, method, body }) => {
      if (url.endsWith('/api/track-days/4')) return { status: 200, body: { trackDay: trackDayFixture({ runs: [run] }) } };
      if (url.endsWith('/api/runs/1') && method === 'PATCH') {
        run = { ...run, ...(body as object) };
        return { status: 200, body: { run } };
      }
      return undefined;
    });
    renderWithQueries(<RunScreen />);
    expect(await screen.findByText('9 of 10')).toBeTruthy();
    expect(screen.getByText('32.480 (lap 2)')).toBeTruthy();
    expect(screen.getByText('Lap 9: 58.200 — set aside')).toBeTruthy();
    expect(screen.getByText(/^A lap is set aside as a crash or pit stop when it is slower than the median lap/)).toBeTruthy();
    fireEvent.press(screen.getByRole('button', { name: 'Put lap 9 back in' }));
    expect(await screen.findByText('Lap 9: 58.200 — counted: you put it back in')).toBeTruthy();
    expect(calls.find((c) => c.method === 'PATCH')?.body).toEqual({ includedSlowLaps: [8] });
    // Every lap counts now.
    expect(screen.queryByText('9 of 10')).toBeNull();
  });
});
