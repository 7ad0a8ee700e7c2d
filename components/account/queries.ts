import { useMutation, useQuery, useQueryClient } from '@tanstack/react-query';

import type { AccountDeletionPreview, MessageAnswer, PendingEmailChange, SessionsEndedAnswer } from '@/shared/api/answers';
import { api } from '@/shared/api/client';
import type { AccountDeleteInput, EmailChangeInput, EmailConfirmInput, PasswordChangeInput } from '@/shared/schemas';

import { sessionKeys } from '../auth/queries';

export const accountKeys = {
  all: ['account'] as const,
  emailChange: () => [...accountKeys.all, 'email-change'] as const,
  deletion: () => [...accountKeys.all, 'deletion'] as const,
};

export function useEndOtherSessionsMutation() {
  return useMutation({
    mutationFn: () => api<SessionsEndedAnswer>('/auth/sessions/end-others', { method: 'POST' }),
  });
}

export function useChangePasswordMutation() {
  return useMutation({
    mutationFn: (input: PasswordChangeInput) => api<SessionsEndedAnswer>('/auth/password', { method: 'POST', body: input }),
  });
}

export function usePendingEmailChangeQuery() {
  return useQuery({ queryKey: accountKeys.emailChange(), queryFn: () => api<PendingEmailChange>('/auth/email-change') });
}

export function useRequestEmailChangeMutation() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (input: EmailChangeInput) => api<MessageAnswer>('/auth/email-change', { method: 'POST', body: input }),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: accountKeys.emailChange() }),
  });
}

export function useCancelEmailChangeMutation() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: () => api<void>('/auth/email-change', { method: 'DELETE' }),
    onSuccess: () => queryClient.setQueryData(accountKeys.emailChange(), null),
  });
}

/** Opening the mailed link; whoever is signed in here sees their address afresh. */
export function useConfirmEmailMutation() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (input: EmailConfirmInput) => api<MessageAnswer>('/auth/email-change/confirm', { method: 'POST', body: input }),
    onSuccess: async () => {
      await queryClient.invalidateQueries({ queryKey: accountKeys.all });
      await queryClient.invalidateQueries({ queryKey: sessionKeys.me() });
    },
  });
}

export function useDeletionPreviewQuery() {
  return useQuery({ queryKey: accountKeys.deletion(), queryFn: () => api<AccountDeletionPreview>('/auth/account/deletion') });
}

/** Deletes the account; the client forgets everything it held and shows the signed-out screens. */
export function useDeleteAccountMutation() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (input: AccountDeleteInput) => api<MessageAnswer>('/auth/account/delete', { method: 'POST', body: input }),
    onSuccess: () => {
      queryClient.removeQueries({ predicate: (query) => query.queryKey[0] !== sessionKeys.all[0] });
      queryClient.setQueryData(sessionKeys.me(), null);
    },
  });
}
