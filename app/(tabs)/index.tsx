import { Stack, useRouter } from 'expo-router';
import { StyleSheet, View } from 'react-native';

import { useSessionQuery } from '@/components/auth/queries';
import { LazyClubSummaryCard, LazyFirstStepsCard } from '@/components/overview/lazy-cards';
import { SafetyCard } from '@/components/overview/safety-card';
import { StationCountCard } from '@/components/overview/station-count-card';
import { StationGlance } from '@/components/overview/station-glance';
import { useStationsAtAGlanceQuery } from '@/components/receptions/queries';
import { useStationsQuery } from '@/components/stations/queries';
import { Button } from '@/components/ui/button';
import { Card } from '@/components/ui/card';
import { Text } from '@/components/ui/text';
import { space } from '@/components/ui/theme';
import { Screen } from '@/components/ui/screen';
import { Heading } from '@/components/ui/heading';
import { ScreenTitle } from '@/components/ui/screen-title';

export default function OverviewRoute() {
  const router = useRouter();
  const user = useSessionQuery().data;
  const stations = useStationsQuery();
  const glances = useStationsAtAGlanceQuery();
  return (
    <Screen>
      <Stack.Screen options={{ title: 'Overview · Faintline' }} />
      <View style={styles.greeting}>
        <ScreenTitle>{`Hello, ${user?.displayName ?? 'operator'}`}</ScreenTitle>
        {user?.callsign ? (
          <Text variant="monoLarge" tone="primary">
            {user.callsign}
          </Text>
        ) : (
          <Text tone="muted">No callsign on your account yet.</Text>
        )}
      </View>
      <LazyFirstStepsCard />
      {(user?.clubs ?? [])
        .filter((club) => club.role === 'admin')
        .map((club) => (
          <LazyClubSummaryCard key={club.clubId} club={club} />
        ))}
      <View style={styles.row}>
        <StationCountCard count={stations.data?.length ?? null} status={stations.status} />
        <Card style={styles.links}>
          <Text variant="label" tone="muted">
            Quick links
          </Text>
          <View style={styles.linkButtons}>
            <Button label="Add a station" onPress={() => router.push('/stations/new')} />
            <Button label="Your stations" variant="secondary" onPress={() => router.push('/stations')} />
            <Button label="Listening posts" variant="secondary" onPress={() => router.push('/receivers')} />
            <Button label="Help and glossary" variant="secondary" onPress={() => router.push('/help')} />
          </View>
        </Card>
      </View>
      {stations.data?.length ? (
        <>
          <Heading level={2}>Your stations at a glance</Heading>
          {glances.isError ? <Text tone="muted">Reception figures are not available right now.</Text> : null}
          <StationGlance stations={stations.data} glances={glances.data ?? []} />
        </>
      ) : null}
      <SafetyCard />
    </Screen>
  );
}

const styles = StyleSheet.create({
  greeting: { gap: space.xs },
  row: { flexDirection: 'row', flexWrap: 'wrap', gap: space.lg },
  links: { flex: 1, minWidth: 220 },
  linkButtons: { flexDirection: 'row', flexWrap: 'wrap', gap: space.sm },
});
