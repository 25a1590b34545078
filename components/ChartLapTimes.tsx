import Svg, { Circle, G, Polyline, Rect } from 'react-native-svg';
import { formatLapTime } from '../shared/compute/trackday';
import { space, useTheme } from '../theme';
import {
  CHART_HEIGHT,
  CHART_MARGIN,
  ChartAxis,
  ChartFrame,
  ChartLegend,
  niceTicks,
  scaleLinear,
  tickDecimals,
  useChartWidth,
  useSeriesStyles,
  type SeriesMark,
} from './ChartFrame';

export type LapSeries = {
  name: string;
  /** Lap times in seconds, in the order driven. */
  laps: readonly number[];
  /** 0-based laps set aside as crashes or pit stops: drawn hollow, pinned to the top when off the scale. */
  setAside?: readonly number[];
};

export type ChartLapTimesProps = { series: readonly LapSeries[] };

const MARK_SIZE = space.xs + 1;

function Mark({ mark, x, y, color, hollow, surface }: { mark: SeriesMark; x: number; y: number; color: string; hollow: boolean; surface: string }) {
  const fill = hollow ? surface : color;
  if (mark === 'circle') return <Circle cx={x} cy={y} r={MARK_SIZE} fill={fill} stroke={color} strokeWidth={1.5} />;
  return <Rect x={x - MARK_SIZE} y={y - MARK_SIZE} width={MARK_SIZE * 2} height={MARK_SIZE * 2} fill={fill} stroke={color} strokeWidth={1.5} />;
}

/** "A: 14 laps, 31.902 to 33.410 s." for the spoken summary. */
function describeSeries(s: LapSeries): string {
  if (s.laps.length === 0) return `${s.name}: no laps.`;
  const aside = s.setAside?.length ? `, ${s.setAside.length} set aside` : '';
  return `${s.name}: ${s.laps.length} laps from ${formatLapTime(Math.min(...s.laps))} to ${formatLapTime(Math.max(...s.laps))} s${aside}.`;
}

/**
 * Lap time over lap number for one or two runs. The time axis spans the laps that count, so one
 * crash lap does not flatten the rest; set-aside laps beyond it sit hollow on the top edge.
 */
export function ChartLapTimes({ series }: ChartLapTimesProps) {
  const { colors } = useTheme();
  const styles = useSeriesStyles();
  const [width, onLayout] = useChartWidth();
  const counted = series.flatMap((s) => s.laps.filter((_, i) => !s.setAside?.includes(i)));
  const all = series.flatMap((s) => s.laps);
  const values = counted.length > 0 ? counted : all;
  const summary = `Lap time over lap number. ${series.map(describeSeries).join(' ')}`;
  const legend = <ChartLegend items={series.map((s, i) => ({ ...styles[i % styles.length], label: s.name }))} />;
  if (values.length === 0) {
    return (
      <ChartFrame summary={summary} onLayout={onLayout}>
        {null}
      </ChartFrame>
    );
  }
  const plot = { left: CHART_MARGIN.left, right: width - CHART_MARGIN.right, top: CHART_MARGIN.top, bottom: CHART_HEIGHT - CHART_MARGIN.bottom };
  const maxLaps = Math.max(...series.map((s) => s.laps.length));
  const spread = Math.max(Math.max(...values) - Math.min(...values), 0.1);
  const yDomain = [Math.min(...values) - spread * 0.1, Math.max(...values) + spread * 0.1] as const;
  const xDomain = [1, Math.max(2, maxLaps)] as const;
  const x = (lap: number) => scaleLinear(lap, xDomain, [plot.left, plot.right]);
  const y = (seconds: number) => Math.max(plot.top, scaleLinear(seconds, yDomain, [plot.bottom, plot.top]));
  const yTicks = niceTicks(yDomain[0], yDomain[1], 4);
  const decimals = tickDecimals(yTicks);
  const xTicks = niceTicks(1, xDomain[1], Math.min(6, xDomain[1] - 1)).filter((t) => Number.isInteger(t) && t >= 1);
  return (
    <ChartFrame summary={summary} legend={legend} onLayout={onLayout}>
      <Svg width={width} height={CHART_HEIGHT} aria-hidden>
        <ChartAxis orientation="y" title="s" plot={plot} ticks={yTicks.map((t) => ({ value: t, position: y(t), label: t.toFixed(decimals) }))} />
        <ChartAxis orientation="x" title="Lap" plot={plot} ticks={xTicks.map((t) => ({ value: t, position: x(t), label: String(t) }))} />
        {series.map((s, si) => {
          const style = styles[si % styles.length];
          const points = s.laps.map((seconds, i) => `${x(i + 1)},${y(seconds)}`).join(' ');
          return (
            <G key={s.name}>
              <Polyline points={points} fill="none" stroke={style.color} strokeWidth={2} strokeDasharray={si === 0 ? undefined : '6 3'} />
              {s.laps.map((seconds, i) => (
                <Mark key={i} mark={style.mark} x={x(i + 1)} y={y(seconds)} color={style.color} hollow={Boolean(s.setAside?.includes(i))} surface={colors.surface} />
              ))}
            </G>
          );
        })}
      </Svg>
    </ChartFrame>
  );
}
