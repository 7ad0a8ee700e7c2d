import { StyleSheet, View } from 'react-native';
import { VictoryAxis, VictoryBar, VictoryChart, VictoryStack } from 'victory-native';

import { Text } from '../ui/text';
import { fonts, radius, space } from '../ui/theme';
import { useAppTheme } from '../ui/theme-provider';
import { bandLabel } from './club-words';
import type { ClubOccupancy } from './queries';

export type OccupancyChartProps = { data: ClubOccupancy; width: number };

/** Band colours: teal and amber steps of the palette, then muted inks. */
export function bandColours(scheme: { primary: string; signal: string; textMuted: string }): string[] {
  return [scheme.primary, scheme.signal, '#6C8FB8', '#8E6FA8', '#6E9A4E', scheme.textMuted, '#B07A8C', '#4F8F8A'];
}

/**
 * Transmissions per band in each UTC hour of the next 24 hours, stacked by band. Loaded lazily by its route
 * (the chart library is large), so it is this file's default export too.
 */
export function OccupancyChart({ data, width }: OccupancyChartProps) {
  const { colors } = useAppTheme();
  const bands = data.bands.map((band) => band.bandId);
  const palette = bandColours(colors);
  const hours = data.hoursUtc.slice(0, 24);
  const series = bands.map((bandId) =>
    hours.map((_hour, hourIndex) => ({
      x: hourIndex,
      y: data.cells.find((cell) => cell.bandId === bandId && cell.hourIndex === hourIndex)?.transmissions ?? 0,
    })),
  );
  const tick = (index: number) => {
    const iso = hours[index];
    return iso ? `${iso.slice(11, 13)}` : '';
  };
  const chartWidth = Math.max(300, width);
  // the y-axis reaches a round number at or above the tallest stacked bar, with ticks every step
  const tallest = Math.max(1, ...hours.map((_hour, index) => series.reduce((sum, points) => sum + points[index].y, 0)));
  const step = tallest <= 10 ? 2 : tallest <= 25 ? 5 : tallest <= 50 ? 10 : Math.ceil(tallest / 50) * 10;
  const top = Math.ceil(tallest / step) * step;
  const yTicks = Array.from({ length: top / step + 1 }, (_v, i) => i * step);
  const axisStyle = {
    axis: { stroke: colors.border },
    grid: { stroke: 'transparent' },
    ticks: { stroke: colors.border, size: 4 },
    tickLabels: { fill: colors.textMuted, fontFamily: fonts.mono, fontSize: 11, padding: 4 },
    axisLabel: { fill: colors.textMuted, fontFamily: fonts.regular, fontSize: 12, padding: 30 },
  };
  return (
    <View
      accessibilityRole="image"
      accessibilityLabel={`Transmissions per UTC hour over the next 24 hours on ${bands.map(bandLabel).join(', ')}`}
      style={styles.wrap}
    >
      <VictoryChart
        width={chartWidth}
        height={240}
        padding={{ top: 14, bottom: 46, left: 48, right: 12 }}
        domain={{ y: [0, top] }}
        domainPadding={{ x: 14 }}
      >
        <VictoryAxis
          tickValues={hours.map((_hour, index) => index).filter((index) => index % (chartWidth < 500 ? 4 : 2) === 0)}
          tickFormat={tick}
          label="Hour (UTC)"
          style={axisStyle}
        />
        <VictoryAxis
          dependentAxis
          tickValues={yTicks}
          label="Transmissions"
          style={{ ...axisStyle, grid: { stroke: colors.border, strokeDasharray: '2,4' } }}
        />
        <VictoryStack>
          {series.map((points, index) => (
            <VictoryBar key={bands[index]} data={points} barRatio={0.8} style={{ data: { fill: palette[index % palette.length] } }} />
          ))}
        </VictoryStack>
      </VictoryChart>
      <View style={styles.legend}>
        {bands.map((bandId, index) => (
          <View key={bandId} style={styles.legendItem}>
            <View style={[styles.swatch, { backgroundColor: palette[index % palette.length] }]} />
            <Text variant="caption">{bandLabel(bandId)}</Text>
          </View>
        ))}
      </View>
    </View>
  );
}

export default OccupancyChart;

const styles = StyleSheet.create({
  wrap: { gap: space.sm },
  legend: { flexDirection: 'row', flexWrap: 'wrap', gap: space.md, paddingHorizontal: space.xs },
  legendItem: { flexDirection: 'row', alignItems: 'center', gap: space.xs },
  swatch: { width: 12, height: 12, borderRadius: radius.sm / 2 },
});
