/**
 * The station's last 24 hours: clock offset and temperature against UTC time. Loaded lazily
 * (lazy-charts.tsx): victory is large, and only the station health screen draws it.
 */
import { StyleSheet, View } from 'react-native';
import { VictoryAxis } from 'victory-native/lib/components/victory-axis';
import { VictoryChart } from 'victory-native/lib/components/victory-chart';
import { VictoryLine } from 'victory-native/lib/components/victory-line';
import { VictoryScatter } from 'victory-native/lib/components/victory-scatter';

import type { StationHealth } from '@/shared/schemas';

import { axisTextOf, timeAxisStyleOf } from '../charts/axis-styles';
import { Text } from '../ui/text';
import { space } from '../ui/theme';
import { useAppTheme } from '../ui/theme-provider';

export type HealthChartsProps = {
  series: StationHealth['series'];
  /** the right edge of the 24-hour window */
  nowMs: number;
  width: number;
  /** the alert threshold, drawn as a dashed band on the clock chart */
  clockLimitMs?: number;
};

const HOUR_MS = 3_600_000;
const PAD = { top: 14, bottom: 44, left: 56, right: 16 };

function hourTicks(fromMs: number, toMs: number, stepH: number): number[] {
  const ticks: number[] = [];
  const first = Math.ceil(fromMs / (stepH * HOUR_MS)) * stepH * HOUR_MS;
  for (let t = first; t <= toMs; t += stepH * HOUR_MS) ticks.push(t);
  return ticks;
}

const hhmm = (ms: number) => {
  const d = new Date(ms);
  return `${String(d.getUTCHours()).padStart(2, '0')}:${String(d.getUTCMinutes()).padStart(2, '0')}`;
};

type Point = { x: number; y: number };

function SeriesChart({
  title,
  points,
  fromMs,
  toMs,
  width,
  unit,
  colour,
  limit,
}: {
  title: string;
  points: Point[];
  fromMs: number;
  toMs: number;
  width: number;
  unit: string;
  colour: string;
  limit?: number;
}) {
  const { colors } = useAppTheme();
  const axisText = axisTextOf(colors);
  const values = points.map((p) => p.y);
  // the limit is drawn only when readings come near it; otherwise it would flatten the line
  const shownLimit = limit !== undefined && values.some((v) => Math.abs(v) > limit * 0.5) ? limit : undefined;
  const bounds = shownLimit !== undefined ? [-shownLimit, shownLimit] : [];
  let low = Math.min(...values, ...bounds);
  let high = Math.max(...values, ...bounds);
  if (high - low < 1) {
    low -= 0.5;
    high += 0.5;
  }
  const margin = (high - low) * 0.1;
  const summary =
    points.length === 0
      ? `${title}: no readings in the last 24 hours`
      : `${title} over the last 24 hours (UTC): ${points.length} readings from ${Math.min(...values).toFixed(1)} to ${Math.max(...values).toFixed(1)} ${unit}`;
  return (
    <View style={styles.chart} accessibilityRole="image" accessibilityLabel={summary}>
      <Text variant="label">
        {title} ({unit})
      </Text>
      {points.length === 0 ? (
        <Text tone="muted">No readings in the last 24 hours.</Text>
      ) : (
        <VictoryChart width={width} height={200} padding={PAD} domain={{ x: [fromMs, toMs], y: [low - margin, high + margin] }} standalone>
          <VictoryAxis
            crossAxis={false}
            orientation="bottom"
            offsetY={PAD.bottom}
            tickValues={hourTicks(fromMs, toMs, width < 520 ? 6 : 3)}
            tickFormat={(t: number) => hhmm(t)}
            label="Time (UTC)"
            style={timeAxisStyleOf(colors)}
          />
          <VictoryAxis
            dependentAxis
            crossAxis={false}
            tickCount={5}
            tickFormat={(t: number) => (Math.abs(t) >= 100 ? t.toFixed(0) : t.toFixed(1))}
            style={{
              axis: { stroke: 'transparent' },
              tickLabels: axisText,
              grid: { stroke: colors.border, strokeDasharray: '2,4' },
            }}
          />
          {shownLimit !== undefined
            ? [shownLimit, -shownLimit].map((y) => (
                <VictoryLine
                  key={y}
                  data={[
                    { x: fromMs, y },
                    { x: toMs, y },
                  ]}
                  style={{ data: { stroke: colors.signal, strokeWidth: 1.2, strokeDasharray: '5,4' } }}
                />
              ))
            : null}
          <VictoryLine data={points} style={{ data: { stroke: colour, strokeWidth: 2 } }} />
          {points.length < 3 ? <VictoryScatter data={points} size={3} style={{ data: { fill: colour } }} /> : null}
        </VictoryChart>
      )}
    </View>
  );
}

export default function HealthCharts({ series, nowMs, width, clockLimitMs }: HealthChartsProps) {
  const { colors } = useAppTheme();
  const fromMs = nowMs - 24 * HOUR_MS;
  const clock: Point[] = [];
  const temperature: Point[] = [];
  for (const point of series) {
    const x = Date.parse(point.at);
    if (!Number.isFinite(x)) continue;
    if (point.clockOffsetMs !== null) clock.push({ x, y: point.clockOffsetMs });
    if (point.temperatureC !== null) temperature.push({ x, y: point.temperatureC });
  }
  return (
    <View style={styles.wrap}>
      <SeriesChart
        title="Clock offset"
        unit="ms"
        points={clock}
        fromMs={fromMs}
        toMs={nowMs}
        width={width}
        colour={colors.primary}
        limit={clockLimitMs}
      />
      <SeriesChart title="Temperature" unit="°C" points={temperature} fromMs={fromMs} toMs={nowMs} width={width} colour={colors.signal} />
    </View>
  );
}

const styles = StyleSheet.create({
  wrap: { gap: space.lg },
  chart: { gap: space.xs },
});
