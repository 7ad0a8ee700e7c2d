import { useMutation, useQuery, useQueryClient } from '@tanstack/react-query';

import { api } from '@/shared/api/client';
import type { Unit, UnitInput, UnitPhoto } from '@/shared/schemas';

import { staleTime } from '../query/query-client';
import { apiUpload, type UploadProgress } from './api-upload';

export const unitKeys = {
  all: ['units'] as const,
  list: () => [...unitKeys.all, 'list'] as const,
  detail: (id: number) => [...unitKeys.all, 'detail', id] as const,
};

const validId = (id: number | null | undefined): id is number => typeof id === 'number' && Number.isInteger(id) && id > 0;

export function useUnitsQuery(enabled = true) {
  return useQuery({ queryKey: unitKeys.list(), queryFn: () => api<Unit[]>('/units'), enabled, staleTime: staleTime.normal });
}

/** One unit; pass null (a station without a unit) to ask for nothing. */
export function useUnitQuery(id: number | null | undefined) {
  return useQuery({
    queryKey: unitKeys.detail(validId(id) ? id : 0),
    queryFn: () => api<Unit>(`/units/${id}`),
    enabled: validId(id),
    staleTime: staleTime.normal,
  });
}

export function useCreateUnitMutation() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (input: UnitInput) => api<Unit>('/units', { method: 'POST', body: input }),
    onSuccess: (created) => {
      queryClient.setQueryData(unitKeys.detail(created.id), created);
      return queryClient.invalidateQueries({ queryKey: unitKeys.list() });
    },
  });
}

export function useUpdateUnitMutation(id: number) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (patch: Partial<UnitInput>) => api<Unit>(`/units/${id}`, { method: 'PATCH', body: patch }),
    onSuccess: (updated) => {
      queryClient.setQueryData(unitKeys.detail(id), updated);
      return queryClient.invalidateQueries({ queryKey: unitKeys.list() });
    },
  });
}

export function useCopyUnitMutation(id: number) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: () => api<Unit>(`/units/${id}/copy`, { method: 'POST' }),
    onSuccess: (copy) => {
      queryClient.setQueryData(unitKeys.detail(copy.id), copy);
      return queryClient.invalidateQueries({ queryKey: unitKeys.list() });
    },
  });
}

export function useDeleteUnitMutation(id: number) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: () => api<void>(`/units/${id}`, { method: 'DELETE' }),
    // stations that used the unit lose it on the server: refetch them too
    onSuccess: () =>
      Promise.all([
        queryClient.invalidateQueries({ queryKey: unitKeys.list() }),
        queryClient.invalidateQueries({ queryKey: ['stations'] }),
      ]),
  });
}

export function useUploadPhotoMutation(unitId: number, onProgress?: (progress: UploadProgress) => void) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (file: Blob & { name?: string }) => {
      const body = new FormData();
      body.append('photo', file, file.name ?? 'photo');
      return apiUpload<UnitPhoto>(`/units/${unitId}/photos`, body, onProgress);
    },
    onSuccess: () =>
      Promise.all([
        queryClient.invalidateQueries({ queryKey: unitKeys.detail(unitId) }),
        queryClient.invalidateQueries({ queryKey: unitKeys.list() }),
      ]),
  });
}

export function useDeletePhotoMutation(unitId: number) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (photoId: number) => api<void>(`/units/${unitId}/photos/${photoId}`, { method: 'DELETE' }),
    onSuccess: () =>
      Promise.all([
        queryClient.invalidateQueries({ queryKey: unitKeys.detail(unitId) }),
        queryClient.invalidateQueries({ queryKey: unitKeys.list() }),
      ]),
  });
}

/** "I fitted this filter" for hand-swapped filters: the unit, and every plan that depends on it, change. */
export function useFittedFilterMutation(unitId: number) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (filterIndex: number) => api<Unit>(`/units/${unitId}/fitted-filter`, { method: 'POST', body: { filterIndex } }),
    onSuccess: (updated) => {
      queryClient.setQueryData(unitKeys.detail(unitId), updated);
      return Promise.all([
        queryClient.invalidateQueries({ queryKey: unitKeys.list() }),
        queryClient.invalidateQueries({ queryKey: ['stations'] }),
        queryClient.invalidateQueries({ queryKey: ['schedules'] }),
      ]);
    },
  });
}
