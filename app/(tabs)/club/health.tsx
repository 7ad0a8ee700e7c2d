import { Stack, useLocalSearchParams, useRouter } from 'expo-router';

import { useSessionQuery } from '@/components/auth/queries';
import { FleetHealthScreen } from '@/components/health/fleet-health-screen';
import { useClubHealthQuery } from '@/components/health/queries';
import { useClubStationsQuery } from '@/components/stations/queries';
import { SegmentedChoice } from '@/components/ui/segmented-choice';

/** A club admin's view of every member's station, live. Only clubs the person administers are offered. */
export default function ClubFleetHealthRoute() {
  const router = useRouter();
  const params = useLocalSearchParams<{ clubId?: string }>();
  const me = useSessionQuery().data;
  const clubs = (me?.clubs ?? []).filter((club) => me?.adminOfClubIds.includes(club.clubId));
  const chosen = clubs.find((club) => String(club.clubId) === params.clubId) ?? clubs[0];
  const health = useClubHealthQuery(chosen?.clubId ?? 0, { live: true });
  // the club's station list carries the owners' names
  const stations = useClubStationsQuery(chosen?.clubId ?? 0, !!chosen);
  const ownerOf = (stationId: number) => stations.data?.find((station) => station.id === stationId)?.ownerName;
  const noClub = clubs.length === 0;
  return (
    <>
      <Stack.Screen options={{ title: 'Club fleet health' }} />
      <FleetHealthScreen
        title={chosen ? `${chosen.clubName}: fleet health` : 'Club fleet health'}
        intro="Every member's station as its device last reported it. Refreshes every 5 seconds."
        query={
          noClub
            ? { data: [], isPending: false, isError: false, error: null, isRefetchError: false, dataUpdatedAt: 0, refetch: health.refetch }
            : health
        }
        emptyTitle={noClub ? 'No club to show' : 'No member stations yet'}
        emptyMessage={
          noClub
            ? 'Only a club admin sees a club fleet. Your own stations are under Health.'
            : 'When members add stations, their health shows here.'
        }
        header={
          clubs.length > 1 && chosen ? (
            <SegmentedChoice
              label="Club"
              options={clubs.map((club) => ({ value: String(club.clubId), label: club.clubName }))}
              value={String(chosen.clubId)}
              onChange={(clubId) => router.setParams({ clubId })}
            />
          ) : undefined
        }
        ownerOf={ownerOf}
        onOpenStation={(id) => router.push({ pathname: '/health/[id]', params: { id: String(id) } })}
      />
    </>
  );
}
