import { StyleSheet, View } from 'react-native';

import type { BandId } from '@/shared/domain';

import { Card } from '../ui/card';
import { Text } from '../ui/text';
import { fonts, radius, space } from '../ui/theme';
import { useAppTheme } from '../ui/theme-provider';
import { useTickingClock } from '../ui/use-ticking-clock';
import { formatCountdown, formatMHz, formatUtcTime } from '../ui/format';
import { bandName } from './schedule-words';
import { Heading } from '../ui/heading';
import { List, ListItem } from '../ui/list';

export type UpcomingTransmission = {
  startMs: number;
  bandId: BandId;
  carrierHz: number;
  audioOffsetHz: number;
  messageText: string;
};

export type NextTransmissionsProps = {
  transmissions: readonly UpcomingTransmission[];
  /** Where the time comes from; tests pass a fixed clock. */
  now?: () => number;
  /** How many to list. */
  count?: number;
  /** Shown when nothing is coming (paused, suspended, outside the dates…). */
  quietMessage?: string;
};

/** The next transmissions as the server planned them, with a live countdown to the first. */
export function NextTransmissions({ transmissions, now = Date.now, count = 6, quietMessage }: NextTransmissionsProps) {
  const { colors } = useAppTheme();
  const nowMs = useTickingClock(1000, now);
  // a transmission stays "next" until it has started
  const coming = transmissions.filter((t) => t.startMs > nowMs).slice(0, count);
  const first = coming[0];
  return (
    <Card>
      <Heading level={2}>Next transmissions</Heading>
      {first ? (
        <View
          accessibilityRole="timer"
          accessibilityLabel={`Next transmission in ${formatCountdown(first.startMs - nowMs)}, at ${formatUtcTime(first.startMs)} on ${bandName(first.bandId)}`}
          style={[styles.countdown, { backgroundColor: colors.signalSoft, borderColor: colors.signal }]}
        >
          <Text variant="label">Next transmission in</Text>
          <Text variant="monoLarge" style={[styles.figure, { color: colors.signal }]}>
            {formatCountdown(first.startMs - nowMs)}
          </Text>
          <Text variant="caption" tone="muted">
            at {formatUtcTime(first.startMs)} on {bandName(first.bandId)}
          </Text>
        </View>
      ) : (
        <Text tone="muted">{quietMessage ?? 'Nothing is planned in the next 24 hours.'}</Text>
      )}
      {coming.length ? (
        <List style={styles.list}>
          {coming.map((t) => (
            <ListItem
              key={`${t.startMs}-${t.bandId}`}
              aria-label={`${formatUtcTime(t.startMs)}, ${bandName(t.bandId)}, ${t.messageText}`}
              style={[styles.row, { borderColor: colors.border }]}
            >
              <Text variant="mono" style={styles.time}>
                {formatUtcTime(t.startMs)}
              </Text>
              <Text variant="label" style={styles.band}>
                {bandName(t.bandId)}
              </Text>
              <View style={styles.detail}>
                <Text variant="caption" style={styles.monoCaption}>
                  {formatMHz(t.carrierHz)}
                </Text>
                <Text variant="caption" tone="muted" numberOfLines={1}>
                  offset {Math.round(t.audioOffsetHz * 10) / 10} Hz · {t.messageText}
                </Text>
              </View>
            </ListItem>
          ))}
        </List>
      ) : null}
    </Card>
  );
}

const styles = StyleSheet.create({
  countdown: { borderWidth: 1, borderLeftWidth: 4, borderRadius: radius.md, padding: space.md, gap: 2 },
  figure: { fontVariant: ['tabular-nums'], fontSize: 28, lineHeight: 34 },
  list: { gap: 0 },
  row: { flexDirection: 'row', alignItems: 'center', gap: space.md, paddingVertical: space.sm, borderTopWidth: 1 },
  time: { width: 92, fontVariant: ['tabular-nums'] },
  band: { width: 48 },
  detail: { flex: 1, minWidth: 0 },
  monoCaption: { fontFamily: fonts.mono },
});
