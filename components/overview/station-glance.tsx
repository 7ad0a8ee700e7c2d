import { StyleSheet, View } from 'react-native';

import type { StationAtAGlance } from '@/shared/api/receptions';
import type { Station } from '@/shared/schemas';

import { bandName, formatCount, formatKm } from '../receptions/format';
import { Card } from '../ui/card';
import { formatUtcDateTime } from '../ui/format';
import { Text } from '../ui/text';
import { TextLink } from '../ui/text-link';
import { space } from '../ui/theme';
import { useAppTheme } from '../ui/theme-provider';

export type StationGlanceProps = { stations: Pick<Station, 'id' | 'name' | 'callsign'>[]; glances: StationAtAGlance[] };

/** Each station in a few lines: on the air or not, what comes next, who heard it last and its last day's reach. */
export function StationGlance({ stations, glances }: StationGlanceProps) {
  const { colors } = useAppTheme();
  const byId = new Map(glances.map((g) => [g.stationId, g]));
  return (
    <View style={styles.grid}>
      {stations.map((station) => {
        const glance = byId.get(station.id);
        return (
          <Card key={station.id} style={styles.card}>
            <View style={styles.head}>
              <View
                style={[styles.dot, { backgroundColor: glance?.transmitting ? colors.signal : colors.border }]}
                accessibilityElementsHidden
                importantForAccessibility="no"
              />
              <Text variant="heading" style={styles.grow}>
                {station.name}
              </Text>
              <Text variant="mono" tone="primary">
                {station.callsign}
              </Text>
            </View>
            {glance ? (
              <>
                <Text variant="label">{glance.transmitting ? 'Transmitting now' : 'Not transmitting'}</Text>
                <Text tone="muted">
                  Next:{' '}
                  {glance.nextTransmission
                    ? `${formatUtcDateTime(glance.nextTransmission.startUtc)} on ${bandName(glance.nextTransmission.bandId)}`
                    : 'nothing planned'}
                </Text>
                <Text tone="muted">
                  Last heard:{' '}
                  {glance.lastHeard
                    ? `${formatUtcDateTime(glance.lastHeard.slotUtc)} by ${glance.lastHeard.rxCallsign}, ${formatKm(glance.lastHeard.distanceKm)}`
                    : 'not yet'}
                </Text>
                <Text tone="muted">
                  Last 24 h: {formatCount(glance.last24h.reports)} reports from {formatCount(glance.last24h.receivers)} receivers
                  {glance.last24h.furthestKm != null ? `, furthest ${formatKm(glance.last24h.furthestKm)}` : ''}
                </Text>
              </>
            ) : (
              <Text tone="muted">No reception figures yet.</Text>
            )}
            <TextLink
              href={{ pathname: '/stations/[id]/results', params: { id: String(station.id) } }}
              label={`Who heard ${station.name}`}
            />
          </Card>
        );
      })}
    </View>
  );
}

const styles = StyleSheet.create({
  grid: { flexDirection: 'row', flexWrap: 'wrap', gap: space.md },
  card: { flexGrow: 1, flexBasis: 300, minWidth: 0 },
  head: { flexDirection: 'row', alignItems: 'center', gap: space.sm },
  dot: { width: 10, height: 10, borderRadius: 5 },
  grow: { flex: 1 },
});
