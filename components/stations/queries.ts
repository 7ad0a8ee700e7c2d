import { useMutation, useQuery, useQueryClient } from '@tanstack/react-query';

import { api } from '@/shared/api/client';
import type { Station, StationInput, StationPatch } from '@/shared/schemas';

import { staleTime } from '../query/query-client';

export const stationKeys = {
  all: ['stations'] as const,
  list: () => [...stationKeys.all, 'list'] as const,
  detail: (id: number) => [...stationKeys.all, 'detail', id] as const,
  club: (clubId: number) => [...stationKeys.all, 'club', clubId] as const,
};

export function useStationsQuery() {
  return useQuery({
    queryKey: stationKeys.list(),
    queryFn: () => api<Station[]>('/stations'),
    staleTime: staleTime.normal,
  });
}

export function useStationQuery(id: number) {
  return useQuery({
    queryKey: stationKeys.detail(id),
    queryFn: () => api<Station>(`/stations/${id}`),
    enabled: Number.isInteger(id) && id > 0,
    staleTime: staleTime.normal,
  });
}

export function useClubStationsQuery(clubId: number, enabled = true) {
  return useQuery({
    queryKey: stationKeys.club(clubId),
    queryFn: () => api<Station[]>(`/clubs/${clubId}/stations`),
    enabled: enabled && Number.isInteger(clubId),
    staleTime: staleTime.normal,
  });
}

export function useCreateStationMutation() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (input: StationInput) => api<Station>('/stations', { method: 'POST', body: input }),
    onSuccess: (created) => {
      queryClient.setQueryData(stationKeys.detail(created.id), created);
      return queryClient.invalidateQueries({ queryKey: stationKeys.list() });
    },
  });
}

export function useUpdateStationMutation(id: number) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (patch: StationPatch) =>
      api<Station>(`/stations/${id}`, { method: 'PATCH', body: patch }),
    onSuccess: (updated) => {
      queryClient.setQueryData(stationKeys.detail(id), updated);
      return queryClient.invalidateQueries({ queryKey: stationKeys.list() });
    },
  });
}

export function useDeleteStationMutation(id: number) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: () => api<void>(`/stations/${id}`, { method: 'DELETE' }),
    onSuccess: () => {
      queryClient.removeQueries({ queryKey: stationKeys.detail(id) });
      return queryClient.invalidateQueries({ queryKey: stationKeys.list() });
    },
  });
}
