import { useMutation, useQueryClient } from '@tanstack/react-query';

import type { DeviceTokenAnswer } from '@/shared/api/answers';
import { api } from '@/shared/api/client';

import { healthKeys } from '../health/queries';

/**
 * Creates the station's device token, or replaces it (the old one stops at once). The token is
 * returned to the caller only: it never enters the query cache, so no other screen can show it again.
 */
export function useIssueDeviceTokenMutation(stationId: number) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: () => api<DeviceTokenAnswer>(`/stations/${stationId}/device-token`, { method: 'POST' }),
    // drop the answer from the mutation cache as soon as nothing watches it
    gcTime: 0,
    onSuccess: () => queryClient.invalidateQueries({ queryKey: healthKeys.all }),
  });
}

export function useRevokeDeviceTokenMutation(stationId: number) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: () => api<void>(`/stations/${stationId}/device-token`, { method: 'DELETE' }),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: healthKeys.all }),
  });
}
