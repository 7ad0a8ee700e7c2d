import { Stack, useLocalSearchParams } from 'expo-router';

import { ConfirmEmailView } from '@/components/account/confirm-email-view';
import { AuthShell } from '@/components/auth/auth-shell';
import { useSessionQuery } from '@/components/auth/queries';

/** /confirm-email?token=…: the link mailed to a new sign-in address. Works signed in and signed out. */
export default function ConfirmEmailRoute() {
  const { token } = useLocalSearchParams<{ token?: string }>();
  const signedIn = !!useSessionQuery().data;
  return (
    <>
      <Stack.Screen options={{ title: 'Confirm your new e-mail · Faintline' }} />
      <AuthShell title="Confirm your new e-mail">
        <ConfirmEmailView token={typeof token === 'string' ? token : ''} signedIn={signedIn} />
      </AuthShell>
    </>
  );
}
