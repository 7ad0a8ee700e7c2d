import { StyleSheet, View } from 'react-native';

import type { ClubMembership } from '@/shared/api/contracts';

import { Card } from '../ui/card';
import { Text } from '../ui/text';
import { radius, space } from '../ui/theme';
import { useAppTheme } from '../ui/theme-provider';

export function ClubMembershipList({ clubs }: { clubs: ClubMembership[] }) {
  return (
    <View style={styles.list}>
      {clubs.map((club) => (
        <Card key={club.clubId} style={styles.row}>
          <Text variant="heading" style={styles.name}>
            {club.clubName}
          </Text>
          <RoleBadge role={club.role} />
        </Card>
      ))}
    </View>
  );
}

export function RoleBadge({ role }: { role: ClubMembership['role'] }) {
  const { colors } = useAppTheme();
  const admin = role === 'admin';
  return (
    <View style={[styles.badge, { backgroundColor: admin ? colors.signalSoft : colors.primarySoft }]}>
      <Text variant="caption" tone={admin ? 'signal' : 'primary'}>
        {admin ? 'Club admin' : 'Member'}
      </Text>
    </View>
  );
}

const styles = StyleSheet.create({
  list: { gap: space.md },
  row: { flexDirection: 'row', alignItems: 'center', justifyContent: 'space-between', gap: space.md },
  name: { flexShrink: 1 },
  badge: { borderRadius: radius.pill, paddingHorizontal: space.md, paddingVertical: 2 },
});
