import { screen } from '@testing-library/react-native';
import { niceTicks, scaleLinear, tickDecimals } from '../../components/ChartFrame';
import { ChartLapDistribution } from '../../components/ChartLapDistribution';
import { ChartLapTimes } from '../../components/ChartLapTimes';
import { logTicks } from '../../components/ChartOilCurve';
import { renderThemed } from './support/render';

// Axis arithmetic: round ticks in steps of 1, 2 or 5 × 10^k (common practice, no source).
describe('chart axes', () => {
  it('picks round ticks covering the range', () => {
    expect(niceTicks(31.8, 33.2, 4)).toEqual([32, 32.5, 33]);
    expect(niceTicks(1, 12, 6)).toEqual([2, 4, 6, 8, 10, 12]);
    expect(niceTicks(5, 5)).toEqual([5]);
    expect(niceTicks(Number.NaN, 3)).toEqual([]);
  });

  it('shows as many decimals as the step needs', () => {
    expect(tickDecimals([32, 32.5, 33])).toBe(1);
    expect(tickDecimals([2, 4, 6])).toBe(0);
    expect(tickDecimals([32.05, 32.1])).toBe(2);
  });

  it('maps values linearly and puts a zero-width range in the middle', () => {
    expect(scaleLinear(32.5, [32, 33], [200, 0])).toBe(100);
    expect(scaleLinear(7, [7, 7], [0, 100])).toBe(50);
  });

  it('labels a log viscosity axis at 1, 2 and 5 times each power of ten', () => {
    expect(logTicks(150, 1200)).toEqual([200, 500, 1000]);
    expect(logTicks(310, 480)).toEqual([310, 480]);
  });
});

describe('lap charts', () => {
  it('read out what they draw, crash laps included', () => {
    renderThemed(<ChartLapTimes series={[{ name: 'Heat 1', laps: [32.5, 32.4, 61.2], setAside: [2] }]} />);
    expect(screen.getByLabelText('Lap time over lap number. Heat 1: 3 laps from 32.400 to 1:01.200 s, 1 set aside.')).toBeTruthy();
    expect(screen.getByText('● Heat 1')).toBeTruthy();
  });

  it('describe each run’s mean, median and spread', () => {
    renderThemed(<ChartLapDistribution series={[{ name: 'A', laps: [32, 33] }, { name: 'B', laps: [31.5] }]} />);
    expect(
      screen.getByLabelText(
        'Spread of the counted lap times; bar: mean ± one standard deviation, tick: median. A: mean 32.500 s, median 32.500 s, standard deviation 0.707 s. B: mean 31.500 s, median 31.500 s.',
      ),
    ).toBeTruthy();
  });
});
