import { Stack, useLocalSearchParams } from 'expo-router';

import { AuthShell } from '@/components/auth/auth-shell';
import { DevInboxLink } from '@/components/auth/dev-inbox-link';
import { ForgotPasswordForm } from '@/components/auth/forgot-password-form';
import { useResetRequestMutation } from '@/components/auth/queries';
import { TextLink } from '@/components/ui/text-link';

export default function ForgotPasswordRoute() {
  const request = useResetRequestMutation();
  // the address typed on the sign-in screen comes along
  const { email } = useLocalSearchParams<{ email?: string }>();
  return (
    <>
      <Stack.Screen options={{ title: 'Reset password · Faintline' }} />
      <AuthShell
        title="Reset your password"
        intro="Enter the e-mail address of your account. We will send you a link to choose a new password."
        footer={
          <>
            <TextLink href="/sign-in" label="Back to sign in" />
            <DevInboxLink />
          </>
        }
      >
        <ForgotPasswordForm
          initialEmail={typeof email === 'string' ? email : ''}
          onSubmit={request.mutateAsync}
          sentMessage={request.data?.message}
        />
      </AuthShell>
    </>
  );
}
