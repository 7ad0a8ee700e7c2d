import { StyleSheet, View } from 'react-native';

import type { OneSideReceiver } from '@/shared/domain/reception/comparison';

import { formatKm } from '../receptions/format';
import { Card } from '../ui/card';
import { Heading } from '../ui/heading';
import { Text } from '../ui/text';
import { space } from '../ui/theme';

export type OneSideListProps = { title: string; receivers: OneSideReceiver[]; more: number };

/** Receivers that heard one side only: left out of the figures, listed so nothing is hidden. */
export function OneSideList({ title, receivers, more }: OneSideListProps) {
  return (
    <Card style={styles.card}>
      <Heading level={2}>{title}</Heading>
      {receivers.length === 0 ? (
        <Text tone="muted">None: every receiver of this side also heard the other.</Text>
      ) : (
        receivers.map((r) => (
          <View key={r.rxCallsign} style={styles.row}>
            <Text variant="mono" style={styles.callsign}>
              {r.rxCallsign}
            </Text>
            <Text tone="muted" style={styles.grow}>
              {r.rxLocator} · {formatKm(r.distanceKm)} · {r.reports} report{r.reports === 1 ? '' : 's'}
            </Text>
          </View>
        ))
      )}
      {more > 0 ? (
        <Text variant="caption" tone="muted">
          and {more} more
        </Text>
      ) : null}
    </Card>
  );
}

const styles = StyleSheet.create({
  card: { flexGrow: 1, flexBasis: 280, gap: space.xs },
  row: { flexDirection: 'row', flexWrap: 'wrap', gap: space.sm },
  callsign: { minWidth: 72 },
  grow: { flexShrink: 1 },
});
