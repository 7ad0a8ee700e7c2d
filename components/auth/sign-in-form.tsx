import { zodResolver } from '@hookform/resolvers/zod';
import { useForm, useWatch } from 'react-hook-form';

import { signInInput, type SignInInput } from '@/shared/schemas';

import { serverMessage, submitWithServerErrors } from '../form/apply-server-errors';
import { FormTextField } from '../form/form-text-field';
import { Button } from '../ui/button';
import { Notice } from '../ui/notice';
import { TextLink } from '../ui/text-link';

export type SignInFormProps = { onSubmit: (values: SignInInput) => Promise<unknown> };

export function SignInForm({ onSubmit }: SignInFormProps) {
  const form = useForm<SignInInput>({
    resolver: zodResolver(signInInput),
    defaultValues: { email: '', password: '' },
  });
  // the session cache updates, and the guard shows the signed-in screens
  const submit = submitWithServerErrors(form, onSubmit);
  const message = serverMessage(form.formState.errors);
  const email = useWatch({ control: form.control, name: 'email' }).trim();
  return (
    <>
      {message ? <Notice message={message} /> : null}
      <FormTextField
        control={form.control}
        name="email"
        label="E-mail"
        autoComplete="email"
        keyboardType="email-address"
        autoCapitalize="none"
        inputMode="email"
      />
      <FormTextField
        control={form.control}
        name="password"
        label="Password"
        secureTextEntry
        autoComplete="current-password"
        onSubmitEditing={submit}
      />
      <Button label="Sign in" onPress={submit} busy={form.formState.isSubmitting} />
      {/* the address typed so far comes along to the reset screen */}
      <TextLink href={email ? `/forgot-password?email=${encodeURIComponent(email)}` : '/forgot-password'} label="Forgot your password?" />
    </>
  );
}
