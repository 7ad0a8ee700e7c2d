import { StyleSheet, View } from 'react-native';

import { Text } from '../ui/text';
import { space } from '../ui/theme';
import { useAppTheme } from '../ui/theme-provider';
import { bandLabel } from './club-words';
import type { BandDuty } from './queries';

/** Per band over the next 24 hours: transmissions, minutes on air and the share of the day's 720 slots. */
export function DutyTable({ bands }: { bands: BandDuty[] }) {
  const { colors } = useAppTheme();
  return (
    <View style={[styles.table, { borderColor: colors.border }]}>
      <View style={[styles.row, { borderColor: colors.border }]}>
        {['Band', 'Sends', 'Minutes', 'Slots used'].map((title) => (
          <Text key={title} variant="caption" tone="muted" style={styles.cell}>
            {title}
          </Text>
        ))}
      </View>
      {bands.map((band) => (
        <View
          key={band.bandId}
          style={[styles.row, { borderColor: colors.border }]}
          accessibilityLabel={`${bandLabel(band.bandId)}: ${band.transmissions} transmissions, ${band.minutesOnAir} minutes, ${band.dutyPercent} percent of slots`}
        >
          <Text variant="mono" style={styles.cell}>
            {bandLabel(band.bandId)}
          </Text>
          <Text variant="mono" style={styles.cell}>
            {band.transmissions}
          </Text>
          <Text variant="mono" style={styles.cell}>
            {band.minutesOnAir}
          </Text>
          <View style={[styles.cell, styles.dutyCell]}>
            <Text variant="mono">{band.dutyPercent}%</Text>
            <View style={[styles.track, { backgroundColor: colors.primarySoft }]}>
              <View style={[styles.fill, { width: `${Math.min(100, band.dutyPercent)}%`, backgroundColor: colors.signal }]} />
            </View>
          </View>
        </View>
      ))}
    </View>
  );
}

const styles = StyleSheet.create({
  table: { borderTopWidth: 1 },
  row: { flexDirection: 'row', borderBottomWidth: 1, paddingVertical: space.sm, gap: space.sm },
  cell: { flex: 1, minWidth: 0 },
  dutyCell: { gap: 4 },
  track: { height: 4, borderRadius: 2, overflow: 'hidden' },
  fill: { height: 4 },
});
