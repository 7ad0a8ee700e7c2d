import { useMutation, useQuery, useQueryClient } from '@tanstack/react-query';

import { api } from '@/shared/api/client';
import type { AlertSettings, StationHealth } from '@/shared/schemas';

/** The health screens poll: a heartbeat arrives about once a minute, an alert round every minute. */
export const HEALTH_REFRESH_MS = 5_000;

export const healthKeys = {
  all: ['health'] as const,
  fleet: () => [...healthKeys.all, 'fleet'] as const,
  station: (id: number) => [...healthKeys.all, 'station', id] as const,
  club: (clubId: number) => [...healthKeys.all, 'club', clubId] as const,
};

const validId = (id: number) => Number.isInteger(id) && id > 0;

/** The operator's own stations; `live` polls (only the health screens pass it). */
export function useFleetHealthQuery({ live = false }: { live?: boolean } = {}) {
  return useQuery({
    queryKey: healthKeys.fleet(),
    queryFn: () => api<StationHealth[]>('/fleet/health'),
    staleTime: live ? 0 : 30_000,
    refetchInterval: live ? HEALTH_REFRESH_MS : false,
  });
}

export function useStationHealthQuery(id: number, { live = false }: { live?: boolean } = {}) {
  return useQuery({
    queryKey: healthKeys.station(id),
    queryFn: () => api<StationHealth>(`/stations/${id}/health`),
    enabled: validId(id),
    staleTime: live ? 0 : 30_000,
    refetchInterval: live ? HEALTH_REFRESH_MS : false,
  });
}

export function useClubHealthQuery(clubId: number, { live = false }: { live?: boolean } = {}) {
  return useQuery({
    queryKey: healthKeys.club(clubId),
    queryFn: () => api<StationHealth[]>(`/clubs/${clubId}/health`),
    enabled: validId(clubId),
    staleTime: live ? 0 : 30_000,
    refetchInterval: live ? HEALTH_REFRESH_MS : false,
  });
}

export function useSaveAlertSettingsMutation(stationId: number) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (settings: AlertSettings) => api<AlertSettings>(`/stations/${stationId}/alert-settings`, { method: 'PUT', body: settings }),
    onSuccess: (settings) => {
      queryClient.setQueryData<StationHealth>(healthKeys.station(stationId), (old) => (old ? { ...old, settings } : old));
      return queryClient.invalidateQueries({ queryKey: healthKeys.all });
    },
  });
}
