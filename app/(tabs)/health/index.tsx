import { useRouter } from 'expo-router';

import { useSessionQuery } from '@/components/auth/queries';
import { FleetHealthScreen } from '@/components/health/fleet-health-screen';
import { useFleetHealthQuery } from '@/components/health/queries';

export default function FleetHealthRoute() {
  const router = useRouter();
  const me = useSessionQuery().data;
  const fleet = useFleetHealthQuery({ live: true });
  return (
    <FleetHealthScreen
      title="Fleet health"
      intro="Every one of your stations as its device last reported it. Refreshes every 5 seconds."
      query={fleet}
      emptyTitle="No stations yet"
      emptyMessage="Add a station, then create a device token for it so its beacon can report here."
      onEmptyAction={() => router.push('/stations/new')}
      emptyActionLabel="Add a station"
      onOpenStation={(id) => router.push({ pathname: '/health/[id]', params: { id: String(id) } })}
      onOpenDevice={(id) => router.push({ pathname: '/stations/[id]/device', params: { id: String(id) } })}
      clubLink={me?.adminOfClubIds.length ? { label: 'Club fleet health', onPress: () => router.push('/club/health') } : undefined}
    />
  );
}
