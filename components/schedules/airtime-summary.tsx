import { StyleSheet, View } from 'react-native';

import type { BandId } from '@/shared/domain';
import { airtimeByDay, effectiveDuty, type PlannedTransmission } from '@/shared/domain/schedule';

import { Card } from '../ui/card';
import { Text } from '../ui/text';
import { space } from '../ui/theme';
import { useAppTheme } from '../ui/theme-provider';
import { bandName, byFrequency, formatMinutes, formatPercent } from './schedule-words';
import { Heading } from '../ui/heading';
import { List, ListItem } from '../ui/list';

export type AirtimeSummaryProps = {
  /** A plan over whole UTC days: its transmissions and slot counts. */
  plan: {
    transmissions: readonly Pick<PlannedTransmission, 'startMs' | 'bandId'>[];
    slotsInSchedule: number;
    usableSlots: number;
  };
  /** The UTC days covered, YYYY-MM-DD, in order (days without transmissions still get a column). */
  days: readonly string[];
};

const MONTHS = ['Jan', 'Feb', 'Mar', 'Apr', 'May', 'Jun', 'Jul', 'Aug', 'Sep', 'Oct', 'Nov', 'Dec'];
const shortDay = (date: string) => `${Number(date.slice(8, 10))} ${MONTHS[Number(date.slice(5, 7)) - 1]}`;

/** Minutes on the air per band and UTC day, and the share of slots the plan really uses. */
export function AirtimeSummary({ plan, days }: AirtimeSummaryProps) {
  const { colors } = useAppTheme();
  const rows = airtimeByDay(plan.transmissions as PlannedTransmission[]);
  const bands: BandId[] = byFrequency(rows.map((r) => r.bandId));
  const cell = (date: string, bandId: BandId) => rows.find((r) => r.dateUtc === date && r.bandId === bandId);
  const duty = effectiveDuty({
    ...plan,
    transmissions: plan.transmissions as PlannedTransmission[],
    messages: [],
    skippedSteps: [],
    warnings: [],
    quiet: [],
  });
  return (
    <Card>
      <Heading level={2}>Time on the air</Heading>
      <Text variant="caption" tone="muted">
        Minutes of signal per band and UTC day (each transmission lasts about 1.8 minutes).
      </Text>
      {bands.length ? (
        <List style={[styles.table, { borderColor: colors.border }]}>
          {/* the column heads are for the eye: each row's label already names its days */}
          <View style={[styles.row, { borderColor: colors.border }]} aria-hidden>
            <Text variant="caption" tone="muted" style={styles.bandCol}>
              Band
            </Text>
            {days.map((date) => (
              <Text key={date} variant="caption" tone="muted" style={styles.dayCol} accessibilityLabel={`${date} UTC`}>
                {shortDay(date)}
              </Text>
            ))}
          </View>
          {bands.map((bandId) => (
            <ListItem
              key={bandId}
              style={[styles.row, { borderColor: colors.border }]}
              aria-label={`${bandName(bandId)}: ${days
                .map((date) => `${date} ${formatMinutes(cell(date, bandId)?.minutesOnAir ?? 0)}`)
                .join(', ')}`}
            >
              <Text variant="label" style={styles.bandCol}>
                {bandName(bandId)}
              </Text>
              {days.map((date) => {
                const found = cell(date, bandId);
                return (
                  <View key={date} style={styles.dayCol}>
                    <Text variant="mono">{formatMinutes(found?.minutesOnAir ?? 0)}</Text>
                    <Text variant="caption" tone="muted">
                      {found?.transmissions ?? 0}×
                    </Text>
                  </View>
                );
              })}
            </ListItem>
          ))}
        </List>
      ) : (
        <Text tone="muted">No time on the air in these days.</Text>
      )}
      <View style={styles.duty}>
        <View style={styles.dutyItem} accessibilityLabel={`Effective duty cycle ${formatPercent(duty.ofAllSlots)} of all slots`}>
          <Text variant="caption" tone="muted">
            Effective duty cycle
          </Text>
          <Text variant="monoLarge" tone="primary">
            {formatPercent(duty.ofAllSlots)}
          </Text>
          <Text variant="caption" tone="muted">
            of all slots
          </Text>
        </View>
        <View style={styles.dutyItem} accessibilityLabel={`${formatPercent(duty.ofUsableSlots)} of the slots in the active hours`}>
          <Text variant="caption" tone="muted">
            In the active hours
          </Text>
          <Text variant="monoLarge">{formatPercent(duty.ofUsableSlots)}</Text>
          <Text variant="caption" tone="muted">
            of the slots a step may use
          </Text>
        </View>
      </View>
    </Card>
  );
}

const styles = StyleSheet.create({
  table: { borderTopWidth: 1 },
  row: { flexDirection: 'row', alignItems: 'center', paddingVertical: space.sm, borderBottomWidth: 1, gap: space.sm },
  bandCol: { width: 56 },
  dayCol: { flex: 1, minWidth: 0 },
  duty: { flexDirection: 'row', flexWrap: 'wrap', gap: space.xl, marginTop: space.sm },
  dutyItem: { gap: 2, minWidth: 130 },
});
