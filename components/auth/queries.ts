import { useMutation, useQuery, useQueryClient } from '@tanstack/react-query';

import type { MessageAnswer } from '@/shared/api/answers';
import { api, ApiError } from '@/shared/api/client';
import type { SessionUser } from '@/shared/api/contracts';
import type { ProfileInput, RegisterInput, ResetConfirmInput, ResetRequestInput, SignInInput } from '@/shared/schemas';

import { staleTime } from '../query/query-client';

export const sessionKeys = {
  all: ['session'] as const,
  me: () => [...sessionKeys.all, 'me'] as const,
};

/** The signed-in user, or null when signed out: a 401 is an answer, not an error. */
export async function fetchSession(): Promise<SessionUser | null> {
  try {
    return await api<SessionUser>('/auth/me');
  } catch (error) {
    if (error instanceof ApiError && error.status === 401) return null;
    throw error;
  }
}

export function useSessionQuery() {
  return useQuery({ queryKey: sessionKeys.me(), queryFn: fetchSession, staleTime: staleTime.long });
}

export function useSignInMutation() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (input: SignInInput) => api<SessionUser>('/auth/sign-in', { method: 'POST', body: input }),
    onSuccess: (user) => queryClient.setQueryData(sessionKeys.me(), user),
  });
}

export function useRegisterMutation() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (input: RegisterInput) => api<SessionUser>('/auth/register', { method: 'POST', body: input }),
    onSuccess: (user) => queryClient.setQueryData(sessionKeys.me(), user),
  });
}

export function useUpdateProfileMutation() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (input: ProfileInput) => api<SessionUser>('/auth/me', { method: 'PATCH', body: input }),
    onSuccess: (user) => queryClient.setQueryData(sessionKeys.me(), user),
  });
}

export function useSignOutMutation() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: () => api<void>('/auth/sign-out', { method: 'POST' }),
    onSuccess: () => {
      // drop every cached answer of the previous user, then mark the session as signed out
      queryClient.removeQueries({ predicate: (query) => query.queryKey[0] !== sessionKeys.all[0] });
      queryClient.setQueryData(sessionKeys.me(), null);
    },
  });
}

export function useResetRequestMutation() {
  return useMutation({
    mutationFn: (input: ResetRequestInput) => api<MessageAnswer>('/auth/password-reset', { method: 'POST', body: input }),
  });
}

export function useResetConfirmMutation() {
  return useMutation({
    mutationFn: (input: ResetConfirmInput) => api<MessageAnswer>('/auth/password-reset/confirm', { method: 'POST', body: input }),
  });
}
