import { router, Stack, useLocalSearchParams } from 'expo-router';
import { useState } from 'react';

import { useRegisterMutation, useSessionQuery, useSignInMutation, useSignOutMutation } from '@/components/auth/queries';
import { AuthShell } from '@/components/auth/auth-shell';
import { RegisterForm } from '@/components/auth/register-form';
import { SignInForm } from '@/components/auth/sign-in-form';
import { JoinPanel } from '@/components/clubs/join-panel';
import { useAcceptInvitationMutation } from '@/components/clubs/queries';
import { SegmentedChoice } from '@/components/ui/segmented-choice';
import { Text } from '@/components/ui/text';

/** /join?token=…: the link in an invitation e-mail. Works signed out too: sign in or register here, then accept. */
export default function JoinRoute() {
  const { token } = useLocalSearchParams<{ token?: string }>();
  const user = useSessionQuery().data ?? null;
  const signIn = useSignInMutation();
  const register = useRegisterMutation();
  const signOut = useSignOutMutation();
  const accept = useAcceptInvitationMutation();
  const [mode, setMode] = useState<'sign-in' | 'register'>('sign-in');
  const [joinedClubId, setJoinedClubId] = useState<number | null>(null);

  if (!user) {
    return (
      <>
        <Stack.Screen options={{ title: 'Join a club · Faintline' }} />
        <AuthShell
          title="You are invited to a club"
          intro="Sign in, or create an account, with the e-mail address the invitation was sent to. You come straight back here to accept it."
        >
          <SegmentedChoice
            label="Have an account?"
            value={mode}
            onChange={setMode}
            options={[
              { value: 'sign-in', label: 'Sign in' },
              { value: 'register', label: 'Create account' },
            ]}
          />
          {mode === 'sign-in' ? <SignInForm onSubmit={signIn.mutateAsync} /> : <RegisterForm onSubmit={register.mutateAsync} />}
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
