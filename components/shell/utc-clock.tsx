import { StyleSheet, View } from 'react-native';

import { Text } from '../ui/text';
import { fonts, radius, space } from '../ui/theme';
import { useAppTheme } from '../ui/theme-provider';
import { useTickingClock } from '../ui/use-ticking-clock';
import { readSlotClock } from './slot-clock';

export type UtcClockProps = {
  /** Where the time comes from; tests pass a fixed or stepped clock. */
  now?: () => number;
  /** `strip`: one compact block for the phone header; `panel`: a boxed block for the side rail. */
  variant?: 'strip' | 'panel';
};

/** Live UTC time and the countdown to the next two-minute slot, updated every second. */
export function UtcClock({ now = Date.now, variant = 'strip' }: UtcClockProps) {
  const { colors } = useAppTheme();
  const nowMs = useTickingClock(1000, now);
  const reading = readSlotClock(nowMs);
  const progress = 1 - reading.secondsToNextSlot / 120;
  const panel = variant === 'panel';
  return (
    <View
      accessibilityRole="timer"
      accessibilityLabel={`Time ${reading.utc}, next slot in ${reading.countdown}`}
      style={[panel ? styles.panel : styles.strip, panel && { backgroundColor: colors.surfaceRaised, borderColor: colors.border }]}
    >
      <Text variant={panel ? 'monoLarge' : 'mono'} style={styles.time} accessibilityElementsHidden>
        {reading.utc}
      </Text>
      <Text variant="caption" tone="signal" style={styles.countdown}>
        next slot in{' '}
        <Text variant="caption" style={[styles.mono, { color: colors.signal }]}>
          {reading.countdown}
        </Text>
      </Text>
      {panel ? (
        <View style={[styles.track, { backgroundColor: colors.border }]}>
          <View style={[styles.fill, { backgroundColor: colors.signal, width: `${Math.round(progress * 100)}%` }]} />
        </View>
      ) : null}
    </View>
  );
}

const styles = StyleSheet.create({
  strip: { alignItems: 'flex-end' },
  panel: { borderWidth: 1, borderRadius: radius.md, padding: space.md, gap: 2 },
  time: { fontVariant: ['tabular-nums'] },
  countdown: {},
  mono: { fontFamily: fonts.monoMedium },
  track: { height: 3, borderRadius: 2, marginTop: space.sm, overflow: 'hidden' },
  fill: { height: 3 },
});
