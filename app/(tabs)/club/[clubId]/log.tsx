import { Stack, useLocalSearchParams } from 'expo-router';
import { StyleSheet, View } from 'react-native';

import { AuditList, CsvLink } from '@/components/audit/audit-list';
import { auditCsvPath, useClubAuditQuery } from '@/components/audit/queries';
import { ClubNav } from '@/components/clubs/club-nav';
import { useClubQuery } from '@/components/clubs/queries';
import { EmptyState, ErrorState, LoadingState } from '@/components/ui/query-states';
import { Screen } from '@/components/ui/screen';
import { Text } from '@/components/ui/text';
import { space } from '@/components/ui/theme';

export default function ClubLogRoute() {
  const clubId = Number(useLocalSearchParams<{ clubId: string }>().clubId);
  const club = useClubQuery(clubId);
  const log = useClubAuditQuery(clubId);
  let body;
  if (log.isPending) body = <LoadingState label="Loading the log…" />;
  else if (log.isError) body = <ErrorState title="The log could not be loaded" error={log.error} onRetry={() => log.refetch()} />;
  else if (log.data.length === 0) body = <EmptyState title="Nothing logged yet" message="Changes by members and admins show up here." />;
  else body = <AuditList entries={log.data} />;
  const name = club.data?.name ?? 'Club';
  return (
    <Screen>
      <Stack.Screen options={{ title: `${name} · Log` }} />
      <ClubNav clubId={clubId} clubName={name} current="log" isAdmin />
      <View style={styles.head}>
        <Text tone="muted" style={styles.grow}>
          Every change in the club and to its members’ stations: who, what, and when (UTC).
        </Text>
        <CsvLink href={auditCsvPath.club(clubId)} />
      </View>
      {body}
    </Screen>
  );
}

const styles = StyleSheet.create({
  head: { flexDirection: 'row', flexWrap: 'wrap', alignItems: 'center', gap: space.md },
  grow: { flex: 1, minWidth: 220 },
});
