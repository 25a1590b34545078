import { fireEvent, screen } from '@testing-library/react-native';
import SetupOilsScreen from '../../app/setups/[id]/oils';
import { OilsForToday } from '../../components/OilsForToday';
import { recommendOilForTemperature, SHOCK_OIL_GRADES_CST } from '../../shared/compute/trackday';
import { setupFixture, signedInJuno } from './support/historyFixtures';
import { renderWithQueries, stubFetch } from './support/render';

jest.mock('expo-router', () => ({
  router: { replace: () => {} },
  useLocalSearchParams: () => ({ id: '7' }),
  Link: ({ children }: { children: unknown }) => children,
}));

function serveMe(units: { length: 'mm' | 'in'; temperature: 'C' | 'F' } = { length: 'mm', temperature: 'C' }) {
  return stubFetch(({ url }) => {
    if (url.endsWith('/api/me')) return { status: 200, body: { user: { ...signedInJuno, units } } };
    if (/\/api\/setups\/7$/.test(url)) {
      const setup = setupFixture({ conditions: { trackType: 'loose-dusty', temperatureC: 30, grip: 'low' } });
      return { status: 200, body: { setup: { ...setup, currentRevision: { ...setup.currentRevision, values: { 'shock.front.oil': 600, 'diff.centre.oil': 7000 } } } } };
    }
    return { status: 404, body: { error: { code: 'not_found', message: 'Not found.' } } };
  });
}

type Node = { children: Array<string | Node> };

function textOf(node: Node): string {
  return node.children.map((child) => (typeof child === 'string' ? child : textOf(child))).join('');
}

function escaped(text: string): string {
  return text.replace(/[.*+?^${}()|[\]\\]/g, '\\$&');
}

/** The grade shown after a label such as "Racers’ practice (50 % of the way)", in cSt. */
function shownGrade(prefix: string): number {
  const line = screen.getByText(new RegExp(`^${escaped(prefix)}.*: [\\d,]+ cSt$`)) as unknown as Node;
  return Number(/: ([\d,]+) cSt$/.exec(textOf(line))![1].replace(/,/g, ''));
}

const FRONT_600 = { 'shock.front.oil': 600 };

describe('oils for today', () => {
  // Racers' practice (common practice, no source; temperatures approximate): a 600 cSt front shock
  // oil on a ~30 °C track goes to about 500 cSt at ~10 °C and about 450 cSt at ~1 °C.
  it('moves a 600 cSt shock oil tuned at 30 °C half-way for a 10 °C and a 1 °C track, and shows full compensation beside it', async () => {
    serveMe();
    renderWithQueries(<OilsForToday vehicleClass="buggy-1-8-electric" values={FRONT_600} referenceTempC={30} />);
    expect(screen.getByText('Type both temperatures to see the oils.')).toBeTruthy();
    fireEvent.changeText(screen.getByLabelText('Today’s track temperature (°C)'), '10');
    expect(screen.getByText('Front shock oil: 600 cSt on the sheet')).toBeTruthy();
    const atTen = recommendOilForTemperature({ setupGradeCst: 600, setupTemperatureC: 30, todayTemperatureC: 10, availableGradesCst: SHOCK_OIL_GRADES_CST });
    expect(shownGrade('Racers’ practice (50 % of the way)')).toBe(atTen.partialCompensation.nearestGradeCst);
    expect(Math.abs(shownGrade('Racers’ practice') - 500)).toBeLessThanOrEqual(50);
    expect(shownGrade('Full compensation')).toBe(atTen.fullCompensation.nearestGradeCst);
    expect(Math.abs(shownGrade('Full compensation') - 400)).toBeLessThanOrEqual(50);

    fireEvent.changeText(screen.getByLabelText('Today’s track temperature (°C)'), '1');
    expect(Math.abs(shownGrade('Racers’ practice') - 450)).toBeLessThanOrEqual(50);
    expect(Math.abs(shownGrade('Full compensation') - 330)).toBeLessThanOrEqual(50);
    expect(screen.getByLabelText(/^Modelled viscosity against temperature\. Front shock oil, 600 cSt \(the sheet\): /)).toBeTruthy();
  });

  it('lets the racer choose how far to compensate; full is the full-compensation grade', () => {
    serveMe();
    renderWithQueries(<OilsForToday vehicleClass="buggy-1-8-electric" values={FRONT_600} referenceTempC={30} />);
    fireEvent.changeText(screen.getByLabelText('Today’s track temperature (°C)'), '10');
    fireEvent.press(screen.getByRole('radio', { name: 'Full' }));
    expect(shownGrade('Racers’ practice (100 % of the way)')).toBe(shownGrade('Full compensation'));
    fireEvent.press(screen.getByRole('radio', { name: 'None' }));
    expect(shownGrade('Racers’ practice (0 % of the way)')).toBe(600);
  });

  it('reads temperatures in °F for a racer who reads °F, with the same answer', async () => {
    serveMe({ length: 'in', temperature: 'F' });
    renderWithQueries(<OilsForToday vehicleClass="buggy-1-8-electric" values={FRONT_600} referenceTempC={30} />);
    const today = await screen.findByLabelText('Today’s track temperature (°F)');
    expect(screen.getByLabelText('Track temperature the sheet was tuned at (°F)').props.value).toBe('86');
    fireEvent.changeText(today, '50');
    const atTen = recommendOilForTemperature({ setupGradeCst: 600, setupTemperatureC: 30, todayTemperatureC: 10, availableGradesCst: SHOCK_OIL_GRADES_CST });
    expect(shownGrade('Racers’ practice')).toBe(atTen.partialCompensation.nearestGradeCst);
  });

  it('asks for the tuning temperature when the setup has none, and explains bad temperatures', () => {
    serveMe();
    renderWithQueries(<OilsForToday vehicleClass="buggy-1-8-electric" values={{ 'diff.centre.oil': 7000 }} referenceTempC={null} />);
    expect(screen.getByText('The setup has no temperature in its conditions: type the one it worked at.')).toBeTruthy();
    fireEvent.changeText(screen.getByLabelText('Today’s track temperature (°C)'), 'cold');
    expect(screen.getByText('Type a number, such as 20.')).toBeTruthy();
    fireEvent.changeText(screen.getByLabelText('Today’s track temperature (°C)'), '95');
    expect(screen.getByText('Between -30 °C and 70 °C.')).toBeTruthy();
    fireEvent.changeText(screen.getByLabelText('Today’s track temperature (°C)'), '12');
    expect(screen.getByText('Type both temperatures to see the oils.')).toBeTruthy();
    fireEvent.changeText(screen.getByLabelText('Track temperature the sheet was tuned at (°C)'), '28');
    expect(screen.getByText('Centre diff oil: 7,000 cSt on the sheet')).toBeTruthy();
    // A colder day asks for a thinner diff oil from the diff list, never a thicker one.
    expect(shownGrade('Racers’ practice')).toBeLessThanOrEqual(7000);
  });

  it('always shows the cautions, and says when the sheet has no oils to move', () => {
    serveMe();
    renderWithQueries(<OilsForToday vehicleClass="buggy-1-8-electric" values={{ 'susp.front.ride-height': 27 }} referenceTempC={24} />);
    expect(screen.getByText('This sheet has no shock or diff oil filled in: fill in the oils to see what to run today.')).toBeTruthy();
    expect(screen.getByText(/A starting point, not an answer/)).toBeTruthy();
    expect(screen.getByText(/Shocks heat up while they work/)).toBeTruthy();
  });

  it('is reachable as a screen that loads the setup and its tuning temperature', async () => {
    const { calls } = serveMe();
    renderWithQueries(<SetupOilsScreen />);
    expect(await screen.findByText('“Hollow Pines — loose and dusty”, revision 5, tuned at 30 °C.')).toBeTruthy();
    expect(calls.some((c) => c.url.endsWith('/api/setups/7'))).toBe(true);
    fireEvent.changeText(screen.getByLabelText('Today’s track temperature (°C)'), '10');
    expect(screen.getByText('Front shock oil: 600 cSt on the sheet')).toBeTruthy();
    expect(screen.getByText('Centre diff oil: 7,000 cSt on the sheet')).toBeTruthy();
  });
});
