import { keepPreviousData, useQueries, useQuery, type QueryClient } from '@tanstack/react-query';

import type { ClubReach, Comparison } from '@/shared/api/analyses';
import { api } from '@/shared/api/client';
import { isBandId, type BandId } from '@/shared/domain/bands';
import type { Station } from '@/shared/schemas';

import { staleTime } from '../query/query-client';
import { stationKeys, useStationsQuery } from '../stations/queries';

/** What the Compare screen asks: two stations over one period, or one station (or two) over two periods. All times ISO UTC. */
export type ComparisonRequest =
  | { mode: 'two-stations'; a: number; b: number; band: BandId; from: string; to: string }
  | { mode: 'two-periods'; a: number; b: number; band: BandId; aFrom: string; aTo: string; bFrom: string; bTo: string };

export const analysisKeys = {
  all: ['analyses'] as const,
  comparison: (request: ComparisonRequest) => [...analysisKeys.all, 'comparison', request] as const,
  clubReach: (clubId: number, range: { from: string; to: string }) => [...analysisKeys.all, 'club-reach', clubId, range] as const,
};

function comparisonPath(request: ComparisonRequest): string {
  const { mode: _mode, ...rest } = request;
  const params = new URLSearchParams(Object.entries(rest).map(([key, value]) => [key, String(value)]));
  return `/comparisons?${params.toString()}`;
}

const comparisonQueryOptions = (request: ComparisonRequest) => ({
  queryKey: analysisKeys.comparison(request),
  queryFn: () => api<Comparison>(comparisonPath(request)),
  staleTime: staleTime.short,
});

/** Runs a comparison once (the form's submit, so a 400 lands beside its fields); the view then reads it from the cache. */
export const fetchComparison = (queryClient: QueryClient, request: ComparisonRequest) =>
  queryClient.fetchQuery(comparisonQueryOptions(request));

export function useComparisonQuery(request: ComparisonRequest | null) {
  return useQuery({
    ...comparisonQueryOptions(request ?? { mode: 'two-stations', a: 0, b: 0, band: '20m', from: '', to: '' }),
    enabled: request !== null,
    placeholderData: keepPreviousData,
  });
}

export function useClubReachQuery(clubId: number, range: { from: string; to: string }) {
  return useQuery({
    queryKey: analysisKeys.clubReach(clubId, range),
    queryFn: () => api<ClubReach>(`/clubs/${clubId}/reach?${new URLSearchParams(range).toString()}`),
    enabled: Number.isInteger(clubId) && clubId > 0,
    staleTime: staleTime.short,
    placeholderData: keepPreviousData,
  });
}

export type ComparableStation = { id: number; name: string; callsign: string; ownerName: string | null; bandIds: BandId[] };

const comparable = (s: Station, own: boolean): ComparableStation => ({
  id: s.id,
  name: s.name,
  callsign: s.callsign,
  ownerName: own ? null : s.ownerName,
  bandIds: s.bands
    .filter((b) => b.enabled)
    .map((b) => b.bandId)
    .filter(isBandId),
});

/** The stations someone may compare: their own, then (for a club admin) the members' stations. */
export function useComparableStations(userId: number | undefined, adminOfClubIds: number[]) {
  const own = useStationsQuery();
  const clubs = useQueries({
    queries: adminOfClubIds.map((clubId) => ({
      queryKey: stationKeys.club(clubId),
      queryFn: () => api<Station[]>(`/clubs/${clubId}/stations`),
      staleTime: staleTime.normal,
    })),
  });
  const seen = new Set<number>();
  const data: ComparableStation[] = [];
  for (const station of [...(own.data ?? []), ...clubs.flatMap((c) => c.data ?? [])]) {
    if (seen.has(station.id)) continue;
    seen.add(station.id);
    data.push(comparable(station, station.ownerId === userId));
  }
  return { isError: own.isError, error: own.error, refetch: own.refetch, data: own.data ? data : undefined };
}
