import { AuditIntro } from '@/components/audit/audit-intro';
import { LazyAuditList } from '@/components/audit/lazy-audit-list';
import { auditCsvPath, useMyAuditQuery } from '@/components/audit/queries';
import { EmptyState, ErrorState, LoadingState } from '@/components/ui/query-states';
import { Screen } from '@/components/ui/screen';
import { ScreenTitle } from '@/components/ui/screen-title';

export default function ActivityRoute() {
  const log = useMyAuditQuery();
  let body;
  if (log.isPending) body = <LoadingState label="Loading your log…" />;
  else if (log.isError) body = <ErrorState title="Your log could not be loaded" error={log.error} onRetry={() => log.refetch()} />;
  else if (log.data.length === 0)
    body = <EmptyState title="Nothing logged yet" message="Changes to your stations, units, bands and schedules show up here." />;
  else body = <LazyAuditList entries={log.data} />;
  return (
    <Screen>
      <ScreenTitle>Your activity log</ScreenTitle>
      <AuditIntro
        text="Every change to your stations and equipment, by you or by a club admin, with the time in UTC."
        csvHref={auditCsvPath.mine()}
      />
      {body}
    </Screen>
  );
}
