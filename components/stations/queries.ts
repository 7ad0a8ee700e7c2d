import { useMutation, useQuery, useQueryClient, type QueryClient } from '@tanstack/react-query';

import { api } from '@/shared/api/client';
import type { Station, StationInput, StationPatch } from '@/shared/schemas';

import { staleTime } from '../query/query-client';

export const stationKeys = {
  all: ['stations'] as const,
  list: () => [...stationKeys.all, 'list'] as const,
  detail: (id: number) => [...stationKeys.all, 'detail', id] as const,
  club: (clubId: number) => [...stationKeys.all, 'club', clubId] as const,
};

/** The operator's list and any club lists: everything under stationKeys.all except details. */
function invalidateStationLists(queryClient: QueryClient) {
  return queryClient.invalidateQueries({
    queryKey: stationKeys.all,
    predicate: (query) => query.queryKey[1] !== 'detail',
  });
}

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
      return invalidateStationLists(queryClient);
    },
  });
}

export function useUpdateStationMutation(id: number) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (patch: StationPatch) => api<Station>(`/stations/${id}`, { method: 'PATCH', body: patch }),
    onSuccess: (updated) => {
      queryClient.setQueryData(stationKeys.detail(id), updated);
      return invalidateStationLists(queryClient);
    },
  });
}

export function useDeleteStationMutation(id: number) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: () => api<void>(`/stations/${id}`, { method: 'DELETE' }),
    // the detail screen is still on show while it navigates away: refetch only the lists, so it does
    // not ask for a station that is gone; its own cache entry is collected once nothing watches it
    onSuccess: () => invalidateStationLists(queryClient),
  });
}
