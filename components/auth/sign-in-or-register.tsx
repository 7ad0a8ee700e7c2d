import { useState } from 'react';

import { SegmentedChoice } from '../ui/segmented-choice';
import { useRegisterMutation, useSignInMutation } from './queries';
import { RegisterForm } from './register-form';
import { SignInForm } from './sign-in-form';

/** Sign in or create an account without leaving the page (invitation and pairing links come back to it). */
export function SignInOrRegister() {
  const signIn = useSignInMutation();
  const register = useRegisterMutation();
  const [mode, setMode] = useState<'sign-in' | 'register'>('sign-in');
  return (
    <>
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
    </>
  );
}
