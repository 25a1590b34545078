import { useState, type ReactNode } from 'react';
import { StyleSheet, View, type LayoutChangeEvent } from 'react-native';
import { G, Line, Text as SvgText } from 'react-native-svg';
import { fonts, space, type as typeScale, useTheme } from '../theme';
import { AppText } from './AppText';

/** Room around the plot for tick labels, in px. */
export const CHART_MARGIN = { top: space.md, right: space.lg, bottom: space.xxl + space.sm, left: space.xxl + space.xl } as const;
export const CHART_HEIGHT = 220;
/** The width drawn before the first layout pass reports the real one (a 390 px phone minus padding). */
const FALLBACK_WIDTH = 320;

/** Marker shapes per series, so the two runs differ by more than colour. */
export type SeriesMark = 'circle' | 'square';

/** Colour and shape of the first and second series (A and B). */
export function useSeriesStyles(): Array<{ color: string; mark: SeriesMark; glyph: string }> {
  const { colors } = useTheme();
  return [
    { color: colors.accent, mark: 'circle', glyph: '●' },
    { color: colors.caution, mark: 'square', glyph: '■' },
  ];
}

/** Maps `value` from [d0, d1] onto [r0, r1]; a zero-width domain maps to the middle. */
export function scaleLinear(value: number, [d0, d1]: readonly [number, number], [r0, r1]: readonly [number, number]): number {
  if (d1 === d0) return (r0 + r1) / 2;
  return r0 + ((value - d0) / (d1 - d0)) * (r1 - r0);
}

/**
 * About `count` evenly spaced round ticks covering [min, max], steps of 1, 2 or 5 × 10^k
 * (common practice for chart axes, no source).
 */
export function niceTicks(min: number, max: number, count = 5): number[] {
  if (!Number.isFinite(min) || !Number.isFinite(max)) return [];
  if (max <= min) return [min];
  const rough = (max - min) / Math.max(1, count);
  const power = 10 ** Math.floor(Math.log10(rough));
  const step = [1, 2, 5, 10].map((m) => m * power).find((s) => s >= rough) ?? 10 * power;
  const ticks: number[] = [];
  for (let t = Math.ceil(min / step) * step; t <= max + step * 1e-9; t += step) ticks.push(Number(t.toFixed(10)));
  return ticks;
}

/** Decimal places that tell ticks `step` apart. */
export function tickDecimals(ticks: readonly number[]): number {
  if (ticks.length < 2) return 1;
  const step = Math.abs(ticks[1] - ticks[0]);
  return Math.max(0, Math.min(3, -Math.floor(Math.log10(step) + 1e-9)));
}

/** A chart's measured width: the plot is redrawn to fill its column on phones and wide screens. */
export function useChartWidth(): [number, (event: LayoutChangeEvent) => void] {
  const [width, setWidth] = useState(FALLBACK_WIDTH);
  const onLayout = (event: LayoutChangeEvent) => {
    const measured = Math.floor(event.nativeEvent.layout.width);
    if (measured > 0 && measured !== width) setWidth(measured);
  };
  return [width, onLayout];
}

export type AxisProps = {
  orientation: 'x' | 'y';
  ticks: readonly { value: number; position: number; label: string }[];
  /** The plot's edges in px: x axes sit on `bottom`, y axes on `left`. */
  plot: { left: number; right: number; top: number; bottom: number };
  title: string;
};

/** Tick marks, grid lines and labels of one axis, drawn inside an Svg. */
export function ChartAxis({ orientation, ticks, plot, title }: AxisProps) {
  const { colors } = useTheme();
  const text = { fill: colors.textMuted, fontSize: typeScale.caption.fontSize, fontFamily: fonts.regular };
  if (orientation === 'x') {
    return (
      <G>
        <Line x1={plot.left} x2={plot.right} y1={plot.bottom} y2={plot.bottom} stroke={colors.border} />
        {ticks.map((t) => (
          <SvgText key={t.value} x={t.position} y={plot.bottom + space.lg} textAnchor="middle" {...text}>
            {t.label}
          </SvgText>
        ))}
        <SvgText x={(plot.left + plot.right) / 2} y={plot.bottom + space.xxl + space.xs} textAnchor="middle" {...text}>
          {title}
        </SvgText>
      </G>
    );
  }
  return (
    <G>
      {ticks.map((t) => (
        <G key={t.value}>
          <Line x1={plot.left} x2={plot.right} y1={t.position} y2={t.position} stroke={colors.border} strokeDasharray="2 4" />
          <SvgText x={plot.left - space.xs} y={t.position + space.xs} textAnchor="end" {...text}>
            {t.label}
          </SvgText>
        </G>
      ))}
      <SvgText x={space.sm} y={plot.top + space.xs} textAnchor="start" {...text}>
        {title}
      </SvgText>
    </G>
  );
}

export type ChartFrameProps = {
  /** What the chart shows and its numbers in a sentence or two: read out instead of the drawing. */
  summary: string;
  /** A legend or key under the drawing, in text. */
  legend?: ReactNode;
  onLayout: (event: LayoutChangeEvent) => void;
  children: ReactNode;
};

/** A drawing with a spoken summary; the summary is also shown as a caption for everyone. */
export function ChartFrame({ summary, legend, onLayout, children }: ChartFrameProps) {
  return (
    <View style={styles.frame}>
      <View role="img" aria-label={summary} accessibilityLabel={summary} onLayout={onLayout} style={styles.drawing}>
        {children}
      </View>
      {legend}
      {/* The drawing's label already reads this out; the caption is for sighted readers. */}
      <AppText variant="caption" tone="muted" aria-hidden>
        {summary}
      </AppText>
    </View>
  );
}

export type ChartLegendProps = { items: readonly { glyph: string; color: string; label: string }[] };

/** Which colour and shape is which series, in words. */
export function ChartLegend({ items }: ChartLegendProps) {
  return (
    <View style={styles.legend}>
      {items.map((item) => (
        <AppText key={item.label} variant="caption">
          <AppText variant="caption" style={{ color: item.color }} aria-hidden>
            {item.glyph}{' '}
          </AppText>
          {item.label}
        </AppText>
      ))}
    </View>
  );
}

const styles = StyleSheet.create({
  frame: { gap: space.xs },
  drawing: { width: '100%' },
  legend: { flexDirection: 'row', flexWrap: 'wrap', columnGap: space.lg, rowGap: space.xs },
});
