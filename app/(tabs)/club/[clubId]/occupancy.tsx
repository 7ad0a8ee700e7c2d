import { Stack, useLocalSearchParams } from 'expo-router';
import { lazy, Suspense, useState } from 'react';
import { StyleSheet, View } from 'react-native';

import { ClubNav } from '@/components/clubs/club-nav';
import { DutyTable } from '@/components/clubs/duty-table';
import { useClubQuery, useOccupancyQuery } from '@/components/clubs/queries';
import { Card } from '@/components/ui/card';
import { formatUtcDateTime } from '@/components/ui/format';
import { EmptyState, ErrorState, LoadingState } from '@/components/ui/query-states';
import { Screen } from '@/components/ui/screen';
import { Text } from '@/components/ui/text';
import { space } from '@/components/ui/theme';
import { Heading } from '@/components/ui/heading';

// the chart library is large: it loads only when this screen opens
const OccupancyChart = lazy(() => import('@/components/charts/all-charts').then((m) => ({ default: m.OccupancyChart })));

export default function ClubOccupancyRoute() {
  const clubId = Number(useLocalSearchParams<{ clubId: string }>().clubId);
  const club = useClubQuery(clubId);
  const occupancy = useOccupancyQuery(clubId);
  const [chartWidth, setChartWidth] = useState(0);
  let body;
  if (occupancy.isPending) body = <LoadingState label="Working out the next 24 hours…" />;
  else if (occupancy.isError)
    body = <ErrorState title="Band use could not be loaded" error={occupancy.error} onRetry={() => occupancy.refetch()} />;
  else if (occupancy.data.bands.length === 0)
    body = <EmptyState title="Quiet bands" message="No club station is planned to send in the next 24 hours." />;
  else
    body = (
      <>
        <Card>
          <Heading level={2}>Transmissions per hour</Heading>
          <Text variant="caption" tone="muted">
            From {formatUtcDateTime(occupancy.data.hoursUtc[0] ?? occupancy.data.fromUtc)}, hour by hour in UTC, stacked by band.
          </Text>
          <View style={styles.chart} onLayout={(event) => setChartWidth(Math.floor(event.nativeEvent.layout.width))}>
            {chartWidth > 0 ? (
              <Suspense fallback={<LoadingState label="Drawing the chart…" />}>
                <OccupancyChart data={occupancy.data} width={chartWidth} />
              </Suspense>
            ) : null}
          </View>
        </Card>
        <Card>
          <Heading level={2}>Per band, next 24 hours</Heading>
          <DutyTable bands={occupancy.data.bands} />
        </Card>
      </>
    );
  const name = club.data?.name ?? 'Club';
  return (
    <Screen>
      <Stack.Screen options={{ title: `${name} · Band use` }} />
      <ClubNav clubId={clubId} clubName={name} current="occupancy" isAdmin />
      <Text tone="muted">How busy the club keeps each band, from every member’s plan.</Text>
      {body}
    </Screen>
  );
}

const styles = StyleSheet.create({ chart: { minHeight: 240, marginTop: space.sm } });
