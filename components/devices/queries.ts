import { queryOptions, useMutation, useQuery, useQueryClient } from '@tanstack/react-query';

import type { DeviceTokenAnswer } from '@/shared/api/answers';
import { api } from '@/shared/api/client';
import type { PairingApproveInput, PairingDecision, PairingRequestView } from '@/shared/schemas';

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

export const pairingKeys = {
  all: ['pairing'] as const,
  request: (userCode: string) => [...pairingKeys.all, 'request', userCode] as const,
};

/**
 * The device waiting with this code. Looked up once per code typed: a wrong code counts against
 * the owner's allowance on the server, so nothing refetches it behind their back.
 */
export const pairingRequestQuery = (userCode: string) =>
  queryOptions({
    queryKey: pairingKeys.request(userCode),
    queryFn: () => api<PairingRequestView>(`/pairing/${encodeURIComponent(userCode)}`),
    retry: false,
    staleTime: Infinity,
    refetchOnWindowFocus: false,
    refetchOnReconnect: false,
  });

export function usePairingRequestQuery(userCode: string | null) {
  return useQuery({ ...pairingRequestQuery(userCode ?? ''), enabled: !!userCode });
}

/** Looks a typed code up (rejecting with the server's answer), leaving the result in the cache. */
export function useLookUpPairing() {
  const queryClient = useQueryClient();
  return (userCode: string) => queryClient.fetchQuery(pairingRequestQuery(userCode));
}

export function useApprovePairingMutation() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: ({ userCode, targetId }: { userCode: string } & PairingApproveInput) =>
      api<PairingDecision>(`/pairing/${encodeURIComponent(userCode)}/approve`, { method: 'POST', body: { targetId } }),
    onSuccess: (_decision, { userCode }) => {
      queryClient.removeQueries({ queryKey: pairingKeys.request(userCode) }); // the code is spent
      return queryClient.invalidateQueries({ queryKey: healthKeys.all });
    },
  });
}

export function useRefusePairingMutation() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (userCode: string) => api<PairingDecision>(`/pairing/${encodeURIComponent(userCode)}/refuse`, { method: 'POST' }),
    onSuccess: (_decision, userCode) => queryClient.removeQueries({ queryKey: pairingKeys.request(userCode) }),
  });
}
