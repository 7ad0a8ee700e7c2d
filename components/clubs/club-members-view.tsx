import type { UseQueryResult } from '@tanstack/react-query';
import { StyleSheet, View } from 'react-native';

import type { ClubDetail, ClubInput, ClubMember, Invitation } from '@/shared/schemas';

import { Button } from '../ui/button';
import { Card } from '../ui/card';
import { Notice } from '../ui/notice';
import { ErrorState, LoadingState } from '../ui/query-states';
import { Text } from '../ui/text';
import { space } from '../ui/theme';
import { ClubForm } from './club-form';
import { InvitationList } from './invitation-list';
import { InviteForm, type InviteInput } from './invite-form';
import { MemberList } from './member-list';
import { Heading } from '../ui/heading';

export type ClubMembersViewProps = {
  club: ClubDetail;
  myUserId: number;
  invitations: Pick<UseQueryResult<Invitation[]>, 'isPending' | 'isError' | 'error' | 'data' | 'refetch'>;
  roleError?: string;
  busyUserId?: number | null;
  onInvite: (values: InviteInput) => Promise<unknown>;
  onUpdateClub: (values: ClubInput) => Promise<unknown>;
  onSetRole: (member: ClubMember, role: 'admin' | 'member') => void;
  onRemove: (member: ClubMember) => void;
  onLeave: () => void;
};

export function ClubMembersView({
  club,
  myUserId,
  invitations,
  roleError,
  busyUserId,
  onInvite,
  onUpdateClub,
  onSetRole,
  onRemove,
  onLeave,
}: ClubMembersViewProps) {
  const isAdmin = club.myRole === 'admin';
  const admins = club.members.filter((member) => member.role === 'admin').length;
  const lastAdmin = isAdmin && admins === 1;
  return (
    <View style={styles.wrap}>
      <Text tone="muted">
        {club.members.length} {club.members.length === 1 ? 'member' : 'members'} · power limit {club.maxPowerDbm} dBm
      </Text>
      {roleError ? <Notice message={roleError} /> : null}
      <MemberList
        members={club.members}
        myUserId={myUserId}
        canManage={isAdmin}
        busyUserId={busyUserId}
        onSetRole={onSetRole}
        onRemove={onRemove}
      />
      {isAdmin ? (
        <Card style={styles.section}>
          <Heading level={2}>Invite a member</Heading>
          <InviteForm onSubmit={onInvite} />
          <Text variant="label" tone="muted" style={styles.pendingTitle}>
            Waiting for an answer
          </Text>
          {invitations.isPending ? (
            <LoadingState label="Loading invitations…" />
          ) : invitations.isError ? (
            <ErrorState title="The invitations could not be loaded" error={invitations.error} onRetry={() => invitations.refetch()} />
          ) : (
            <InvitationList clubId={club.id} invitations={invitations.data ?? []} />
          )}
        </Card>
      ) : null}
      {isAdmin ? (
        <Card style={styles.section}>
          <Heading level={2}>Club settings</Heading>
          <ClubForm
            initialValues={{ name: club.name, maxPowerDbm: club.maxPowerDbm }}
            submitLabel="Save club settings"
            onSubmit={onUpdateClub}
          />
        </Card>
      ) : null}
      <Card style={styles.section}>
        <Heading level={2}>Leave the club</Heading>
        <Text tone="muted">
          {lastAdmin
            ? 'You are the only admin. A club always keeps one: make another member an admin before you leave.'
            : 'Your stations leave the club’s review and plan. You need a new invitation to come back.'}
        </Text>
        <Button
          label="Leave club"
          variant="secondary"
          accessibilityLabel={`Leave club ${club.name}`}
          onPress={onLeave}
          style={styles.leave}
        />
      </Card>
    </View>
  );
}

const styles = StyleSheet.create({
  wrap: { gap: space.lg },
  section: { gap: space.md },
  pendingTitle: { marginTop: space.sm },
  leave: { alignSelf: 'flex-start' },
});
