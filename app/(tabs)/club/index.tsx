import { router } from 'expo-router';
import { StyleSheet, View } from 'react-native';

import { useSessionQuery } from '@/components/auth/queries';
import { ClubHub } from '@/components/clubs/club-hub';
import { useMyProposalsQuery } from '@/components/clubs/queries';
import { Screen } from '@/components/ui/screen';
import { Text } from '@/components/ui/text';
import { TextLink } from '@/components/ui/text-link';
import { space } from '@/components/ui/theme';
import { ScreenTitle } from '@/components/ui/screen-title';

export default function ClubRoute() {
  const user = useSessionQuery().data;
  const proposals = useMyProposalsQuery();
  const pending = proposals.data?.filter((proposal) => proposal.status === 'pending').length;
  return (
    <Screen>
      <View style={styles.titleBlock}>
        <ScreenTitle>Club</ScreenTitle>
        <Text tone="muted">
          A club lets operators who share bands look after their beacons together: one plan, no collisions, the same limits.
        </Text>
      </View>
      <ClubHub clubs={user?.clubs ?? []} pendingProposals={pending} onCreate={() => router.push('/club/new')} />
      {user?.adminOfClubIds.length ? <TextLink href="/club/health" label="Club fleet health" /> : null}
    </Screen>
  );
}

const styles = StyleSheet.create({ titleBlock: { gap: space.xs } });
