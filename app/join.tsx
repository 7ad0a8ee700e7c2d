import { router, Stack, useLocalSearchParams } from 'expo-router';
import { useState } from 'react';

import { useSessionQuery, useSignOutMutation } from '@/components/auth/queries';
import { AuthShell } from '@/components/auth/auth-shell';
import { SignInOrRegister } from '@/components/auth/sign-in-or-register';
import { JoinPanel } from '@/components/clubs/join-panel';
import { useAcceptInvitationMutation } from '@/components/clubs/queries';
import { Text } from '@/components/ui/text';

/** /join?token=…: the link in an invitation e-mail. Works signed out too: sign in or register here, then accept. */
export default function JoinRoute() {
  const { token } = useLocalSearchParams<{ token?: string }>();
  const user = useSessionQuery().data ?? null;
  const signOut = useSignOutMutation();
  const accept = useAcceptInvitationMutation();
  const [joinedClubId, setJoinedClubId] = useState<number | null>(null);

  if (!user) {
    return (
      <>
        <Stack.Screen options={{ title: 'Join a club · Faintline' }} />
        <AuthShell
          title="You are invited to a club"
          intro="Sign in, or create an account, with the e-mail address the invitation was sent to. You come straight back here to accept it."
        >
          <SignInOrRegister />
          {!token ? <Text tone="danger">This link has no invitation in it: open the link from the e-mail again.</Text> : null}
        </AuthShell>
      </>
    );
  }
  const joinedClub = joinedClubId == null ? undefined : user.clubs.find((club) => club.clubId === joinedClubId);
  return (
    <>
      <Stack.Screen options={{ title: 'Join a club · Faintline' }} />
      <AuthShell title="Join a club">
        <JoinPanel
          token={typeof token === 'string' ? token : ''}
          user={user}
          joined={joinedClubId == null ? null : { clubId: joinedClubId, clubName: joinedClub?.clubName }}
          onAccept={async (value) => {
            const { clubId } = await accept.mutateAsync(value);
            setJoinedClubId(clubId);
          }}
          onOpenClub={(clubId) => router.replace({ pathname: '/club/[clubId]', params: { clubId: String(clubId) } })}
          onSkip={() => router.replace('/')}
          onSignOut={() => signOut.mutate()}
        />
      </AuthShell>
    </>
  );
}
