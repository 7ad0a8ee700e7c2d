import { router, Stack } from 'expo-router';
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
import { QueryBoundary } from '@/components/query/query-boundary';
import { useConfirmedMutation } from '@/components/query/use-confirmed-mutation';
import { useRouteId } from '@/components/query/use-route-id';
import { ConfirmDialog } from '@/components/ui/confirm-dialog';
import { Screen } from '@/components/ui/screen';
import type { ClubMember } from '@/shared/schemas';

export default function ClubMembersRoute() {
  const { id: clubId } = useRouteId('clubId');
  const me = useSessionQuery().data;
  const club = useClubQuery(clubId);
  const isAdmin = club.data?.myRole === 'admin';
  const invitations = useInvitationsQuery(clubId, isAdmin);
  const invite = useInviteMutation(clubId);
  const setRole = useSetMemberRoleMutation(clubId);
  const update = useUpdateClubMutation(clubId);
  const remove = useConfirmedMutation(useRemoveMemberMutation(clubId), null as ClubMember | null);
  const [roleError, setRoleError] = useState<string>();
  const self = remove.asking !== null && remove.asking.userId === me?.id;
  const clubName = club.data?.name ?? 'the club';

  return (
    <Screen
      overlay={
        <ConfirmDialog
          {...remove.dialog}
          title={self ? `Leave ${clubName}?` : `Remove ${remove.asking?.displayName}?`}
          message={
            self
              ? 'Your stations leave the club’s review and plan. To come back you need a new invitation. A club always keeps at least one admin: if you are the last one, make another member an admin first.'
              : `${remove.asking?.displayName} leaves the club and their stations leave its review and plan. They need a new invitation to come back.`
          }
          confirmLabel={self ? 'Leave club' : 'Remove member'}
          destructive
          onConfirm={() => remove.asking && remove.confirm({ userId: remove.asking.userId, self }, () => self && router.replace('/club'))}
        />
      }
    >
      <QueryBoundary query={club} noun="club">
        {(data) => (
          <>
            <Stack.Screen options={{ title: `${data.name} · Members` }} />
            <ClubNav clubId={clubId} clubName={data.name} current="members" isAdmin={isAdmin} />
            <ClubMembersView
              club={data}
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
              onRemove={(member) => remove.ask(member)}
              onLeave={() => {
                const mine = data.members.find((member) => member.userId === me?.id);
                if (mine) remove.ask(mine);
              }}
            />
          </>
        )}
      </QueryBoundary>
    </Screen>
  );
}
