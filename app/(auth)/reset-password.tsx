import { Stack, useLocalSearchParams } from 'expo-router';

import { AuthShell } from '@/components/auth/auth-shell';
import { useResetConfirmMutation } from '@/components/auth/queries';
import { ResetPasswordForm } from '@/components/auth/reset-password-form';
import { Notice } from '@/components/ui/notice';
import { TextLink } from '@/components/ui/text-link';

export default function ResetPasswordRoute() {
  const { token } = useLocalSearchParams<{ token?: string }>();
  const confirm = useResetConfirmMutation();
  const footer = (
    <>
      <TextLink href="/sign-in" label="Back to sign in" />
      {confirm.isError ? <TextLink href="/forgot-password" label="Ask for a new link" /> : null}
    </>
  );
  let body;
  if (confirm.isSuccess) {
    body = (
      <>
        <Notice tone="success" message={confirm.data?.message ?? 'Your password has been changed.'} />
        <TextLink href="/sign-in" label="Sign in with your new password" />
      </>
    );
  } else if (!token) {
    body = (
      <>
        <Notice message="This link has no reset code. Open the link from the e-mail again, or ask for a new one." />
        <TextLink href="/forgot-password" label="Ask for a new link" />
      </>
    );
  } else {
    body = <ResetPasswordForm token={token} onSubmit={confirm.mutateAsync} />;
  }
  return (
    <>
      <Stack.Screen options={{ title: 'Choose a new password · Faintline' }} />
      <AuthShell title="Choose a new password" footer={footer}>
        {body}
      </AuthShell>
    </>
  );
}
