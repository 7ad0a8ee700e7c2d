import { useRouter } from 'expo-router';
import { StyleSheet, View } from 'react-native';

import { useFleetHealthQuery } from '@/components/health/queries';
import { useStationsQuery } from '@/components/stations/queries';
import { StationList } from '@/components/stations/station-list';
import { useBreakpoints } from '@/components/ui/breakpoints';
import { Button } from '@/components/ui/button';
import { EmptyState, ErrorState, LoadingState } from '@/components/ui/query-states';
import { Screen } from '@/components/ui/screen';
import { TextLink } from '@/components/ui/text-link';
import { Text } from '@/components/ui/text';
import { space } from '@/components/ui/theme';
import { ScreenTitle } from '@/components/ui/screen-title';

export default function StationsRoute() {
  const router = useRouter();
  const { isTablet } = useBreakpoints();
  const stations = useStationsQuery();
  const health = useFleetHealthQuery().data;
  const deviceOnline = health ? new Map(health.filter((h) => h.hasDevice).map((h) => [h.stationId, h.online])) : undefined;
  const addStation = () => router.push('/stations/new');

  let body;
  if (stations.isPending) body = <LoadingState label="Loading your stations…" />;
  else if (stations.isError)
    body = <ErrorState title="Your stations could not be loaded" error={stations.error} onRetry={() => stations.refetch()} />;
  else if (stations.data.length === 0)
    body = (
      <EmptyState
        title="No stations yet"
        message="A station is one beacon on the air: its name, the callsign it sends and where it stands. Add your first one to start."
        action={<Button label="Add your first station" onPress={addStation} />}
      />
    );
  else body = <StationList stations={stations.data} layout={isTablet ? 'table' : 'cards'} deviceOnline={deviceOnline} />;

  return (
    <Screen>
      <View style={styles.head}>
        <View style={styles.titleBlock}>
          <ScreenTitle>Stations</ScreenTitle>
          <Text tone="muted">Your beacons, each with its callsign and Maidenhead locator.</Text>
        </View>
        {stations.data?.length ? <Button label="Add station" onPress={addStation} /> : null}
      </View>
      {body}
      <TextLink href="/receivers" label="Listening posts and report imports" />
      {stations.data?.length ? <TextLink href="/compare" label="Compare two stations, or one in two periods" /> : null}
    </Screen>
  );
}

const styles = StyleSheet.create({
  head: { flexDirection: 'row', flexWrap: 'wrap', alignItems: 'flex-end', justifyContent: 'space-between', gap: space.md },
  titleBlock: { gap: space.xs, flexShrink: 1, minWidth: 200 },
});
