import { StyleSheet, View } from 'react-native';

import { Card } from '../ui/card';
import { Text } from '../ui/text';
import { fonts, space } from '../ui/theme';

export type StationCountCardProps = { count: number | null; status: 'pending' | 'error' | 'success' };

export function StationCountCard({ count, status }: StationCountCardProps) {
  const figure = status === 'success' && count != null ? String(count) : status === 'error' ? '—' : '…';
  const caption =
    status === 'error' ? 'Your stations could not be loaded just now.' : count === 1 ? 'station registered' : 'stations registered';
  return (
    <Card style={styles.card}>
      <View style={styles.row}>
        <Text variant="display" tone="primary" style={styles.figure}>
          {figure}
        </Text>
        <Text tone="muted" style={styles.caption}>
          {caption}
        </Text>
      </View>
    </Card>
  );
}

const styles = StyleSheet.create({
  card: { flex: 1, minWidth: 220 },
  row: { flexDirection: 'row', alignItems: 'baseline', gap: space.md, flexWrap: 'wrap' },
  figure: { fontFamily: fonts.monoMedium },
  caption: { flexShrink: 1 },
});
