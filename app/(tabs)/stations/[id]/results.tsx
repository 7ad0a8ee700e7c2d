import { Stack, useLocalSearchParams } from 'expo-router';
import { useState } from 'react';

import { rollingRange, type PeriodChoice } from '@/components/receptions/period';
import {
  receptionsCsvHref,
  useReachQuery,
  useReceptionPageQuery,
  type ReceptionFilter,
  type ReceptionSort,
} from '@/components/receptions/queries';
import { sortBands } from '@/components/receptions/colours';
import { ResultsView } from '@/components/receptions/results-view';
import { useStationQuery } from '@/components/stations/queries';
import { useBreakpoints } from '@/components/ui/breakpoints';
import { ErrorState, LoadingState } from '@/components/ui/query-states';
import { Screen } from '@/components/ui/screen';
import { ApiError } from '@/shared/api/client';
import { isBandId, type BandId } from '@/shared/domain/bands';

const PAGE_SIZE = 25;

export default function StationResultsRoute() {
  const { id } = useLocalSearchParams<{ id: string }>();
  const stationId = Number(id);
  const { isWide } = useBreakpoints();
  const station = useStationQuery(stationId);
  const [period, setPeriod] = useState<PeriodChoice>('7d');
  const [range, setRange] = useState(() => rollingRange('7d', Date.now()));
  const [bandId, setBandId] = useState<BandId | null>(null);
  const [sort, setSort] = useState<{ sort: ReceptionSort; order: 'asc' | 'desc' }>({ sort: 'time', order: 'desc' });
  const [pageNumber, setPageNumber] = useState(1);
  const filter: ReceptionFilter = { ...range, bandId };
  const reach = useReachQuery(stationId, filter);
  const hasReports = (reach.data?.reports ?? 0) > 0;
  const page = useReceptionPageQuery(stationId, { ...filter, ...sort, page: pageNumber, pageSize: PAGE_SIZE }, hasReports);

  const bandIds = sortBands([
    ...(station.data?.bands ?? []).map((b) => b.bandId).filter(isBandId),
    ...(reach.data?.hourBand ?? []).map((c) => c.bandId),
    ...(bandId ? [bandId] : []),
  ]);

  let body;
  if (!Number.isInteger(stationId) || stationId <= 0)
    body = <ErrorState title="Station not found" error={new Error('This address does not name a station.')} />;
  else if (station.isPending) body = <LoadingState label="Loading the station…" />;
  else if (station.isError) {
    const missing = station.error instanceof ApiError && station.error.status === 404;
    body = (
      <ErrorState
        title={missing ? 'Station not found' : 'The station could not be loaded'}
        error={station.error}
        onRetry={missing ? undefined : () => station.refetch()}
      />
    );
  } else {
    body = (
      <ResultsView
        stationName={station.data.name}
        callsign={station.data.callsign}
        wide={isWide}
        filters={{
          period,
          fromIso: range.from,
          toIso: range.to,
          bandId,
          bandIds,
          onPeriod: (next) => {
            setPeriod(next);
            setRange(rollingRange(next, Date.now()));
            setPageNumber(1);
          },
          onCustom: (next) => {
            setPeriod('custom');
            setRange(next);
            setPageNumber(1);
          },
          onBand: (next) => {
            setBandId(next);
            setPageNumber(1);
          },
        }}
        reach={reach}
        page={page}
        sort={sort.sort}
        order={sort.order}
        onSort={(next, order) => {
          setSort({ sort: next, order });
          setPageNumber(1);
        }}
        onPage={setPageNumber}
        csvHref={receptionsCsvHref(stationId, filter)}
        csvFileName={`${station.data.callsign}-reports.csv`}
        compareHref={{ pathname: '/compare', params: { a: String(stationId) } }}
      />
    );
  }
  return (
    <Screen maxWidth={1240}>
      <Stack.Screen options={{ title: station.data ? `${station.data.name} · results` : 'Station · results' }} />
      {body}
    </Screen>
  );
}
