import { StyleSheet, View } from 'react-native';

import { useSessionQuery } from '@/components/auth/queries';
import { ClubMembershipList, RoleBadge } from '@/components/clubs/club-membership-list';
import { useClubStationsQuery } from '@/components/stations/queries';
import { StationList } from '@/components/stations/station-list';
import { useBreakpoints } from '@/components/ui/breakpoints';
import { EmptyState, ErrorState, LoadingState } from '@/components/ui/query-states';
import { Screen } from '@/components/ui/screen';
import { Text } from '@/components/ui/text';
import { space } from '@/components/ui/theme';
import type { ClubMembership } from '@/shared/api/contracts';

export default function ClubRoute() {
  const user = useSessionQuery().data;
  const clubs = user?.clubs ?? [];
  const adminClubs = clubs.filter((club) => user?.adminOfClubIds.includes(club.clubId));
  const memberClubs = clubs.filter((club) => !user?.adminOfClubIds.includes(club.clubId));
  return (
    <Screen>
      <View style={styles.titleBlock}>
        <Text variant="title" accessibilityRole="header">
          Club
        </Text>
        <Text tone="muted">
          {adminClubs.length
            ? 'Every member’s stations in the clubs you look after. Open one to see it; only its owner can change it.'
            : 'The clubs you belong to.'}
        </Text>
      </View>
      {adminClubs.map((club) => (
        <ClubStationsSection key={club.clubId} club={club} />
      ))}
      {memberClubs.length ? <ClubMembershipList clubs={memberClubs} /> : null}
    </Screen>
  );
}

/** One administered club: its members' stations (fetched here, drawn by StationList). */
function ClubStationsSection({ club }: { club: ClubMembership }) {
  const { isTablet } = useBreakpoints();
  const stations = useClubStationsQuery(club.clubId);
  let body;
  if (stations.isPending) body = <LoadingState label="Loading the club’s stations…" />;
  else if (stations.isError)
    body = <ErrorState title="The club’s stations could not be loaded" error={stations.error} onRetry={() => stations.refetch()} />;
  else if (stations.data.length === 0)
    body = <EmptyState title="No stations yet" message="None of the members has registered a station so far." />;
  else
    body = (
      <StationList
        stations={stations.data}
        layout={isTablet ? 'table' : 'cards'}
        showOwner
        hrefFor={(station) => ({ pathname: '/club/station/[id]', params: { id: String(station.id) } })}
      />
    );
  return (
    <View style={styles.section}>
      <View style={styles.sectionHead}>
        <Text variant="heading" accessibilityRole="header" style={styles.clubName}>
          {club.clubName}
        </Text>
        <RoleBadge role="admin" />
      </View>
      {body}
    </View>
  );
}

const styles = StyleSheet.create({
  titleBlock: { gap: space.xs },
  section: { gap: space.md },
  sectionHead: { flexDirection: 'row', alignItems: 'center', gap: space.md },
  clubName: { flexShrink: 1 },
});
