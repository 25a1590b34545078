import Svg, { Circle, G, Line, Rect } from 'react-native-svg';
import { formatLapTime, summarizeLaps } from '../shared/compute/trackday';
import { space, useTheme } from '../theme';
import { CHART_MARGIN, ChartAxis, ChartFrame, ChartLegend, niceTicks, scaleLinear, tickDecimals, useChartWidth, useSeriesStyles } from './ChartFrame';

export type DistributionSeries = {
  name: string;
  /** The laps that count (set-aside laps already left out), seconds. */
  laps: readonly number[];
};

export type ChartLapDistributionProps = { series: readonly DistributionSeries[] };

const ROW_HEIGHT = space.xxl * 2;
/** Dots are spread over this many lanes within a row so equal times stay visible. */
const LANES = 5;

function describe(s: DistributionSeries): string {
  if (s.laps.length === 0) return `${s.name}: no laps.`;
  const stats = summarizeLaps(s.laps);
  const sd = stats.standardDeviationSeconds === null ? '' : `, standard deviation ${stats.standardDeviationSeconds.toFixed(3)} s`;
  return `${s.name}: mean ${formatLapTime(stats.meanSeconds)} s, median ${formatLapTime(stats.medianSeconds)} s${sd}.`;
}

/**
 * Each run's counted laps as a row of dots on one time axis, with a bar for the mean ± one standard
 * deviation and a tick at the median: how far apart the runs are against how much each one scatters.
 */
export function ChartLapDistribution({ series }: ChartLapDistributionProps) {
  const { colors } = useTheme();
  const styles = useSeriesStyles();
  const [width, onLayout] = useChartWidth();
  const all = series.flatMap((s) => s.laps);
  const summary = `Spread of the counted lap times; bar: mean ± one standard deviation, tick: median. ${series.map(describe).join(' ')}`;
  const legend = <ChartLegend items={series.map((s, i) => ({ ...styles[i % styles.length], label: s.name }))} />;
  if (all.length === 0) {
    return (
      <ChartFrame summary={summary} onLayout={onLayout}>
        {null}
      </ChartFrame>
    );
  }
  const height = CHART_MARGIN.top + ROW_HEIGHT * series.length + CHART_MARGIN.bottom;
  const plot = { left: CHART_MARGIN.left, right: width - CHART_MARGIN.right, top: CHART_MARGIN.top, bottom: height - CHART_MARGIN.bottom };
  const spread = Math.max(Math.max(...all) - Math.min(...all), 0.1);
  const domain = [Math.min(...all) - spread * 0.05, Math.max(...all) + spread * 0.05] as const;
  const x = (seconds: number) => scaleLinear(seconds, domain, [plot.left, plot.right]);
  const ticks = niceTicks(domain[0], domain[1], Math.max(2, Math.floor((plot.right - plot.left) / 70)));
  const decimals = tickDecimals(ticks);
  return (
    <ChartFrame summary={summary} legend={legend} onLayout={onLayout}>
      <Svg width={width} height={height} aria-hidden>
        <ChartAxis orientation="x" title="Lap time (s)" plot={plot} ticks={ticks.map((t) => ({ value: t, position: x(t), label: t.toFixed(decimals) }))} />
        {series.map((s, si) => {
          if (s.laps.length === 0) return null;
          const style = styles[si % styles.length];
          const stats = summarizeLaps(s.laps);
          const top = plot.top + ROW_HEIGHT * si;
          const middle = top + ROW_HEIGHT / 2;
          const sd = stats.standardDeviationSeconds ?? 0;
          const lane = (i: number) => top + space.sm + ((i % LANES) * (ROW_HEIGHT / 2 - space.sm)) / (LANES - 1);
          return (
            <G key={s.name}>
              <Rect
                x={x(stats.meanSeconds - sd)}
                y={middle + space.xs}
                width={Math.max(2, x(stats.meanSeconds + sd) - x(stats.meanSeconds - sd))}
                height={space.sm}
                fill={style.color}
                opacity={0.35}
              />
              <Line x1={x(stats.meanSeconds)} x2={x(stats.meanSeconds)} y1={middle} y2={middle + space.lg} stroke={style.color} strokeWidth={2} />
              <Line x1={x(stats.medianSeconds)} x2={x(stats.medianSeconds)} y1={middle + space.md} y2={top + ROW_HEIGHT - space.xs} stroke={colors.text} strokeWidth={2} />
              {s.laps.map((seconds, i) =>
                style.mark === 'circle' ? (
                  <Circle key={i} cx={x(seconds)} cy={lane(i)} r={space.xs} fill={style.color} opacity={0.8} />
                ) : (
                  <Rect key={i} x={x(seconds) - space.xs} y={lane(i) - space.xs} width={space.sm} height={space.sm} fill={style.color} opacity={0.8} />
                ),
              )}
            </G>
          );
        })}
      </Svg>
    </ChartFrame>
  );
}
