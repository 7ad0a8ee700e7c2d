import { Stack } from 'expo-router';

import { AuthShell } from '@/components/auth/auth-shell';
import { DevInboxLink } from '@/components/auth/dev-inbox-link';
import { useSignInMutation } from '@/components/auth/queries';
import { SignInForm } from '@/components/auth/sign-in-form';
import { TextLink } from '@/components/ui/text-link';

export default function SignInRoute() {
  const signIn = useSignInMutation();
  return (
    <>
      <Stack.Screen options={{ title: 'Sign in · Faintline' }} />
      <AuthShell
        title="Sign in"
        footer={
          <>
            <TextLink href="/register" label="New here? Create an account" />
            <DevInboxLink />
          </>
        }
      >
        <SignInForm onSubmit={signIn.mutateAsync} />
      </AuthShell>
    </>
  );
}
