import { StyleSheet, View } from 'react-native';

import { Card } from '../ui/card';
import { Text } from '../ui/text';
import { space } from '../ui/theme';
import { useAppTheme } from '../ui/theme-provider';
import { Heading } from '../ui/heading';

const points = [
  'Transmit only while you hold a valid licence, and only with your own callsign.',
  'Never connect an antenna without the low-pass filter made for the band you are on.',
  'Keep to the power and bands your licence allows.',
  'Keep people clear of antennas while they radiate, and fuse the DC supply close to the battery or power unit.',
  'Outdoor antennas attract lightning: ground them, and disconnect before a storm.',
  'Your local licence conditions and good licensed practice always come first.',
];

/** A short reminder of the rules and risks that come with putting a beacon on the air. */
export function SafetyCard() {
  const { colors } = useAppTheme();
  return (
    <Card tone="signal" style={styles.card}>
      <Heading level={2}>Before you go on the air</Heading>
      <View style={styles.list}>
        {points.map((point) => (
          <View key={point} style={styles.item}>
            <View style={[styles.bullet, { backgroundColor: colors.signal }]} />
            <Text style={styles.itemText}>{point}</Text>
          </View>
        ))}
      </View>
    </Card>
  );
}

const styles = StyleSheet.create({
  card: { gap: space.md },
  list: { gap: space.sm },
  item: { flexDirection: 'row', gap: space.md, alignItems: 'flex-start' },
  bullet: { width: 6, height: 6, borderRadius: 3, marginTop: 9 },
  itemText: { flex: 1 },
});
