import { useQuery } from '@tanstack/react-query';

import type { AuditEntry } from '@/shared/api/answers';
import { api } from '@/shared/api/client';

import { staleTime } from '../query/query-client';

export type { AuditEntry };

export const auditKeys = {
  all: ['audit'] as const,
  mine: () => [...auditKeys.all, 'mine'] as const,
  club: (clubId: number) => [...auditKeys.all, 'club', clubId] as const,
};

/** The same list as a CSV file, for a plain download link. */
export const auditCsvPath = {
  mine: () => '/api/audit?format=csv',
  club: (clubId: number) => `/api/clubs/${clubId}/audit?format=csv`,
};

export function useMyAuditQuery() {
  return useQuery({ queryKey: auditKeys.mine(), queryFn: () => api<AuditEntry[]>('/audit'), staleTime: staleTime.short });
}

export function useClubAuditQuery(clubId: number) {
  return useQuery({
    queryKey: auditKeys.club(clubId),
    queryFn: () => api<AuditEntry[]>(`/clubs/${clubId}/audit`),
    enabled: Number.isInteger(clubId) && clubId > 0,
    staleTime: staleTime.short,
  });
}
