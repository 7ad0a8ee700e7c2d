import { useMutation, useQuery, useQueryClient } from '@tanstack/react-query';

import type { Notice } from '@/shared/api/answers';
import { api } from '@/shared/api/client';

import { staleTime } from '../query/query-client';

/** A notice as GET /api/notifications answers it. */
export type AppNotice = Notice;

export const noticeKeys = {
  all: ['notices'] as const,
  list: () => [...noticeKeys.all, 'list'] as const,
};

export function useNoticesQuery(enabled = true) {
  return useQuery({
    queryKey: noticeKeys.list(),
    queryFn: () => api<AppNotice[]>('/notifications'),
    enabled,
    staleTime: staleTime.short,
    // new notices (a proposal, a suspension) arrive without the operator doing anything
    refetchInterval: 60_000,
  });
}

export function useMarkNoticeReadMutation() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (id: number) => api<void>(`/notifications/${id}/read`, { method: 'POST' }),
    onSuccess: (_data, id) => {
      const readAt = new Date().toISOString();
      queryClient.setQueryData<AppNotice[]>(noticeKeys.list(), (list) =>
        list?.map((notice) => (notice.id === id && !notice.readAt ? { ...notice, readAt } : notice)),
      );
    },
  });
}

export function useMarkAllNoticesReadMutation() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: () => api<{ marked: number }>('/notifications/read-all', { method: 'POST' }),
    onSuccess: () => {
      const readAt = new Date().toISOString();
      queryClient.setQueryData<AppNotice[]>(noticeKeys.list(), (list) =>
        list?.map((notice) => (notice.readAt ? notice : { ...notice, readAt })),
      );
    },
  });
}

export function unreadCount(notices: AppNotice[] | undefined): number {
  return notices?.filter((notice) => !notice.readAt).length ?? 0;
}
