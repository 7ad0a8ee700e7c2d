import { router, Stack, useLocalSearchParams } from 'expo-router';
import { useState } from 'react';

import { useSessionQuery } from '@/components/auth/queries';
import { ClubMembersView } from '@/components/clubs/club-members-view';
import { ClubNav } from '@/components/clubs/club-nav';
import {
  useClubQuery,
  useInvitationsQuery,
  useInviteMutation,
  useRemoveMemberMutation,
  useSetMemberRoleMutation,
  useUpdateClubMutation,
} from '@/components/clubs/queries';
import { ConfirmDialog } from '@/components/ui/confirm-dialog';
import { ErrorState, LoadingState } from '@/components/ui/query-states';
import { Screen } from '@/components/ui/screen';
import type { ClubMember } from '@/shared/schemas';

export default function ClubMembersRoute() {
  const clubId = Number(useLocalSearchParams<{ clubId: string }>().clubId);
  const me = useSessionQuery().data;
  const club = useClubQuery(clubId);
  const isAdmin = club.data?.myRole === 'admin';
  const invitations = useInvitationsQuery(clubId, isAdmin);
  const invite = useInviteMutation(clubId);
  const setRole = useSetMemberRoleMutation(clubId);
  const remove = useRemoveMemberMutation(clubId);
  const update = useUpdateClubMutation(clubId);
  const [leaving, setLeaving] = useState<ClubMember | null>(null);
  const [removeError, setRemoveError] = useState<string>();
  const [roleError, setRoleError] = useState<string>();

  if (club.isPending)
    return (
      <Screen>
        <LoadingState label="Loading the club…" />
      </Screen>
    );
  if (club.isError)
    return (
      <Screen>
        <ErrorState title="The club could not be loaded" error={club.error} onRetry={() => club.refetch()} />
      </Screen>
    );
  const self = leaving?.userId === me?.id;
  const closeDialog = () => {
    setLeaving(null);
    setRemoveError(undefined);
  };
  const confirmRemove = async () => {
    if (!leaving) return;
    try {
      await remove.mutateAsync({ userId: leaving.userId, self });
      closeDialog();
      if (self) router.replace('/club');
    } catch (error) {
      setRemoveError(error instanceof Error ? error.message : 'That did not work. Try again.');
    }
  };
  return (
    <Screen
      overlay={
        <ConfirmDialog
          visible={!!leaving}
          title={self ? `Leave ${club.data.name}?` : `Remove ${leaving?.displayName}?`}
          message={
            self
              ? 'Your stations leave the club’s review and plan. To come back you need a new invitation. A club always keeps at least one admin: if you are the last one, make another member an admin first.'
              : `${leaving?.displayName} leaves the club and their stations leave its review and plan. They need a new invitation to come back.`
          }
          confirmLabel={self ? 'Leave club' : 'Remove member'}
          destructive
          busy={remove.isPending}
          error={removeError}
          onConfirm={confirmRemove}
          onCancel={closeDialog}
        />
      }
    >
      <Stack.Screen options={{ title: `${club.data.name} · Members` }} />
      <ClubNav clubId={clubId} clubName={club.data.name} current="members" isAdmin={isAdmin} />
      <ClubMembersView
        club={club.data}
        myUserId={me?.id ?? 0}
        invitations={invitations}
        roleError={roleError}
        busyUserId={setRole.isPending ? setRole.variables?.userId : null}
        onInvite={(values) => invite.mutateAsync(values)}
        onUpdateClub={(values) => update.mutateAsync(values)}
        onSetRole={async (member, role) => {
          setRoleError(undefined);
          try {
            await setRole.mutateAsync({ userId: member.userId, role });
          } catch (error) {
            setRoleError(error instanceof Error ? error.message : 'That did not work. Try again.');
          }
        }}
        onRemove={setLeaving}
        onLeave={() => me && setLeaving(club.data.members.find((member) => member.userId === me.id) ?? null)}
      />
    </Screen>
  );
}
