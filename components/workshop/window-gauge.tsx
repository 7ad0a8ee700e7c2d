import { useState } from 'react';
import { StyleSheet, View } from 'react-native';
import Svg, { Line, Path, Rect, Text as SvgText } from 'react-native-svg';

import { TONE_SPACING_HZ, WINDOW_HIGH_OFFSET_HZ, WINDOW_LOW_OFFSET_HZ, type WindowCheck } from '@/shared/domain';

import { Text } from '../ui/text';
import { fonts, space } from '../ui/theme';
import { useAppTheme } from '../ui/theme-provider';
import { formatValue } from '../ui/format';
import { TermInfo } from '../help/term-info';

export type WindowGaugeProps = {
  bandName: string;
  dialHz: number;
  /** where the four tones sit after calibration */
  window: WindowCheck;
  /** the unit's stated tolerance at this frequency, Hz (0 = disciplined) */
  toleranceHz: number;
  /** change for a 10 °C warm-up; null = the unit states no coefficient */
  warmUpDriftHz: number | null;
  /** the window after that drift, worst direction */
  driftedWindow: WindowCheck | null;
  calibrated: boolean;
};

const HEIGHT = 104;
const STRIP_TOP = 54;
const STRIP_HEIGHT = 22;
const LOUPE_TOP = 4;
const LOUPE_HEIGHT = 34;
const LOUPE_WIDTH = 132;
const LOUPE_SPAN_HZ = 14;
const MAX_OVERHANG_HZ = 120;

/** Which tones (0–3) are outside the window, in words: "tone 3 is 2.6 Hz above the window". */
export function tonesOutside(window: WindowCheck): string[] {
  return window.tonesHz.flatMap((toneHz, index) => {
    if (toneHz < window.windowLowHz) return [`tone ${index} is ${(window.windowLowHz - toneHz).toFixed(1)} Hz below the window`];
    if (toneHz > window.windowHighHz) return [`tone ${index} is ${(toneHz - window.windowHighHz).toFixed(1)} Hz above the window`];
    return [];
  });
}

/** True when the unit's tolerance spread around the tones reaches past either window edge. */
export function toleranceCrossesEdge(window: WindowCheck, dialHz: number, toleranceHz: number): boolean {
  if (toleranceHz <= 0) return false;
  const low = Math.min(...window.tonesHz) - dialHz - toleranceHz;
  const high = Math.max(...window.tonesHz) - dialHz + toleranceHz;
  return low < WINDOW_LOW_OFFSET_HZ || high > WINDOW_HIGH_OFFSET_HZ;
}

/** The gauge's verdict in one sentence; it never calls an uncalibrated band safe when the unit's tolerance could push a tone out. */
export function windowSummary(input: {
  bandName: string;
  window: WindowCheck;
  dialHz: number;
  toleranceHz: number;
  calibrated: boolean;
}): string {
  const { bandName, window, dialHz, toleranceHz, calibrated } = input;
  const outside = tonesOutside(window);
  if (outside.length > 0)
    return `Warning: ${outside.join('; ')}. Receivers will not decode it: calibrate this band or change the audio offset.`;
  if (!calibrated && toleranceCrossesEdge(window, dialHz, toleranceHz))
    return `The four tones are planned inside the ${bandName} window, but the unit’s ±${toleranceHz.toFixed(1)} Hz tolerance could put them outside it: calibrate this band first.`;
  return `All four tones are inside the ${bandName} window, ${formatValue(window.marginHz, 1, 'Hz')} from the nearest edge${
    calibrated ? '' : ' (even at the edge of the unit’s tolerance)'
  }.`;
}

/**
 * The receive window of one band (dial + 1400 … 1600 Hz) as a strip with the four tones in it, a loupe that
 * spreads the tones apart, the unit's uncalibrated spread as a faint band and the warm-up drift as a bracket.
 */
export function WindowGauge({ bandName, dialHz, window, toleranceHz, warmUpDriftHz, driftedWindow, calibrated }: WindowGaugeProps) {
  const { colors } = useAppTheme();
  const [width, setWidth] = useState(320);
  const inside = tonesOutside(window).length === 0;
  const toneColor = inside ? colors.primary : colors.danger;
  const atRisk = inside && !calibrated && toleranceCrossesEdge(window, dialHz, toleranceHz);

  // offsets from the dial, Hz
  const tones = window.tonesHz.map((f) => f - dialHz);
  const lowTone = Math.min(...tones);
  const highTone = Math.max(...tones);
  const lo = Math.max(WINDOW_LOW_OFFSET_HZ - MAX_OVERHANG_HZ, Math.min(WINDOW_LOW_OFFSET_HZ - 6, lowTone - 6));
  const hi = Math.min(WINDOW_HIGH_OFFSET_HZ + MAX_OVERHANG_HZ, Math.max(WINDOW_HIGH_OFFSET_HZ + 6, highTone + 6));
  const pad = 12;
  const x = (hz: number) => pad + ((Math.min(hi, Math.max(lo, hz)) - lo) / (hi - lo)) * (width - 2 * pad);

  const groupCentre = (lowTone + highTone) / 2;
  const loupeLeft = Math.min(width - pad - LOUPE_WIDTH, Math.max(pad, x(groupCentre) - LOUPE_WIDTH / 2));
  const loupeX = (hz: number) => loupeLeft + 6 + ((hz - (groupCentre - LOUPE_SPAN_HZ / 2)) / LOUPE_SPAN_HZ) * (LOUPE_WIDTH - 12);
  const inLoupe = (hz: number) => Math.abs(hz - groupCentre) <= LOUPE_SPAN_HZ / 2;

  const spreadLow = lowTone - toleranceHz;
  const spreadHigh = highTone + toleranceHz;
  const drift = warmUpDriftHz === null ? null : Math.abs(warmUpDriftHz);
  const driftInside = driftedWindow ? driftedWindow.inside : null;

  const summary = windowSummary({ bandName, window, toleranceHz, calibrated, dialHz });
  const driftText =
    drift === null
      ? 'Warm-up drift: the unit states no temperature coefficient, so the drift for a 10 °C warm-up is unknown.'
      : drift === 0
        ? 'Warm-up drift: none expected (TCXO or GPS-disciplined reference).'
        : `Warm-up drift for 10 °C: ±${drift.toFixed(1)} Hz; ${
            driftInside
              ? `the tones stay inside (${formatValue(driftedWindow!.marginHz, 1, 'Hz')} to spare).`
              : 'the tones would leave the window once the board warms up.'
          }`;

  return (
    <View style={styles.wrap}>
      <View
        onLayout={(event) => setWidth(Math.max(200, Math.round(event.nativeEvent.layout.width)))}
        accessibilityRole="image"
        accessibilityLabel={`${bandName} window gauge. ${summary}`}
      >
        <Svg width={width} height={HEIGHT}>
          {/* uncalibrated spread: where the tones could be from the unit's tolerance */}
          {toleranceHz > 0 ? (
            <Rect
              x={x(spreadLow)}
              y={STRIP_TOP - 6}
              width={Math.max(2, x(spreadHigh) - x(spreadLow))}
              height={STRIP_HEIGHT + 12}
              fill={colors.signal}
              opacity={calibrated ? 0.1 : 0.2}
              rx={4}
            />
          ) : null}
          {/* the strip outside the window, then the window */}
          <Rect
            x={pad}
            y={STRIP_TOP}
            width={width - 2 * pad}
            height={STRIP_HEIGHT}
            fill={colors.background}
            stroke={colors.border}
            rx={4}
          />
          <Rect
            x={x(WINDOW_LOW_OFFSET_HZ)}
            y={STRIP_TOP}
            width={x(WINDOW_HIGH_OFFSET_HZ) - x(WINDOW_LOW_OFFSET_HZ)}
            height={STRIP_HEIGHT}
            fill={colors.primarySoft}
            stroke={colors.primary}
            strokeWidth={1}
          />
          {[1450, 1500, 1550].map((hz) => (
            <Line
              key={hz}
              x1={x(hz)}
              x2={x(hz)}
              y1={STRIP_TOP + STRIP_HEIGHT - 5}
              y2={STRIP_TOP + STRIP_HEIGHT}
              stroke={colors.primary}
              opacity={0.5}
            />
          ))}
          {/* the tone group on the strip */}
          {tones.map((hz, index) => (
            <Line
              key={index}
              x1={x(hz)}
              x2={x(hz)}
              y1={STRIP_TOP - 2}
              y2={STRIP_TOP + STRIP_HEIGHT + 2}
              stroke={toneColor}
              strokeWidth={1.5}
            />
          ))}
          {/* warm-up drift bracket under the strip */}
          {drift ? (
            <Path
              d={`M${x(lowTone - drift)} ${STRIP_TOP + STRIP_HEIGHT + 6} v4 H${x(highTone + drift)} v-4`}
              stroke={driftInside === false ? colors.danger : colors.signal}
              strokeWidth={1.5}
              fill="none"
            />
          ) : null}
          {/* loupe: the four tones spread apart, with any window edge near them */}
          <Path
            d={`M${loupeLeft} ${LOUPE_TOP + LOUPE_HEIGHT} L${x(lowTone)} ${STRIP_TOP - 2} M${loupeLeft + LOUPE_WIDTH} ${LOUPE_TOP + LOUPE_HEIGHT} L${x(highTone)} ${STRIP_TOP - 2}`}
            stroke={colors.border}
            strokeWidth={1}
          />
          <Rect
            x={loupeLeft}
            y={LOUPE_TOP}
            width={LOUPE_WIDTH}
            height={LOUPE_HEIGHT}
            fill={colors.surfaceRaised}
            stroke={colors.border}
            rx={6}
          />
          {[WINDOW_LOW_OFFSET_HZ, WINDOW_HIGH_OFFSET_HZ].filter(inLoupe).map((edge) => (
            <Rect
              key={edge}
              x={edge === WINDOW_LOW_OFFSET_HZ ? loupeLeft + 1 : loupeX(edge)}
              y={LOUPE_TOP + 1}
              width={
                edge === WINDOW_LOW_OFFSET_HZ
                  ? Math.max(0, loupeX(edge) - loupeLeft - 1)
                  : Math.max(0, loupeLeft + LOUPE_WIDTH - 1 - loupeX(edge))
              }
              height={LOUPE_HEIGHT - 2}
              fill={colors.dangerSoft}
            />
          ))}
          {tones.map((hz, index) => (
            <Line
              key={index}
              x1={loupeX(hz)}
              x2={loupeX(hz)}
              y1={LOUPE_TOP + 6}
              y2={LOUPE_TOP + LOUPE_HEIGHT - 14}
              stroke={
                window.tonesHz[index] < window.windowLowHz || window.tonesHz[index] > window.windowHighHz ? colors.danger : colors.primary
              }
              strokeWidth={3}
              strokeLinecap="round"
            />
          ))}
          <SvgText
            x={loupeLeft + LOUPE_WIDTH / 2}
            y={LOUPE_TOP + LOUPE_HEIGHT - 4}
            fontSize={9}
            fill={colors.textMuted}
            textAnchor="middle"
            fontFamily={fonts.mono}
          >
            {`4 tones · ${(TONE_SPACING_HZ * 3).toFixed(2)} Hz`}
          </SvgText>
          {/* axis: offsets above the dial */}
          {[WINDOW_LOW_OFFSET_HZ, 1500, WINDOW_HIGH_OFFSET_HZ].map((hz, index) => (
            <SvgText
              key={hz}
              x={x(hz)}
              y={HEIGHT - 6}
              fontSize={11}
              fill={colors.textMuted}
              textAnchor={index === 0 ? 'start' : index === 2 ? 'end' : 'middle'}
              fontFamily={fonts.mono}
            >
              {`+${hz}`}
            </SvgText>
          ))}
        </Svg>
      </View>
      <Text variant="label" tone={inside && !atRisk ? 'default' : 'danger'} accessibilityRole={inside ? undefined : 'alert'}>
        {summary}
      </Text>
      <View style={styles.legend}>
        <View style={styles.legendHead}>
          <Text variant="caption" tone="muted">
            The window: the 200 Hz above the dial that receivers decode.
          </Text>
          <TermInfo term="window" />
        </View>
        <Text variant="caption" tone="muted" style={styles.legendItem}>
          {toleranceHz > 0
            ? `Shaded: ±${toleranceHz.toFixed(1)} Hz, where the tones could sit from the unit’s ±ppm tolerance${calibrated ? ' before calibration' : ' (this band is not calibrated yet)'}.`
            : 'Disciplined reference: no tolerance spread.'}
        </Text>
        <Text variant="caption" tone={driftInside === false ? 'danger' : 'muted'} style={styles.legendItem}>
          {driftText}
        </Text>
      </View>
    </View>
  );
}

const styles = StyleSheet.create({
  wrap: { gap: space.sm },
  legend: { gap: 2 },
  legendHead: { flexDirection: 'row', alignItems: 'center', flexWrap: 'wrap' },
  legendItem: {},
});
