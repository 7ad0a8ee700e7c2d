import { StyleSheet, View } from 'react-native';

import { Card } from '../ui/card';
import { Text } from '../ui/text';
import { formatUtcDateTime } from '../ui/format';
import { space } from '../ui/theme';
import { describeChange, type ChangeLine } from './change-sentences';
import type { AuditEntry } from './queries';

export type AuditListProps = { entries: AuditEntry[]; showActor?: boolean };

const entityWords: Record<string, string> = {
  station: 'Station',
  unit: 'Unit',
  band: 'Band',
  calibration: 'Calibration',
  schedule: 'Schedule',
  club: 'Club',
  membership: 'Membership',
  invitation: 'Invitation',
  proposal: 'Offset proposal',
  suspension: 'Suspension',
  photo: 'Photo',
};

/** Who did what and when (UTC), with the changes in words, before → after. */
export function AuditList({ entries, showActor = true }: AuditListProps) {
  return (
    <View style={styles.list}>
      {entries.map((entry) => {
        const changes = describeChange(entry).slice(0, 8);
        return (
          <Card key={entry.id} style={styles.card}>
            <View style={styles.head}>
              <Text variant="mono" tone="muted" style={styles.time}>
                {formatUtcDateTime(entry.atUtc)}
              </Text>
              <Text variant="caption" tone="primary">
                {entityWords[entry.entityType] ?? entry.entityType}
              </Text>
            </View>
            <Text>
              {showActor ? <Text variant="label">{entry.actorName}: </Text> : null}
              {entry.summary}
            </Text>
            {changes.length ? (
              <View style={styles.changes}>
                {changes.map((change) => (
                  <Text key={change.label} variant="caption">
                    <Text variant="caption" tone="muted">
                      {change.label}:{' '}
                    </Text>
                    {changeText(change)}
                  </Text>
                ))}
              </View>
            ) : null}
          </Card>
        );
      })}
    </View>
  );
}

/** "before → after", or only the side there is: "was 20 m for 1 slot" / "now enabled". */
function changeText(change: ChangeLine): string {
  if (change.before === null) return change.after ?? '—';
  if (change.after === null) return `was ${change.before}`;
  return `${change.before} → ${change.after}`;
}

const styles = StyleSheet.create({
  list: { gap: space.sm },
  card: { gap: space.xs, paddingVertical: space.md },
  head: { flexDirection: 'row', flexWrap: 'wrap', justifyContent: 'space-between', gap: space.sm },
  time: { fontSize: 13 },
  changes: { gap: 2, marginTop: space.xs },
});
