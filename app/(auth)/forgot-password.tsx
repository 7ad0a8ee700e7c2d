import { Stack } from 'expo-router';

import { AuthShell } from '@/components/auth/auth-shell';
import { ForgotPasswordForm } from '@/components/auth/forgot-password-form';
import { useResetRequestMutation } from '@/components/auth/queries';
import { DEV_INBOX_PATH, env } from '@/components/env';
import { ServerPageLink, TextLink } from '@/components/ui/text-link';

export default function ForgotPasswordRoute() {
  const request = useResetRequestMutation();
  return (
    <>
      <Stack.Screen options={{ title: 'Reset password · Faintline' }} />
      <AuthShell
        title="Reset your password"
        intro="Enter the e-mail address of your account. We will send you a link to choose a new password."
        footer={
          <>
            <TextLink href="/sign-in" label="Back to sign in" />
            {env.showDevInbox ? (
              <ServerPageLink
                path={DEV_INBOX_PATH}
                label="Open the local test inbox"
                hint="Opens the development mail inbox of the local server in a new tab"
              />
            ) : null}
          </>
        }
      >
        <ForgotPasswordForm onSubmit={request.mutateAsync} sentMessage={request.data?.message} />
      </AuthShell>
    </>
  );
}
