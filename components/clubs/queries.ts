import { useMutation, useQuery, useQueryClient, type QueryClient } from '@tanstack/react-query';

import type {
  AcceptedInvitation,
  BandDuty,
  ClubConflict,
  ClubConflicts,
  ClubOccupancy,
  ConflictProposal,
  ConflictStation,
  OccupancyCell,
  SuspensionAnswer,
} from '@/shared/api/answers';
import { api } from '@/shared/api/client';
import type { ClubDetail, ClubInput, Invitation, OffsetProposal, ReviewRow } from '@/shared/schemas';

import { sessionKeys } from '../auth/queries';
import { staleTime } from '../query/query-client';
import { stationKeys } from '../stations/queries';

export type { BandDuty, ClubConflict, ClubConflicts, ClubOccupancy, ConflictProposal, ConflictStation, OccupancyCell };

export const clubKeys = {
  all: ['clubs'] as const,
  detail: (clubId: number) => [...clubKeys.all, clubId, 'detail'] as const,
  invitations: (clubId: number) => [...clubKeys.all, clubId, 'invitations'] as const,
  review: (clubId: number) => [...clubKeys.all, clubId, 'review'] as const,
  conflicts: (clubId: number) => [...clubKeys.all, clubId, 'conflicts'] as const,
  occupancy: (clubId: number) => [...clubKeys.all, clubId, 'occupancy'] as const,
  /** the owner's side: proposals for the operator's own stations */
  myProposals: () => ['offset-proposals', 'mine'] as const,
};

const validId = (id: number) => Number.isInteger(id) && id > 0;

/** Membership shows in the shell (tabs, admin links): the session carries it. */
function refreshSession(queryClient: QueryClient) {
  return queryClient.invalidateQueries({ queryKey: sessionKeys.me() });
}

export function useClubQuery(clubId: number) {
  return useQuery({
    queryKey: clubKeys.detail(clubId),
    queryFn: () => api<ClubDetail>(`/clubs/${clubId}`),
    enabled: validId(clubId),
    staleTime: staleTime.normal,
  });
}

export function useCreateClubMutation() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (input: ClubInput) => api<ClubDetail>('/clubs', { method: 'POST', body: input }),
    onSuccess: async (club) => {
      queryClient.setQueryData(clubKeys.detail(club.id), club);
      await refreshSession(queryClient);
    },
  });
}

/** Name and power limit; the limit changes the review's verdicts, the name shows in the shell. */
export function useUpdateClubMutation(clubId: number) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (input: ClubInput) => api<ClubDetail>(`/clubs/${clubId}`, { method: 'PATCH', body: input }),
    onSuccess: async (club) => {
      queryClient.setQueryData(clubKeys.detail(clubId), club);
      await Promise.all([queryClient.invalidateQueries({ queryKey: clubKeys.review(clubId) }), refreshSession(queryClient)]);
    },
  });
}

export function useRemoveMemberMutation(clubId: number) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: ({ userId }: { userId: number; self: boolean }) => api<void>(`/clubs/${clubId}/members/${userId}`, { method: 'DELETE' }),
    onSuccess: async (_data, { self }) => {
      if (self) {
        queryClient.removeQueries({ queryKey: [...clubKeys.all, clubId] });
        await refreshSession(queryClient);
      } else {
        await queryClient.invalidateQueries({ queryKey: [...clubKeys.all, clubId] });
      }
    },
  });
}

export function useSetMemberRoleMutation(clubId: number) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: ({ userId, role }: { userId: number; role: 'admin' | 'member' }) =>
      api<ClubDetail>(`/clubs/${clubId}/members/${userId}`, { method: 'PATCH', body: { role } }),
    onSuccess: async (club) => {
      queryClient.setQueryData(clubKeys.detail(clubId), club);
      await refreshSession(queryClient); // the admin may have handed over their own role
    },
  });
}

export function useInvitationsQuery(clubId: number, enabled = true) {
  return useQuery({
    queryKey: clubKeys.invitations(clubId),
    queryFn: () => api<Invitation[]>(`/clubs/${clubId}/invitations`),
    enabled: enabled && validId(clubId),
    staleTime: staleTime.short,
  });
}

export function useInviteMutation(clubId: number) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (input: { email: string }) => api<Invitation>(`/clubs/${clubId}/invitations`, { method: 'POST', body: input }),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: clubKeys.invitations(clubId) }),
  });
}

export function useRevokeInvitationMutation(clubId: number) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (invitationId: number) => api<void>(`/clubs/${clubId}/invitations/${invitationId}`, { method: 'DELETE' }),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: clubKeys.invitations(clubId) }),
  });
}

export function useResendInvitationMutation(clubId: number) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (invitationId: number) => api<void>(`/clubs/${clubId}/invitations/${invitationId}/resend`, { method: 'POST' }),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: clubKeys.invitations(clubId) }),
  });
}

export function useAcceptInvitationMutation() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (token: string) => api<AcceptedInvitation>('/invitations/accept', { method: 'POST', body: { token } }),
    onSuccess: () => refreshSession(queryClient),
  });
}

export function useReviewQuery(clubId: number) {
  return useQuery({
    queryKey: clubKeys.review(clubId),
    queryFn: () => api<ReviewRow[]>(`/clubs/${clubId}/review`),
    enabled: validId(clubId),
    staleTime: staleTime.short,
  });
}

export function useSuspendMutation(clubId: number) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: ({ stationId, reason }: { stationId: number; reason: string }) =>
      api<SuspensionAnswer>(`/clubs/${clubId}/stations/${stationId}/suspension`, { method: 'POST', body: { reason } }),
    onSuccess: (_data, { stationId }) => afterSuspensionChange(queryClient, clubId, stationId),
  });
}

export function useLiftSuspensionMutation(clubId: number) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: ({ stationId }: { stationId: number }) =>
      api<void>(`/clubs/${clubId}/stations/${stationId}/suspension`, { method: 'DELETE' }),
    onSuccess: (_data, { stationId }) => afterSuspensionChange(queryClient, clubId, stationId),
  });
}

function afterSuspensionChange(queryClient: QueryClient, clubId: number, stationId: number) {
  return Promise.all([
    queryClient.invalidateQueries({ queryKey: [...clubKeys.all, clubId] }),
    queryClient.invalidateQueries({ queryKey: stationKeys.detail(stationId) }),
    queryClient.invalidateQueries({ queryKey: stationKeys.club(clubId) }),
  ]);
}

export function useConflictsQuery(clubId: number) {
  return useQuery({
    queryKey: clubKeys.conflicts(clubId),
    queryFn: () => api<ClubConflicts>(`/clubs/${clubId}/conflicts`),
    enabled: validId(clubId),
    staleTime: staleTime.short,
  });
}

export function useProposeOffsetMutation(clubId: number) {
  return useMutation({
    mutationFn: (input: { stationId: number; proposedOffsetHz: number }) =>
      api<OffsetProposal>(`/clubs/${clubId}/offset-proposals`, { method: 'POST', body: input }),
  });
}

export function useOccupancyQuery(clubId: number) {
  return useQuery({
    queryKey: clubKeys.occupancy(clubId),
    queryFn: () => api<ClubOccupancy>(`/clubs/${clubId}/occupancy`),
    enabled: validId(clubId),
    staleTime: staleTime.normal,
  });
}

export function useMyProposalsQuery() {
  return useQuery({
    queryKey: clubKeys.myProposals(),
    queryFn: () => api<OffsetProposal[]>('/offset-proposals'),
    staleTime: staleTime.short,
  });
}

export function useDecideProposalMutation() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: ({ id, decision }: { id: number; decision: 'accept' | 'decline' }) =>
      api<OffsetProposal>(`/offset-proposals/${id}/${decision}`, { method: 'POST' }),
    onSuccess: (decided) => {
      queryClient.setQueryData<OffsetProposal[]>(clubKeys.myProposals(), (list) =>
        list?.map((proposal) => (proposal.id === decided.id ? decided : proposal)),
      );
      return Promise.all([
        queryClient.invalidateQueries({ queryKey: clubKeys.myProposals() }),
        queryClient.invalidateQueries({ queryKey: stationKeys.detail(decided.stationId) }),
      ]);
    },
  });
}
