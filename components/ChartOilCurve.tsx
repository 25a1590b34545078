import Svg, { Circle, G, Polyline } from 'react-native-svg';
import { celsiusToFahrenheit, fahrenheitToCelsius, formatForDisplay } from '../shared/compute/setup';
import { siliconeOilCurve, siliconeViscosityAt } from '../shared/compute/trackday';
import type { UnitPreferences } from '../shared/types/auth';
import { space, useTheme } from '../theme';
import { CHART_HEIGHT, CHART_MARGIN, ChartAxis, ChartFrame, ChartLegend, niceTicks, scaleLinear, useChartWidth, useSeriesStyles } from './ChartFrame';

export type OilCurve = { name: string; gradeCst: number };
export type OilMarker = { label: string; temperatureC: number; viscosityCst: number };

export type ChartOilCurveProps = {
  curves: readonly OilCurve[];
  fromC: number;
  toC: number;
  /** Points to mark on the curves, such as "the sheet's oil today". */
  markers: readonly OilMarker[];
  units: UnitPreferences;
};

/** Round viscosities for a log axis: 1, 2 and 5 times each power of ten inside the range. */
export function logTicks(min: number, max: number): number[] {
  const ticks: number[] = [];
  for (let power = Math.floor(Math.log10(min)); power <= Math.ceil(Math.log10(max)); power += 1) {
    for (const m of [1, 2, 5]) {
      const t = m * 10 ** power;
      if (t >= min && t <= max) ticks.push(t);
    }
  }
  return ticks.length >= 2 ? ticks : [min, max].map((v) => Number(v.toPrecision(2)));
}

/**
 * The model's viscosity–temperature curves (log viscosity against temperature in the viewer's unit):
 * how much the oil thins as the track warms, and where today sits on it.
 */
export function ChartOilCurve({ curves, fromC, toC, markers, units }: ChartOilCurveProps) {
  const { colors } = useTheme();
  const styles = useSeriesStyles();
  const [width, onLayout] = useChartWidth();
  const temperature = (c: number) => formatForDisplay(c, 'temperature', units).text;
  const lines = curves.map((curve) => ({ curve, points: siliconeOilCurve(curve.gradeCst, { fromC, toC, pointCount: 41 }) }));
  const all = lines.flatMap((l) => l.points.map((p) => p.viscosityCst));
  const summary =
    `Modelled viscosity against temperature. ` +
    lines.map(({ curve }) => `${curve.name}: ${Math.round(siliconeViscosityAt(curve.gradeCst, fromC))} cSt at ${temperature(fromC)}, ${Math.round(siliconeViscosityAt(curve.gradeCst, toC))} cSt at ${temperature(toC)}.`).join(' ') +
    ' ' +
    markers.map((m) => `${m.label}: ${Math.round(m.viscosityCst)} cSt at ${temperature(m.temperatureC)}.`).join(' ');
  const plot = { left: CHART_MARGIN.left, right: width - CHART_MARGIN.right, top: CHART_MARGIN.top, bottom: CHART_HEIGHT - CHART_MARGIN.bottom };
  const logDomain = [Math.log10(Math.min(...all) * 0.9), Math.log10(Math.max(...all) * 1.1)] as const;
  const x = (c: number) => scaleLinear(c, [fromC, toC], [plot.left, plot.right]);
  const y = (cst: number) => scaleLinear(Math.log10(cst), logDomain, [plot.bottom, plot.top]);
  const fahrenheit = units.temperature === 'F';
  const [displayFrom, displayTo] = fahrenheit ? [celsiusToFahrenheit(fromC), celsiusToFahrenheit(toC)] : [fromC, toC];
  const xTicks = niceTicks(displayFrom, displayTo, 5).map((t) => ({ value: t, position: x(fahrenheit ? fahrenheitToCelsius(t) : t), label: String(t) }));
  const yTicks = logTicks(10 ** logDomain[0], 10 ** logDomain[1]).map((t) => ({ value: t, position: y(t), label: t >= 10000 ? `${t / 1000}k` : String(t) }));
  const legend = <ChartLegend items={lines.map(({ curve }, i) => ({ ...styles[i % styles.length], label: curve.name }))} />;
  return (
    <ChartFrame summary={summary} legend={legend} onLayout={onLayout}>
      <Svg width={width} height={CHART_HEIGHT} aria-hidden>
        <ChartAxis orientation="y" title="cSt" plot={plot} ticks={yTicks} />
        <ChartAxis orientation="x" title={fahrenheit ? '°F' : '°C'} plot={plot} ticks={xTicks} />
        {lines.map(({ curve, points }, i) => (
          <Polyline
            key={curve.name}
            points={points.map((p) => `${x(p.temperatureC)},${y(p.viscosityCst)}`).join(' ')}
            fill="none"
            stroke={styles[i % styles.length].color}
            strokeWidth={2}
            strokeDasharray={i === 0 ? undefined : '6 3'}
          />
        ))}
        <G>
          {markers.map((m) => (
            <Circle key={m.label} cx={x(m.temperatureC)} cy={y(m.viscosityCst)} r={space.xs + 1} fill={colors.surface} stroke={colors.text} strokeWidth={2} />
          ))}
        </G>
      </Svg>
    </ChartFrame>
  );
}
