import { Stack, useLocalSearchParams } from 'expo-router';

import { AuditIntro } from '@/components/audit/audit-intro';
import { LazyAuditList } from '@/components/audit/lazy-audit-list';
import { auditCsvPath, useClubAuditQuery } from '@/components/audit/queries';
import { ClubNav } from '@/components/clubs/club-nav';
import { useClubQuery } from '@/components/clubs/queries';
import { EmptyState, ErrorState, LoadingState } from '@/components/ui/query-states';
import { Screen } from '@/components/ui/screen';

export default function ClubLogRoute() {
  const clubId = Number(useLocalSearchParams<{ clubId: string }>().clubId);
  const club = useClubQuery(clubId);
  const log = useClubAuditQuery(clubId);
  let body;
  if (log.isPending) body = <LoadingState label="Loading the log…" />;
  else if (log.isError) body = <ErrorState title="The log could not be loaded" error={log.error} onRetry={() => log.refetch()} />;
  else if (log.data.length === 0) body = <EmptyState title="Nothing logged yet" message="Changes by members and admins show up here." />;
  else body = <LazyAuditList entries={log.data} />;
  const name = club.data?.name ?? 'Club';
  return (
    <Screen>
      <Stack.Screen options={{ title: `${name} · Log` }} />
      <ClubNav clubId={clubId} clubName={name} current="log" isAdmin />
      <AuditIntro
        text="Every change in the club and to its members’ stations: who, what, and when (UTC)."
        csvHref={auditCsvPath.club(clubId)}
      />
      {body}
    </Screen>
  );
}
