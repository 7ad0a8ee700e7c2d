import { StyleSheet, View } from 'react-native';

import type { Station } from '@/shared/schemas';

import { Card } from '../ui/card';
import { Text } from '../ui/text';
import { TextLink } from '../ui/text-link';
import { formatLocator, formatUtcDateTime } from '../ui/format';
import { space } from '../ui/theme';

export type StationDetailsProps = { station: Station; readOnly: boolean };

/** "Suspended by Ann of Harbour Circle since … UTC: it does not send." */
function suspendedLine(suspension: NonNullable<Station['suspension']>) {
  const by = suspension.clubName ? `${suspension.byName ?? 'an admin'} of ${suspension.clubName}` : 'the club';
  return `Suspended by ${by} since ${formatUtcDateTime(suspension.at)}: it does not send.`;
}

export function StationDetails({ station, readOnly }: StationDetailsProps) {
  return (
    <View style={styles.wrap}>
      {readOnly ? (
        <Card tone="signal">
          <Text variant="label">Read-only: this station belongs to {station.ownerName}</Text>
          <Text>You can look at everything here; only its owner can change it.</Text>
        </Card>
      ) : null}
      {station.suspension ? (
        <Card tone="signal" style={styles.suspended}>
          <Text variant="label">{suspendedLine(station.suspension)}</Text>
          <Text>Reason: {station.suspension.reason}</Text>
        </Card>
      ) : null}
      <Card>
        <Text variant="label" tone="muted">
          Band rotation
        </Text>
        <Text>Which band when: the rotation, its timeline and the next transmissions.</Text>
        <TextLink href={{ pathname: '/stations/[id]/schedule', params: { id: String(station.id) } }} label="Schedule" />
      </Card>
      <Card>
        <Fact label="Callsign" value={station.callsign} mono />
        <Fact label="Locator" value={formatLocator(station.locator)} mono />
        <Fact label="Created" value={formatUtcDateTime(station.createdAt)} />
        <Fact label="Updated" value={formatUtcDateTime(station.updatedAt)} />
      </Card>
      <Card>
        <Text variant="label" tone="muted">
          Notes
        </Text>
        <Text tone={station.notes ? 'default' : 'muted'}>{station.notes || 'No notes yet.'}</Text>
      </Card>
    </View>
  );
}

function Fact({ label, value, mono = false }: { label: string; value: string; mono?: boolean }) {
  return (
    <View style={styles.fact}>
      <Text variant="label" tone="muted" style={styles.factLabel}>
        {label}
      </Text>
      <Text variant={mono ? 'monoLarge' : 'body'} style={styles.factValue}>
        {value}
      </Text>
    </View>
  );
}

const styles = StyleSheet.create({
  wrap: { gap: space.lg },
  suspended: { borderLeftWidth: 4 },
  fact: { flexDirection: 'row', alignItems: 'baseline', flexWrap: 'wrap', gap: space.md, paddingVertical: space.xs },
  factLabel: { width: 96 },
  factValue: { flexShrink: 1 },
});
