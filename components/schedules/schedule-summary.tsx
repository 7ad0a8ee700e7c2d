import { StyleSheet, View } from 'react-native';

import type { Schedule, Station } from '@/shared/schemas';

import { Button } from '../ui/button';
import { Card } from '../ui/card';
import { Text } from '../ui/text';
import { radius, space } from '../ui/theme';
import { useAppTheme } from '../ui/theme-provider';
import { bandName, cadenceLabel, hoursLabel } from './schedule-words';
import { ScreenTitle } from '../ui/screen-title';
import { List, ListItem } from '../ui/list';

export type ScheduleSummaryProps = {
  schedule: Schedule;
  station: Station;
  /** Owner actions; left out when a club admin looks at a member's station. */
  onEdit?: () => void;
  onPause?: () => void;
  onResume?: () => void;
  onDelete?: () => void;
  busy?: boolean;
  error?: string;
};

/** The saved rotation in words, whether it is on the air, and the owner's controls. */
export function ScheduleSummary({ schedule, station, onEdit, onPause, onResume, onDelete, busy, error }: ScheduleSummaryProps) {
  const { colors } = useAppTheme();
  const state = station.suspension ? 'suspended' : schedule.paused ? 'paused' : 'running';
  const look = {
    running: { bg: colors.primarySoft, border: colors.primary, title: 'Running', text: 'The rotation goes on the air as planned below.' },
    paused: {
      bg: colors.signalSoft,
      border: colors.signal,
      title: 'Paused',
      text: 'Nothing goes on the air until you resume the schedule.',
    },
    suspended: {
      bg: colors.dangerSoft,
      border: colors.danger,
      title: 'Suspended by a club admin',
      text: `Nothing goes on the air until the suspension is lifted${station.suspension?.reason ? `: ${station.suspension.reason}` : '.'}`,
    },
  }[state];
  return (
    <Card>
      <View style={styles.head}>
        <View style={styles.title}>
          <Text variant="caption" tone="muted">
            Schedule
          </Text>
          <ScreenTitle>{schedule.name}</ScreenTitle>
        </View>
        <View
          accessibilityRole="summary"
          accessibilityLabel={`Schedule status: ${look.title}`}
          style={[styles.status, { backgroundColor: look.bg, borderColor: look.border }]}
        >
          <View style={[styles.dot, { backgroundColor: look.border }]} />
          <Text variant="label">{look.title}</Text>
        </View>
      </View>
      <Text tone="muted">{look.text}</Text>

      <List style={styles.steps}>
        {schedule.steps.map((step, i) => (
          <ListItem
            key={i}
            style={[styles.step, { borderColor: colors.border }]}
            aria-label={`Step ${i + 1}: ${bandName(step.bandId)}, ${step.slots} slots, ${hoursLabel(step.activeHoursUtc)}`}
          >
            <Text variant="mono" tone="primary" style={styles.stepNo}>
              {i + 1}
            </Text>
            <Text variant="label" style={styles.stepBand}>
              {bandName(step.bandId)}
            </Text>
            <Text variant="caption" tone="muted" style={styles.flex}>
              {step.slots === 1 ? '1 slot' : `${step.slots} slots`} in a row · {hoursLabel(step.activeHoursUtc)}
            </Text>
          </ListItem>
        ))}
      </List>
      <Text variant="caption" tone="muted">
        Transmits in {cadenceLabel(schedule.cadence)}
        {schedule.stagger.stepHz > 0
          ? `, offset moving ${schedule.stagger.stepHz} Hz a time within ${schedule.stagger.spanHz} Hz`
          : ', offset fixed'}{' '}
        · from {schedule.startDate}
        {schedule.endDate ? ` to ${schedule.endDate}` : ''} (UTC days)
      </Text>

      {error ? (
        <Text tone="danger" accessibilityRole="alert">
          {error}
        </Text>
      ) : null}
      {onEdit || onPause || onResume || onDelete ? (
        <View style={styles.actions}>
          {schedule.paused && onResume ? <Button label="Resume schedule" onPress={onResume} busy={busy} /> : null}
          {!schedule.paused && onPause ? <Button label="Pause schedule" variant="secondary" onPress={onPause} busy={busy} /> : null}
          {onEdit ? <Button label="Edit schedule" variant="secondary" onPress={onEdit} /> : null}
          {onDelete ? <Button label="Delete schedule" variant="danger" onPress={onDelete} /> : null}
        </View>
      ) : null}
    </Card>
  );
}

const styles = StyleSheet.create({
  head: { flexDirection: 'row', flexWrap: 'wrap', justifyContent: 'space-between', alignItems: 'flex-start', gap: space.md },
  title: { flexShrink: 1 },
  status: {
    flexDirection: 'row',
    alignItems: 'center',
    gap: space.sm,
    borderWidth: 1,
    borderRadius: radius.pill,
    paddingHorizontal: space.md,
    paddingVertical: space.xs,
  },
  dot: { width: 8, height: 8, borderRadius: 4 },
  steps: { marginVertical: space.xs },
  step: { flexDirection: 'row', alignItems: 'center', gap: space.md, paddingVertical: space.sm, borderTopWidth: 1 },
  stepNo: { width: 22 },
  stepBand: { width: 52 },
  flex: { flex: 1 },
  actions: { flexDirection: 'row', flexWrap: 'wrap', gap: space.sm, marginTop: space.sm },
});
