/**
 * The results screen's two charts, drawn with react-native-svg: reports by UTC hour as one heat strip
 * per band (small multiples sharing the hour axis), and SNR against distance. Loaded lazily through
 * charts/all-charts.ts.
 */
import { StyleSheet, View } from 'react-native';
import Svg, { Circle, G, Line, Rect, Text as SvgText } from 'react-native-svg';

import type { HourBandCount, Reach } from '@/shared/api/receptions';
import type { BandId } from '@/shared/domain/bands';

import { Text } from '../ui/text';
import { fonts, space } from '../ui/theme';
import { useAppTheme } from '../ui/theme-provider';
import { bandColour, sortBands } from './colours';
import { bandName, formatCount } from './format';
import { Heading } from '../ui/heading';

export type ReceptionChartsProps = { hourBand: HourBandCount[]; snrByDistance: Reach['snrByDistance']; width: number };

const LABEL_W = 52;
const TOTAL_W = 54;
const STRIP_H = 22;
const STRIP_GAP = 6;
const hh = (hour: number) => `${String(hour).padStart(2, '0')}`;

function busiestHour(counts: number[]): number {
  return counts.reduce((best, value, hour) => (value > counts[best]! ? hour : best), 0);
}

/** `20 m: 500 reports, busiest 14–15 UTC`: the strip in words, for screen readers and the caption. */
function stripSummary(band: BandId, hours: number[]): string {
  const total = hours.reduce((a, b) => a + b, 0);
  const peak = busiestHour(hours);
  return `${bandName(band)}: ${formatCount(total)} reports, busiest ${hh(peak)}–${hh((peak + 1) % 24)} UTC`;
}

export function HourBandChart({ hourBand, width }: { hourBand: HourBandCount[]; width: number }) {
  const { colors } = useAppTheme();
  const bands = sortBands(hourBand.map((c) => c.bandId));
  const counts = new Map<BandId, number[]>(bands.map((b) => [b, Array<number>(24).fill(0)]));
  for (const { hour, bandId, reports } of hourBand) counts.get(bandId)![hour] = (counts.get(bandId)![hour] ?? 0) + reports;
  const max = Math.max(1, ...hourBand.map((c) => c.reports));
  const cellW = Math.max(6, (width - LABEL_W - TOTAL_W) / 24);
  const height = bands.length * (STRIP_H + STRIP_GAP) + 22;
  const summary = bands.map((band) => stripSummary(band, counts.get(band)!)).join('; ');
  return (
    <View style={styles.chart}>
      <Heading level={2}>When each band was heard (UTC hour)</Heading>
      <Text variant="caption" tone="muted">
        One strip per band; the deeper the colour, the more reports in that hour.
      </Text>
      <Svg width={width} height={height} accessibilityRole="image" accessibilityLabel={`Reports by UTC hour and band. ${summary}`}>
        {bands.map((band, row) => {
          const hours = counts.get(band)!;
          const total = hours.reduce((a, b) => a + b, 0);
          const y = row * (STRIP_H + STRIP_GAP);
          return (
            <G key={band}>
              <SvgText x={0} y={y + STRIP_H - 6} fontSize={13} fontFamily={fonts.medium} fill={colors.text}>
                {bandName(band)}
              </SvgText>
              <Rect x={LABEL_W} y={y} width={cellW * 24} height={STRIP_H} rx={4} fill={colors.surfaceRaised} stroke={colors.border} />
              {hours.map((value, hour) =>
                value > 0 ? (
                  <Rect
                    key={hour}
                    x={LABEL_W + hour * cellW + 0.5}
                    y={y + 1}
                    width={cellW - 1}
                    height={STRIP_H - 2}
                    rx={2}
                    fill={bandColour(band)}
                    fillOpacity={0.18 + 0.82 * Math.sqrt(value / max)}
                  />
                ) : null,
              )}
              <SvgText x={LABEL_W + cellW * 24 + 6} y={y + STRIP_H - 6} fontSize={12} fontFamily={fonts.mono} fill={colors.textMuted}>
                {formatCount(total)}
              </SvgText>
            </G>
          );
        })}
        {[0, 6, 12, 18, 24].map((hour) => (
          <G key={hour}>
            <Line
              x1={LABEL_W + hour * cellW}
              x2={LABEL_W + hour * cellW}
              y1={0}
              y2={height - 18}
              stroke={colors.textMuted}
              strokeOpacity={0.35}
              strokeDasharray="2 3"
            />
            <SvgText
              x={LABEL_W + hour * cellW}
              y={height - 4}
              fontSize={11}
              fontFamily={fonts.mono}
              fill={colors.textMuted}
              textAnchor={hour === 24 ? 'end' : hour === 0 ? 'start' : 'middle'}
            >
              {`${hh(hour)}:00`}
            </SvgText>
          </G>
        ))}
      </Svg>
      <Text variant="caption" tone="muted">
        {summary}
      </Text>
    </View>
  );
}

const PAD = { top: 10, right: 12, bottom: 38, left: 46 };

function niceStep(span: number, count: number): number {
  const raw = span / count;
  const power = 10 ** Math.floor(Math.log10(raw));
  return [1, 2, 2.5, 5, 10].map((m) => m * power).find((s) => s >= raw) ?? raw;
}

export function SnrDistanceChart({ points, width }: { points: Reach['snrByDistance']; width: number }) {
  const { colors } = useAppTheme();
  const height = Math.round(Math.min(300, Math.max(200, width * 0.5)));
  const maxKm = Math.max(1000, ...points.map((p) => p.distanceKm));
  const kmStep = niceStep(maxKm, width < 420 ? 3 : 5);
  const kmTop = Math.ceil(maxKm / kmStep) * kmStep;
  const snrLow = Math.min(-30, ...points.map((p) => Math.floor(p.snrDb / 5) * 5));
  const snrHigh = Math.max(5, ...points.map((p) => Math.ceil(p.snrDb / 5) * 5));
  const plotW = width - PAD.left - PAD.right;
  const plotH = height - PAD.top - PAD.bottom;
  const x = (km: number) => PAD.left + (km / kmTop) * plotW;
  const y = (db: number) => PAD.top + ((snrHigh - db) / (snrHigh - snrLow)) * plotH;
  const kmTicks = Array.from({ length: Math.round(kmTop / kmStep) + 1 }, (_, i) => i * kmStep);
  const dbTicks: number[] = [];
  for (let db = snrLow; db <= snrHigh; db += 10) dbTicks.push(db);
  return (
    <View style={styles.chart}>
      <Heading level={2}>SNR against distance</Heading>
      <Text variant="caption" tone="muted">
        One dot per receiver and band, at its best SNR.
      </Text>
      <Svg width={width} height={height} accessibilityLabel={`SNR against distance for ${points.length} receiver and band pairs`}>
        {dbTicks.map((db) => (
          <G key={`y${db}`}>
            <Line x1={PAD.left} x2={width - PAD.right} y1={y(db)} y2={y(db)} stroke={colors.border} />
            <SvgText x={PAD.left - 6} y={y(db) + 4} fontSize={11} fontFamily={fonts.mono} fill={colors.textMuted} textAnchor="end">
              {db > 0 ? `+${db}` : db < 0 ? `−${-db}` : '0'}
            </SvgText>
          </G>
        ))}
        {kmTicks.map((km) => (
          <SvgText
            key={`x${km}`}
            x={x(km)}
            y={height - 22}
            fontSize={11}
            fontFamily={fonts.mono}
            fill={colors.textMuted}
            textAnchor="middle"
          >
            {formatCount(km)}
          </SvgText>
        ))}
        <SvgText
          x={PAD.left + plotW / 2}
          y={height - 4}
          fontSize={12}
          fontFamily={fonts.regular}
          fill={colors.textMuted}
          textAnchor="middle"
        >
          distance (km)
        </SvgText>
        <SvgText x={4} y={PAD.top + 2} fontSize={12} fontFamily={fonts.regular} fill={colors.textMuted}>
          dB
        </SvgText>
        {points.map((p, i) => (
          <Circle key={i} cx={x(p.distanceKm)} cy={y(p.snrDb)} r={3.5} fill={bandColour(p.bandId)} fillOpacity={0.8} />
        ))}
      </Svg>
    </View>
  );
}

export default function ReceptionCharts({ hourBand, snrByDistance, width }: ReceptionChartsProps) {
  return (
    <View style={styles.root}>
      <HourBandChart hourBand={hourBand} width={width} />
      <SnrDistanceChart points={snrByDistance} width={width} />
    </View>
  );
}

const styles = StyleSheet.create({
  root: { gap: space.xl },
  chart: { gap: space.xs },
});
