import { useState } from 'react';
import { StyleSheet, View } from 'react-native';

import type { ClubReach } from '@/shared/api/analyses';

import { LazyWorldMap } from '../map/lazy-world-map';
import { formatCount, formatKm } from '../receptions/format';
import { FigureGrid } from '../receptions/reach-figures';
import { Card } from '../ui/card';
import { EmptyState } from '../ui/query-states';
import { Heading } from '../ui/heading';
import { Text } from '../ui/text';
import { space } from '../ui/theme';
import { ClubPostsTable, ClubStationsTable } from './club-reach-tables';
import { LazyHourBandChart } from './lazy-hour-band-chart';

/** What the club's stations reached, what its listening posts heard, and which bands were open from the club's area. */
export function ClubReachView({ reach, wide }: { reach: ClubReach; wide: boolean }) {
  const [mapWidth, setMapWidth] = useState(wide ? 640 : 340);
  const [chartWidth, setChartWidth] = useState(wide ? 880 : 340);
  const figures = [
    { label: 'Reports of club stations', value: formatCount(reach.reports) },
    { label: 'Receivers', value: formatCount(reach.receivers) },
    { label: 'Furthest', value: formatKm(reach.furthestKm) },
    { label: 'Member stations', value: String(reach.stations.length) },
  ];
  return (
    <View style={styles.root}>
      <FigureGrid label="The club's figures for this period" figures={figures} />
      <Card style={styles.card}>
        <Heading level={2}>Who heard the club</Heading>
        {reach.centre && reach.mapReceivers.length > 0 ? (
          <View onLayout={(e) => setMapWidth(Math.floor(e.nativeEvent.layout.width))}>
            <LazyWorldMap station={reach.centre} receivers={reach.mapReceivers} width={mapWidth} bandId={null} />
          </View>
        ) : (
          <EmptyState title="Nobody heard the club" message="No receiver reported a member station in this period." />
        )}
        {reach.centre ? (
          <Text variant="caption" tone="muted">
            Centred on {reach.centre.callsign} ({reach.centre.locator}); each receiver at its furthest distance from any member station.
          </Text>
        ) : null}
      </Card>
      <Card style={styles.card}>
        <Heading level={2}>Member stations</Heading>
        {reach.stations.length ? (
          <ClubStationsTable stations={reach.stations} wide={wide} />
        ) : (
          <Text tone="muted">No member has a station yet.</Text>
        )}
      </Card>
      <Card style={styles.card}>
        <Heading level={2}>The club’s listening posts</Heading>
        {reach.posts.length ? (
          <ClubPostsTable posts={reach.posts} wide={wide} />
        ) : (
          <Text tone="muted">No member has a listening post yet.</Text>
        )}
      </Card>
      <Card style={styles.card}>
        <Text variant="caption" tone="muted">
          Bands open from the club’s area: reports of the members’ stations by UTC hour of day.
        </Text>
        <View onLayout={(e) => setChartWidth(Math.floor(e.nativeEvent.layout.width))}>
          {reach.hourBand.length ? (
            <LazyHourBandChart hourBand={reach.hourBand} width={chartWidth} />
          ) : (
            <Text tone="muted">No reports in this period.</Text>
          )}
        </View>
      </Card>
    </View>
  );
}

const styles = StyleSheet.create({
  root: { gap: space.lg },
  card: { gap: space.sm },
});
