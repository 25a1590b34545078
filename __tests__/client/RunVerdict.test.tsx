import { screen } from '@testing-library/react-native';
import CompareRunsScreen from '../../app/runs/compare';
import { RunRevisionDiff, type RunSheet } from '../../components/RunRevisionDiff';
import { RunVerdict, signedSeconds } from '../../components/RunVerdict';
import { compareRuns } from '../../shared/compute/trackday';
import { signedInJuno } from './support/historyFixtures';
import { renderThemed, renderWithQueries, stubFetch } from './support/render';
import { runPairFixture } from './support/trackDayFixtures';

const mockParams: { current: Record<string, string> } = { current: {} };
jest.mock('expo-router', () => ({
  router: { replace: () => {}, push: () => {} },
  useLocalSearchParams: () => mockParams.current,
  Link: ({ children }: { children: unknown }) => children,
  Redirect: () => null,
}));

const BASELINE = [32.61, 32.48, 32.7, 32.55, 32.66, 32.52, 32.58, 32.64, 32.5, 32.59];
const FASTER = BASELINE.map((lap) => Number((lap - 0.3).toFixed(3)));
const SCATTERED = [32.1, 33.0, 32.4, 32.9, 32.2, 32.8];
const LIKE_SCATTERED = [32.3, 32.8, 32.2, 33.1, 32.5, 32.6];
const counts = (a: number[], b: number[]) => ({ a: { used: a.length, setAside: 0 }, b: { used: b.length, setAside: 0 } });

describe('the A/B verdict', () => {
  it('says a clear gain in plain words with its 95 % interval and the numbers behind it', () => {
    const comparison = compareRuns(BASELINE, FASTER);
    renderThemed(<RunVerdict comparison={comparison} laps={counts(BASELINE, FASTER)} />);
    expect(screen.getByText(/^B is faster by 0\.30 s a lap, 95 % CI 0\.\d\d–0\.\d\d s: likely a real gain\.$/)).toBeTruthy();
    expect(screen.getByText(comparison.message)).toBeTruthy();
    const interval = comparison.confidenceInterval!;
    expect(screen.getByText(`95 % confidence interval: ${signedSeconds(interval.lowSeconds)} to ${signedSeconds(interval.highSeconds)}`)).toBeTruthy();
    expect(screen.getByText('Mean lap time, B − A: −0.300 s')).toBeTruthy();
    expect(screen.getByText(/^Welch’s t = -\d+\.\d\d with \d+\.\d degrees of freedom$/)).toBeTruthy();
    expect(screen.getByText('Laps counted: A: 10 laps; B: 10 laps')).toBeTruthy();
  });

  it('says when the laps cannot tell two runs apart', () => {
    const comparison = compareRuns(SCATTERED, LIKE_SCATTERED);
    renderThemed(<RunVerdict comparison={comparison} laps={{ a: { used: 6, setAside: 1 }, b: { used: 6, setAside: 0 } }} />);
    expect(comparison.verdict).toBe('no-clear-difference');
    expect(screen.getByText(/^No difference you can tell from these laps: B is 0\.\d+ s a lap slower on average, but the 95 % CI runs from \d\.\d+ s faster to \d\.\d+ s slower\.$/)).toBeTruthy();
    expect(screen.getByText('Laps counted: A: 6 laps (1 slow set aside); B: 6 laps')).toBeTruthy();
  });

  it('says identical runs are identical, with no interval to show', () => {
    const same = [32.5, 32.5, 32.5];
    renderThemed(<RunVerdict comparison={compareRuns(same, same)} laps={counts(same, same)} />);
    expect(screen.getByText('No difference: every lap in both runs took 32.50 s.')).toBeTruthy();
    expect(screen.queryByText(/confidence interval:/)).toBeNull();
  });

  it('asks for more laps when a run has only one', () => {
    renderThemed(<RunVerdict comparison={compareRuns([32.5], FASTER)} laps={counts([32.5], FASTER)} />);
    expect(screen.getByText('Run A has only 1 lap: each run needs at least 2 laps to compare.')).toBeTruthy();
  });
});

const sheet = (overrides: Partial<RunSheet>): RunSheet => ({
  setupId: 7,
  setupTitle: 'Hollow Pines — loose and dusty',
  revisionId: 45,
  revisionNumber: 4,
  vehicleClass: 'buggy-1-8-electric',
  values: { 'shock.rear.oil': 450, 'shock.front.oil': 450 },
  ...overrides,
});
const UNITS = { length: 'mm', temperature: 'C' } as const;

describe('what changed between the two runs’ sheets', () => {
  it('lists the one changed setting without a warning', () => {
    renderThemed(<RunRevisionDiff a={sheet({})} b={sheet({ revisionId: 55, revisionNumber: 5, values: { 'shock.rear.oil': 500, 'shock.front.oil': 450 } })} units={UNITS} wide={false} />);
    expect(screen.getByText('One setting changed between the runs: the verdict above is about this change.')).toBeTruthy();
    expect(screen.getByText('Rear shock oil')).toBeTruthy();
    expect(screen.getByText('450 cSt → 500 cSt')).toBeTruthy();
    expect(screen.queryByText('Front shock oil')).toBeNull();
  });

  it('warns that the laps cannot say which change helped when more than one setting changed', () => {
    renderThemed(<RunRevisionDiff a={sheet({})} b={sheet({ revisionId: 55, revisionNumber: 5, values: { 'shock.rear.oil': 500, 'shock.front.oil': 400 } })} units={UNITS} wide />);
    expect(screen.getByText('2 settings changed between these runs: the laps cannot say which change helped. Change one thing at a time to find out.')).toBeTruthy();
    expect(screen.getByText('A: revision 4')).toBeTruthy();
    expect(screen.getByText('B: revision 5')).toBeTruthy();
  });

  it('says nothing changed when both runs used the same revision', () => {
    renderThemed(<RunRevisionDiff a={sheet({})} b={sheet({})} units={UNITS} wide={false} />);
    expect(screen.getByText(/^Both runs used revision 4 of “Hollow Pines — loose and dusty”: nothing on the sheet changed/)).toBeTruthy();
  });
});

describe('the compare-runs screen', () => {
  it('puts the verdict first, then the one-field diff, then the charts with their numbers as text', async () => {
    mockParams.current = { a: '1', b: '2' };
    const { calls } = stubFetch(({ url }) => {
      if (url.endsWith('/api/me')) return { status: 200, body: { user: signedInJuno } };
      if (url.endsWith('/api/runs/compare?a=1&b=2')) return { status: 200, body: runPairFixture(BASELINE, [...FASTER, 58.2]) };
      return { status: 404, body: { error: { code: 'not_found', message: 'Not found.' } } };
    });
    renderWithQueries(<CompareRunsScreen />);
    expect(await screen.findByText(/^B is faster by 0\.30 s a lap/)).toBeTruthy();
    expect(calls.some((c) => c.url.endsWith('/api/runs/compare?a=1&b=2'))).toBe(true);
    // The 58.2 s crash lap is set aside by the slow-lap rule and left out of the verdict.
    expect(screen.getByText('Laps counted: A: 10 laps; B: 10 laps (1 slow set aside)')).toBeTruthy();
    expect(screen.getByText('One setting changed between the runs: the verdict above is about this change.')).toBeTruthy();
    expect(screen.getByText('450 cSt → 500 cSt')).toBeTruthy();
    expect(screen.getByLabelText(/^Lap time over lap number\. A: Heat 1: 10 laps from 32\.480 to 32\.700 s\. B: Heat 2: 11 laps from 32\.180 to 58\.200 s, 1 set aside\.$/)).toBeTruthy();
    expect(screen.getByLabelText(/^Spread of the counted lap times/)).toBeTruthy();
    expect(screen.getByText('58.200 (set aside)')).toBeTruthy();
  });

  it('asks for two runs when the address names only one', () => {
    mockParams.current = { a: '1' };
    stubFetch(({ url }) => (url.endsWith('/api/me') ? { status: 200, body: { user: signedInJuno } } : { status: 404, body: { error: { code: 'not_found', message: 'Not found.' } } }));
    renderWithQueries(<CompareRunsScreen />);
    return screen.findByText('Pick two runs to compare');
  });
});
