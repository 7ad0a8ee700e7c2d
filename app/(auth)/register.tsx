import { Stack } from 'expo-router';

import { AuthShell } from '@/components/auth/auth-shell';
import { useRegisterMutation } from '@/components/auth/queries';
import { RegisterForm } from '@/components/auth/register-form';
import { TextLink } from '@/components/ui/text-link';

export default function RegisterRoute() {
  const register = useRegisterMutation();
  return (
    <>
      <Stack.Screen options={{ title: 'Create account · Faintline' }} />
      <AuthShell
        title="Create account"
        intro="One account for your stations, and for your club if you belong to one."
        footer={<TextLink href="/sign-in" label="Already have an account? Sign in" />}
      >
        <RegisterForm onSubmit={register.mutateAsync} />
      </AuthShell>
    </>
  );
}
