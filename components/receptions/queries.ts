import { keepPreviousData, useQuery } from '@tanstack/react-query';

import { api } from '@/shared/api/client';
import type { Reach, ReceptionPage, StationAtAGlance } from '@/shared/api/receptions';
import type { BandId } from '@/shared/domain/bands';

import { staleTime } from '../query/query-client';

/** What the results screen asks for: a UTC period and, optionally, one band. */
export type ReceptionFilter = { from: string; to: string; bandId: BandId | null };
export type ReceptionSort = 'time' | 'distance' | 'snr' | 'band' | 'receiver';
export type ReceptionPageRequest = ReceptionFilter & { page: number; pageSize: number; sort: ReceptionSort; order: 'asc' | 'desc' };

export const receptionKeys = {
  all: ['receptions'] as const,
  station: (stationId: number) => [...receptionKeys.all, 'station', stationId] as const,
  reach: (stationId: number, filter: ReceptionFilter) => [...receptionKeys.station(stationId), 'reach', filter] as const,
  page: (stationId: number, request: ReceptionPageRequest) => [...receptionKeys.station(stationId), 'page', request] as const,
  atAGlance: () => [...receptionKeys.all, 'at-a-glance'] as const,
};

function filterParams(filter: ReceptionFilter): URLSearchParams {
  const params = new URLSearchParams({ from: filter.from, to: filter.to });
  if (filter.bandId) params.set('band', filter.bandId);
  return params;
}

/** The address of the whole period as our CSV (the server answers with an attachment). */
export function receptionsCsvHref(stationId: number, filter: ReceptionFilter, sort: ReceptionSort = 'time', order: 'asc' | 'desc' = 'asc') {
  const params = filterParams(filter);
  params.set('sort', sort);
  params.set('order', order);
  params.set('format', 'csv');
  return `/api/stations/${stationId}/receptions?${params.toString()}`;
}

export function useReachQuery(stationId: number, filter: ReceptionFilter) {
  return useQuery({
    queryKey: receptionKeys.reach(stationId, filter),
    queryFn: () => api<Reach>(`/stations/${stationId}/reach?${filterParams(filter).toString()}`),
    enabled: Number.isInteger(stationId) && stationId > 0,
    staleTime: staleTime.short,
    placeholderData: keepPreviousData,
  });
}

export function useReceptionPageQuery(stationId: number, request: ReceptionPageRequest, enabled = true) {
  return useQuery({
    queryKey: receptionKeys.page(stationId, request),
    queryFn: () => {
      const params = filterParams(request);
      params.set('page', String(request.page));
      params.set('pageSize', String(request.pageSize));
      params.set('sort', request.sort);
      params.set('order', request.order);
      return api<ReceptionPage>(`/stations/${stationId}/receptions?${params.toString()}`);
    },
    enabled: enabled && Number.isInteger(stationId) && stationId > 0,
    staleTime: staleTime.short,
    placeholderData: keepPreviousData,
  });
}

/** Each station's state for the overview; refreshed every minute while it is on screen. */
export function useStationsAtAGlanceQuery() {
  return useQuery({
    queryKey: receptionKeys.atAGlance(),
    queryFn: () => api<StationAtAGlance[]>('/stations/at-a-glance'),
    staleTime: staleTime.short,
    refetchInterval: 60_000,
  });
}
