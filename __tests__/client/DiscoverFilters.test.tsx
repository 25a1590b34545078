import { act, fireEvent, screen, waitFor, within } from '@testing-library/react-native';
import DiscoverScreen from '../../app/(tabs)/index';
import { DiscoverFilters, EMPTY_DISCOVER_DRAFT, activeFilterCount, filtersFromDraft, type DiscoverDraft } from '../../components/DiscoverFilters';
import { DiscoverSortPicker } from '../../components/DiscoverSortPicker';
import { discoverConditions, discoverVotes } from '../../components/DiscoverSetupCard';
import { discoverQueryString, NO_FILTERS } from '../../hooks/discover';
import type { KitSummary } from '../../shared/types/catalog';
import type { DiscoverPage, DiscoverSetup } from '../../shared/types/community';
import { renderThemed, renderWithQueries, stubFetch } from './support/render';

jest.mock('expo-router', () => ({
  Link: ({ children, href }: { children: React.ReactElement; href: string }) => jest.requireActual('react').cloneElement(children, { href }),
}));

const CELSIUS = { length: 'mm', temperature: 'C' } as const;
const FAHRENHEIT = { length: 'in', temperature: 'F' } as const;

const KITS: KitSummary[] = [
  { id: 1, slug: 'ottervale-stoat-8n', name: 'Stoat 8N', makerName: 'Ottervale Kitworks', vehicleClass: 'buggy-1-8-nitro', releasedYear: 2025 },
  { id: 2, slug: 'ottervale-stoat-8e', name: 'Stoat 8E', makerName: 'Ottervale Kitworks', vehicleClass: 'buggy-1-8-electric', releasedYear: 2026 },
  { id: 4, slug: 'marrowby-wren-10', name: 'Wren 10', makerName: 'Marrowby Works', vehicleClass: 'buggy-1-10-4wd', releasedYear: 2026 },
];

function setup(id: number, overrides: Partial<DiscoverSetup> = {}): DiscoverSetup {
  return {
    id, title: `Hollow Pines ${id}`, ownerHandle: 'juno_braithwick', kitId: 2, kitName: 'Stoat 8E', makerName: 'Ottervale Kitworks',
    vehicleClass: 'buggy-1-8-electric', trackType: 'loose-dusty', temperatureC: 24, forkCount: 2, revisionCount: 3,
    createdAt: '2026-11-30T10:00:00.000Z', updatedAt: '2026-11-30T10:00:00.000Z', votes: null, ...overrides,
  };
}

const draft = (overrides: Partial<DiscoverDraft>): DiscoverDraft => ({ ...EMPTY_DISCOVER_DRAFT, ...overrides });

describe('filters from the controls', () => {
  it('sends nothing for "any", and the kit as its id', () => {
    expect(filtersFromDraft(EMPTY_DISCOVER_DRAFT, CELSIUS).filters).toEqual(NO_FILTERS);
    expect(filtersFromDraft(draft({ vehicleClass: 'buggy-1-8-electric', kitId: '2', trackType: 'loose-dusty' }), CELSIUS).filters).toMatchObject({
      vehicleClass: 'buggy-1-8-electric', kitId: 2, trackType: 'loose-dusty',
    });
  });

  // °F → °C by (F − 32) × 5/9, rounded to 0.1 °C as setups store it (NIST SP 811 appendix B.8).
  it('converts a range typed in °F to °C', () => {
    expect(filtersFromDraft(draft({ tempMin: '68', tempMax: '86 °F' }), FAHRENHEIT).filters).toMatchObject({ tempMinC: 20, tempMaxC: 30 });
    expect(filtersFromDraft(draft({ tempMin: '15,5' }), CELSIUS).filters.tempMinC).toBe(15.5);
  });

  it('names the field that cannot be used and leaves it out, keeping the rest', () => {
    const { filters, errors } = filtersFromDraft(draft({ tempMin: 'warm', tempMax: '25', trackType: 'turf' }), CELSIUS);
    expect(errors).toEqual({ tempMin: 'Type a number, such as 20.', tempMax: undefined });
    expect(filters).toMatchObject({ tempMinC: null, tempMaxC: 25, trackType: 'turf' });
    expect(filtersFromDraft(draft({ tempMax: '200' }), FAHRENHEIT).errors.tempMax).toBe('Track temperatures go from -22 °F to 140 °F.');
    const crossed = filtersFromDraft(draft({ tempMin: '30', tempMax: '10' }), CELSIUS);
    expect(crossed.errors.tempMax).toBe('The highest temperature must be at or above the lowest.');
    expect(crossed.filters).toMatchObject({ tempMinC: 30, tempMaxC: null });
  });

  it('asks for "best for" only with that order', () => {
    expect(filtersFromDraft(draft({ bestFor: 'loamy' }), CELSIUS).filters.bestFor).toBeNull();
    expect(filtersFromDraft(draft({ sort: 'best-for', bestFor: 'loamy' }), CELSIUS).filters).toMatchObject({ sort: 'best-for', bestFor: 'loamy' });
  });

  it('counts the filters that are on, a temperature range as one', () => {
    expect(activeFilterCount(EMPTY_DISCOVER_DRAFT)).toBe(0);
    expect(activeFilterCount(draft({ kitId: '2', tempMin: '10', tempMax: '20', sort: 'most-forked' }))).toBe(2);
  });

  it('builds the query string the API reads', () => {
    expect(discoverQueryString(NO_FILTERS)).toBe('');
    expect(discoverQueryString({ ...NO_FILTERS, kitId: 2, tempMinC: -5, sort: 'best-for', bestFor: 'wet-muddy' }, 'abc')).toBe(
      '?kit=2&tempMin=-5&sort=best-for&bestFor=wet-muddy&cursor=abc',
    );
  });
});

describe('the filter controls', () => {
  it('offers only the kits of the chosen class, and reports each choice', () => {
    const onChange = jest.fn();
    renderThemed(<DiscoverFilters draft={draft({ vehicleClass: 'buggy-1-8-electric' })} onChange={onChange} kits={KITS} units={FAHRENHEIT} errors={{}} />);
    const kitGroup = screen.getByLabelText('Kit');
    expect(within(kitGroup).getAllByRole('radio').map((r) => r.props.accessibilityLabel)).toEqual(['Any kit', 'Ottervale Kitworks Stoat 8E']);
    fireEvent.press(within(kitGroup).getByRole('radio', { name: 'Ottervale Kitworks Stoat 8E' }));
    expect(onChange).toHaveBeenCalledWith('kitId', '2');
    fireEvent.press(screen.getByRole('radio', { name: 'Wet and muddy' }));
    expect(onChange).toHaveBeenCalledWith('trackType', 'wet-muddy');
    fireEvent.changeText(screen.getByLabelText('Track temperature from (°F)'), '60');
    expect(onChange).toHaveBeenCalledWith('tempMin', '60');
    expect(screen.getByLabelText('Track temperature up to (°F)')).toBeTruthy();
  });

  it('shows the surface to rank for and why the list is in this order', () => {
    const onBestFor = jest.fn();
    renderThemed(<DiscoverSortPicker sort="best-for" bestFor="loamy" onSort={jest.fn()} onBestFor={onBestFor} explanation="Best for Loamy first. Few votes leave a wide margin." />);
    expect(screen.getByRole('radio', { name: 'Best for a track surface', checked: true })).toBeTruthy();
    fireEvent.press(screen.getByRole('radio', { name: 'Best for Turf' }));
    expect(onBestFor).toHaveBeenCalledWith('turf');
    expect(screen.getByText('Why this order')).toBeTruthy();
    expect(screen.getByText('Best for Loamy first. Few votes leave a wide margin.')).toBeTruthy();
  });

  it('describes a result in the racer\'s units, with the votes behind a best-for place', () => {
    expect(discoverConditions(setup(1), FAHRENHEIT)).toBe('Loose and dusty · 75 °F · 2 forks');
    expect(discoverVotes({ trackType: 'loamy', works: 9, fails: 2, wilson: 0.5283 })).toBe('9 of 11 racers say it works on Loamy · score 0.53');
    expect(discoverVotes({ trackType: 'loamy', works: 0, fails: 0, wilson: 0 })).toBe('No votes for Loamy yet');
  });
});

function page(setups: DiscoverSetup[], nextCursor: string | null = null, explanation = 'Newest first: the setups racers started most recently.'): DiscoverPage {
  return { setups, nextCursor, explanation };
}

function serveDiscover(answer: (url: string) => { status: number; body?: unknown }) {
  return stubFetch(({ url }) => {
    if (url.endsWith('/api/me')) return { status: 200, body: { user: null } };
    if (url.endsWith('/api/health')) return { status: 200, body: { status: 'ok', database: 'ok' } };
    if (url.endsWith('/api/kits')) return { status: 200, body: { kits: KITS } };
    if (url.endsWith('/api/tracks')) return { status: 200, body: { tracks: [] } };
    return answer(url);
  });
}

describe('the Discover screen', () => {
  it('lists setups with why they are in this order, and asks again when a filter or the order changes', async () => {
    const { calls } = serveDiscover((url) =>
      url.includes('sort=best-for')
        ? { status: 200, body: page([setup(3, { votes: { trackType: 'wet-muddy', works: 5, fails: 0, wilson: 0.5655 } })], null, 'Best for Wet and muddy first.') }
        : { status: 200, body: page([setup(1), setup(2)]) },
    );
    renderWithQueries(<DiscoverScreen />);
    expect(await screen.findByText('Hollow Pines 1')).toBeTruthy();
    expect(screen.getByText('Newest first: the setups racers started most recently.')).toBeTruthy();

    await act(async () => fireEvent.press(screen.getByRole('button', { name: 'Filters' })));
    await act(async () => fireEvent.press(screen.getByRole('radio', { name: 'Wet and muddy' })));
    await waitFor(() => expect(calls.some((c) => c.url.endsWith('/api/discover?trackType=wet-muddy'))).toBe(true));
    expect(screen.getByRole('button', { name: 'Filters (1 on)' })).toBeTruthy();

    await act(async () => fireEvent.press(screen.getByRole('radio', { name: 'Best for a track surface' })));
    // Best for starts from the surface already filtered on.
    expect(await screen.findByText('5 of 5 racers say it works on Wet and muddy · score 0.57')).toBeTruthy();
    expect(screen.getByText('Best for Wet and muddy first.')).toBeTruthy();
    expect(screen.getByRole('radio', { name: 'Best for Wet and muddy', checked: true })).toBeTruthy();
    expect(calls.at(-1)?.url).toMatch(/\/api\/discover\?trackType=wet-muddy&sort=best-for&bestFor=wet-muddy$/);
    await act(async () => fireEvent.press(screen.getByRole('radio', { name: 'Best for Loamy' })));
    await waitFor(() => expect(calls.at(-1)?.url).toMatch(/sort=best-for&bestFor=loamy$/));
  });

  it('loads the next page from the cursor', async () => {
    const { calls } = serveDiscover((url) => (url.includes('cursor=next1') ? { status: 200, body: page([setup(3)]) } : { status: 200, body: page([setup(1)], 'next1') }));
    renderWithQueries(<DiscoverScreen />);
    const target = await screen.findByRole('button', { name: 'Show more setups' });
    await act(async () => fireEvent.press(target));
    expect(await screen.findByText('Hollow Pines 3')).toBeTruthy();
    expect(calls.some((c) => c.url.endsWith('/api/discover?cursor=next1'))).toBe(true);
    expect(screen.getByText('That is every setup that matches.')).toBeTruthy();
  });

  it('says when nothing matches the filters, and clears them', async () => {
    serveDiscover((url) => ({ status: 200, body: page(url.includes('trackType') ? [] : [setup(1)]) }));
    renderWithQueries(<DiscoverScreen />);
    const target = await screen.findByRole('button', { name: 'Filters' });
    await act(async () => fireEvent.press(target));
    await act(async () => fireEvent.press(screen.getByRole('radio', { name: 'Turf' })));
    expect(await screen.findByText('No setups match these filters')).toBeTruthy();
    await act(async () => fireEvent.press(screen.getByRole('button', { name: 'Clear filters' })));
    expect(await screen.findByText('Hollow Pines 1')).toBeTruthy();
  });

  it('shows the server\'s message with a retry when the list cannot load', async () => {
    let failed = false;
    serveDiscover(() => {
      if (!failed) {
        failed = true;
        return { status: 400, body: { error: { code: 'validation_failed', message: 'That page link does not fit this list; start again from the top.' } } };
      }
      return { status: 200, body: page([setup(1)]) };
    });
    renderWithQueries(<DiscoverScreen />);
    expect(await screen.findByText('That page link does not fit this list; start again from the top.')).toBeTruthy();
    await act(async () => fireEvent.press(screen.getByRole('button', { name: 'Try again' })));
    expect(await screen.findByText('Hollow Pines 1')).toBeTruthy();
  });

  it('searches after a pause in typing, offers kits with a name like the words, and empties into a clear state', async () => {
    const { calls } = serveDiscover((url) => {
      if (url.includes('/api/search')) {
        return url.includes('nothing')
          ? { status: 200, body: { setups: [], nextCursor: null, kitSuggestions: [] } }
          : { status: 200, body: { setups: [setup(9, { title: 'Stoat on loam' })], nextCursor: null, kitSuggestions: [{ id: 2, name: 'Stoat 8E', makerName: 'Ottervale Kitworks', vehicleClass: 'buggy-1-8-electric' }] } };
      }
      return { status: 200, body: page(url.includes('kit=2') ? [setup(2, { title: 'Kit filtered' })] : [setup(1)]) };
    });
    renderWithQueries(<DiscoverScreen />);
    await screen.findByText('Hollow Pines 1');
    fireEvent.changeText(screen.getByLabelText('Search setups'), 'stot 8e');
    expect(await screen.findByText('Stoat on loam')).toBeTruthy();
    expect(calls.some((c) => c.url.endsWith('/api/search?q=stot+8e'))).toBe(true);

    await act(async () => fireEvent.press(screen.getByRole('button', { name: 'Show setups for the Ottervale Kitworks Stoat 8E' })));
    expect(await screen.findByText('Kit filtered')).toBeTruthy();
    expect(screen.getByLabelText('Search setups').props.value).toBe('');

    fireEvent.changeText(screen.getByLabelText('Search setups'), 'nothing like it');
    expect(await screen.findByText('Nothing matches “nothing like it”')).toBeTruthy();
    await act(async () => fireEvent.press(screen.getByRole('button', { name: 'Clear the search' })));
    expect(await screen.findByText('Kit filtered')).toBeTruthy();
  });

  it('goes back to the filtered list when the search box is emptied', async () => {
    serveDiscover((url) =>
      url.includes('/api/search')
        ? { status: 200, body: { setups: [setup(9, { title: 'Found by words' })], nextCursor: null, kitSuggestions: [] } }
        : { status: 200, body: page([setup(1)]) },
    );
    renderWithQueries(<DiscoverScreen />);
    await screen.findByText('Hollow Pines 1');
    fireEvent.changeText(screen.getByLabelText('Search setups'), 'loam');
    expect(await screen.findByText('Found by words')).toBeTruthy();
    expect(screen.getByText('Best matches first. Filters and order apply when the search is empty.')).toBeTruthy();
    await act(async () => fireEvent.press(screen.getByRole('button', { name: 'Empty the search box' })));
    expect(await screen.findByText('Hollow Pines 1')).toBeTruthy();
    expect(screen.getByRole('button', { name: 'Filters' })).toBeTruthy();
  });

  it('lists the kits and tracks below the setups, and folds them away on request', async () => {
    serveDiscover(() => ({ status: 200, body: page([setup(1)]) }));
    renderWithQueries(<DiscoverScreen />);
    await screen.findByText('Hollow Pines 1');
    const kitLink = await screen.findByRole('link', { name: 'Ottervale Kitworks Stoat 8E, 1/8 electric buggy' });
    expect(kitLink.props.href).toBe('/kits/2');
    await act(async () => fireEvent.press(screen.getByRole('button', { name: 'Kits and tracks', expanded: true })));
    expect(screen.queryByRole('link', { name: 'Ottervale Kitworks Stoat 8E, 1/8 electric buggy' })).toBeNull();
    expect(screen.getByRole('button', { name: 'Kits and tracks', expanded: false })).toBeTruthy();
  });
});
