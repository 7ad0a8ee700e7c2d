import { useMutation, useQuery, useQueryClient } from '@tanstack/react-query';

import { api } from '@/shared/api/client';
import type { IssuedToken, ListeningPost } from '@/shared/api/receptions';
import type { ListeningPostInput } from '@/shared/schemas/reception';

import { staleTime } from '../query/query-client';

export const listeningPostKeys = {
  all: ['listening-posts'] as const,
  list: () => [...listeningPostKeys.all, 'list'] as const,
};

export function useListeningPostsQuery() {
  return useQuery({
    queryKey: listeningPostKeys.list(),
    queryFn: () => api<ListeningPost[]>('/listening-posts'),
    staleTime: staleTime.short,
  });
}

export function useCreateListeningPostMutation() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (input: ListeningPostInput) => api<ListeningPost>('/listening-posts', { method: 'POST', body: input }),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: listeningPostKeys.list() }),
  });
}

/**
 * Issues a listening post's token (a new one replaces the old at once). The token goes to the caller
 * only and never into the query cache, so no other screen can show it again.
 */
export function useIssueListeningPostTokenMutation() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (postId: number) => api<IssuedToken>(`/listening-posts/${postId}/token`, { method: 'POST' }),
    gcTime: 0,
    onSuccess: () => queryClient.invalidateQueries({ queryKey: listeningPostKeys.list() }),
  });
}

export function useDeleteListeningPostMutation() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (postId: number) => api<void>(`/listening-posts/${postId}`, { method: 'DELETE' }),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: listeningPostKeys.list() }),
  });
}
