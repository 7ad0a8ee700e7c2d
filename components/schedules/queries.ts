import { keepPreviousData, useMutation, useQuery, useQueryClient } from '@tanstack/react-query';

import type { StationPlan } from '@/shared/api/answers';
import { api, ApiError } from '@/shared/api/client';
import type { Schedule, ScheduleInput, SchedulePatch, Unit } from '@/shared/schemas';

import { staleTime } from '../query/query-client';

export const scheduleKeys = {
  all: ['schedules'] as const,
  detail: (stationId: number) => [...scheduleKeys.all, 'detail', stationId] as const,
  plans: (stationId: number) => [...scheduleKeys.all, 'plan', stationId] as const,
  plan: (stationId: number, fromIso: string, toIso: string) => [...scheduleKeys.plans(stationId), fromIso, toIso] as const,
  unit: (unitId: number) => [...scheduleKeys.all, 'unit', unitId] as const,
};

/** What GET /api/stations/:id/plan answers. */
export type ServerPlan = StationPlan;

const validId = (id: number | null | undefined): id is number => typeof id === 'number' && Number.isInteger(id) && id > 0;

/** The station's schedule, or null when it has none yet (the server's 404 is an answer, not an error). */
export function useScheduleQuery(stationId: number) {
  return useQuery({
    queryKey: scheduleKeys.detail(stationId),
    queryFn: async () => {
      try {
        return await api<Schedule>(`/stations/${stationId}/schedule`);
      } catch (error) {
        if (error instanceof ApiError && error.status === 404 && error.code === 'not-found') return null;
        throw error;
      }
    },
    enabled: validId(stationId),
    staleTime: staleTime.normal,
  });
}

/** The server's plan for [fromIso, toIso): the authority for what the device will send. */
export function usePlanQuery(stationId: number, range: { fromIso: string; toIso: string }, enabled = true) {
  return useQuery({
    queryKey: scheduleKeys.plan(stationId, range.fromIso, range.toIso),
    queryFn: () =>
      api<ServerPlan>(`/stations/${stationId}/plan?from=${encodeURIComponent(range.fromIso)}&to=${encodeURIComponent(range.toIso)}`),
    enabled: enabled && validId(stationId),
    staleTime: staleTime.short,
    placeholderData: keepPreviousData,
  });
}

/** The station's unit (filters decide which bands a step may use); null id asks for nothing. */
export function useScheduleUnitQuery(unitId: number | null | undefined) {
  return useQuery({
    queryKey: scheduleKeys.unit(validId(unitId) ? unitId : 0),
    queryFn: () => api<Unit>(`/units/${unitId}`),
    enabled: validId(unitId),
    staleTime: staleTime.normal,
  });
}

export function useSaveScheduleMutation(stationId: number, exists: boolean) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (input: ScheduleInput) =>
      api<Schedule>(`/stations/${stationId}/schedule`, { method: exists ? 'PATCH' : 'POST', body: input }),
    onSuccess: (saved) => {
      queryClient.setQueryData(scheduleKeys.detail(stationId), saved);
      return queryClient.invalidateQueries({ queryKey: scheduleKeys.plans(stationId) });
    },
  });
}

/** Pause, resume or any other partial change. */
export function usePatchScheduleMutation(stationId: number) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (patch: SchedulePatch) => api<Schedule>(`/stations/${stationId}/schedule`, { method: 'PATCH', body: patch }),
    onSuccess: (saved) => {
      queryClient.setQueryData(scheduleKeys.detail(stationId), saved);
      return queryClient.invalidateQueries({ queryKey: scheduleKeys.plans(stationId) });
    },
  });
}

export function useDeleteScheduleMutation(stationId: number) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: () => api<void>(`/stations/${stationId}/schedule`, { method: 'DELETE' }),
    onSuccess: () => {
      queryClient.setQueryData(scheduleKeys.detail(stationId), null);
      queryClient.removeQueries({ queryKey: scheduleKeys.plans(stationId) });
    },
  });
}
