import { act, fireEvent, screen, waitFor, within } from '@testing-library/react-native';
import { TrackTypeVotes } from '../../components/TrackTypeVotes';
import { voteBarWidths } from '../../components/TrackTypeVotesBar';
import { voteCountsText } from '../../components/TrackTypeVotesRow';
import { rememberCsrfToken } from '../../hooks/api';
import { wilsonLowerBound } from '../../shared/compute/ranking';
import type { SetupVotes, TrackTypeVotes as Tally } from '../../shared/types/community';
import { TRACK_TYPES } from '../../shared/types/trackTypes';
import { signedInJuno } from './support/historyFixtures';
import { renderWithQueries, stubFetch } from './support/render';

jest.mock('expo-router', () => ({
  Link: ({ children, href }: { children: React.ReactElement; href: string }) => jest.requireActual('react').cloneElement(children, { href }),
}));

function votes(overrides: Partial<Record<string, Partial<Tally>>> = {}, extra: Partial<SetupVotes> = {}): SetupVotes {
  return {
    setupId: 7,
    canVote: true,
    cannotVoteReason: null,
    trackTypes: TRACK_TYPES.map(({ key }) => {
      const t = { works: 0, fails: 0, myVote: null, ...overrides[key] };
      return { trackType: key, works: t.works, fails: t.fails, wilson: wilsonLowerBound(t.works, t.fails), myVote: t.myVote };
    }),
    ...extra,
  };
}

function serve(initial: SetupVotes, opts: { signedIn?: boolean; write?: (method: string, url: string, body: unknown) => { status: number; body?: unknown } } = {}) {
  return stubFetch(({ url, method, body }) => {
    if (url.endsWith('/api/me')) return { status: 200, body: { user: opts.signedIn === false ? null : signedInJuno } };
    if (method === 'GET' && url.endsWith('/api/setups/7/votes')) return { status: 200, body: { votes: initial } };
    if (opts.write) return opts.write(method, url, body);
    return { status: 500 };
  });
}

beforeEach(() => rememberCsrfToken('t'));

describe('the votes chart', () => {
  // Bars share one scale, the largest total on the setup (common practice for bar charts, no source).
  it('draws each part of a bar in proportion to the largest total', () => {
    expect(voteBarWidths(6, 2, 8)).toEqual({ works: 75, fails: 25 });
    expect(voteBarWidths(1, 1, 8)).toEqual({ works: 12.5, fails: 12.5 });
    expect(voteBarWidths(0, 0, 0)).toEqual({ works: 0, fails: 0 });
  });

  it('writes the counts out beside each bar', () => {
    expect(voteCountsText(9, 2)).toBe("9 say it works · 2 say it doesn't");
    expect(voteCountsText(0, 0)).toBe('No votes yet');
  });
});

describe('TrackTypeVotes', () => {
  it('shows every track type with its counts, a bar for voted ones and my current vote', async () => {
    serve(votes({ 'loose-dusty': { works: 9, fails: 2, myVote: 'works' }, turf: { works: 0, fails: 3 } }));
    renderWithQueries(<TrackTypeVotes setupId={7} isOwner={false} />);
    const dusty = await screen.findByLabelText("Loose and dusty: 9 say it works · 2 say it doesn't");
    expect(within(dusty).getByRole('radio', { name: 'Works here: Loose and dusty', checked: true })).toBeTruthy();
    expect(within(dusty).getByRole('button', { name: 'Withdraw my vote on Loose and dusty' })).toBeTruthy();
    for (const { label } of TRACK_TYPES) expect(screen.getByText(label)).toBeTruthy();
    expect(screen.getByLabelText('Loamy: No votes yet')).toBeTruthy();
    const works = screen.getAllByTestId('bar-works', { includeHiddenElements: true });
    expect(works).toHaveLength(1);
    // Scale: the largest total on the setup, 11 (9 + 2).
    expect(Number(works[0].props.width)).toBeCloseTo((9 / 11) * 100, 6);
    expect(screen.getAllByTestId('bar-fails', { includeHiddenElements: true })).toHaveLength(2);
  });

  it('changes my vote with one press and shows the counts the server answers with', async () => {
    const after = votes({ 'loose-dusty': { works: 8, fails: 3, myVote: 'fails' } });
    const { calls } = serve(votes({ 'loose-dusty': { works: 9, fails: 2, myVote: 'works' } }), {
      write: () => ({ status: 200, body: { votes: after } }),
    });
    renderWithQueries(<TrackTypeVotes setupId={7} isOwner={false} />);
    const target = await screen.findByRole('radio', { name: "Doesn't work here: Loose and dusty" });
    await act(async () => fireEvent.press(target));
    await screen.findByLabelText("Loose and dusty: 8 say it works · 3 say it doesn't");
    const put = calls.find((c) => c.method === 'PUT');
    expect(put?.url).toMatch(/\/api\/setups\/7\/votes\/loose-dusty$/);
    expect(put?.body).toEqual({ works: false });
  });

  it('withdraws my vote', async () => {
    const { calls } = serve(votes({ turf: { works: 1, myVote: 'works' } }), { write: () => ({ status: 200, body: { votes: votes() } }) });
    renderWithQueries(<TrackTypeVotes setupId={7} isOwner={false} />);
    const target = await screen.findByRole('button', { name: 'Withdraw my vote on Turf' });
    await act(async () => fireEvent.press(target));
    await screen.findByLabelText('Turf: No votes yet');
    expect(calls.find((c) => c.method === 'DELETE')?.url).toMatch(/\/api\/setups\/7\/votes\/turf$/);
    expect(screen.queryByRole('button', { name: 'Withdraw my vote on Turf' })).toBeNull();
  });

  it('says why a vote was refused and keeps the counts as they were', async () => {
    serve(votes({ loamy: { works: 2 } }), {
      write: () => ({ status: 403, body: { error: { code: 'forbidden', message: 'Voting is closed while moderators review this setup.' } } }),
    });
    renderWithQueries(<TrackTypeVotes setupId={7} isOwner={false} />);
    const target = await screen.findByRole('radio', { name: 'Works here: Loamy' });
    await act(async () => fireEvent.press(target));
    expect(await screen.findByRole('alert')).toHaveTextContent('Voting is closed while moderators review this setup.');
    expect(screen.getByLabelText("Loamy: 2 say it works · 0 say it doesn't")).toBeTruthy();
  });

  it('shows the owner the counts without vote buttons', async () => {
    serve(votes({ 'hard-packed': { works: 4, fails: 1 } }, { canVote: false, cannotVoteReason: "You can't vote on your own setup: votes are other racers' word on where it works." }));
    renderWithQueries(<TrackTypeVotes setupId={7} isOwner />);
    expect(await screen.findByLabelText("Hard-packed outdoor: 4 say it works · 1 say it doesn't")).toBeTruthy();
    expect(screen.getByText('What other racers say about this setup on each track surface.')).toBeTruthy();
    expect(screen.queryAllByRole('radio')).toHaveLength(0);
  });

  it('asks a signed-out reader to sign in, and links back to the setup', async () => {
    serve(votes({}, { canVote: false, cannotVoteReason: 'Sign in to say where this setup works.' }), { signedIn: false });
    renderWithQueries(<TrackTypeVotes setupId={7} isOwner={false} />);
    expect(await screen.findByText('Sign in to say where this setup works.')).toBeTruthy();
    await waitFor(() => expect(screen.getByRole('link', { name: 'Sign in to vote' }).props.href).toBe('/sign-in?next=%2Fsetups%2F7'));
    expect(screen.queryAllByRole('radio')).toHaveLength(0);
  });

  it('offers a retry when the votes cannot load', async () => {
    let attempts = 0;
    stubFetch(({ url }) => {
      if (url.endsWith('/api/me')) return { status: 200, body: { user: null } };
      attempts += 1;
      return attempts === 1 ? { status: 503, body: { error: { code: 'database_unavailable', message: 'The database is not answering.' } } } : { status: 200, body: { votes: votes() } };
    });
    renderWithQueries(<TrackTypeVotes setupId={7} isOwner={false} />);
    expect(await screen.findByText('Votes could not load')).toBeTruthy();
    await act(async () => fireEvent.press(screen.getByRole('button', { name: 'Try again' })));
    expect(await screen.findByLabelText('Turf: No votes yet')).toBeTruthy();
  });
});
