import { keepPreviousData, useQuery, type QueryClient } from '@tanstack/react-query';

import type { ClubReach, Comparison } from '@/shared/api/analyses';
import { api } from '@/shared/api/client';
import type { BandId } from '@/shared/domain/bands';

import { staleTime } from '../query/query-client';

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
