import { zodResolver } from '@hookform/resolvers/zod';
import { useForm } from 'react-hook-form';
import type { z } from 'zod';

import { registerInput, type RegisterInput } from '@/shared/schemas';

import { serverMessage, submitWithServerErrors } from '../form/apply-server-errors';
import { FormTextField } from '../form/form-text-field';
import { Button } from '../ui/button';
import { Notice } from '../ui/notice';

export type RegisterFormProps = { onSubmit: (values: RegisterInput) => Promise<unknown> };

type RegisterFields = z.input<typeof registerInput>;

export function RegisterForm({ onSubmit }: RegisterFormProps) {
  const form = useForm<RegisterFields, unknown, RegisterInput>({
    resolver: zodResolver(registerInput),
    defaultValues: { email: '', displayName: '', callsign: '', password: '' },
  });
  const submit = submitWithServerErrors(form, onSubmit);
  const message = serverMessage(form.formState.errors);
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
      <FormTextField control={form.control} name="displayName" label="Display name" autoComplete="name" />
      <FormTextField
        control={form.control}
        name="callsign"
        label="Callsign (optional)"
        hint="Your own licensed callsign, if you have one."
        upperCase
        mono
        autoCorrect={false}
      />
      <FormTextField
        control={form.control}
        name="password"
        label="Password"
        hint="At least 10 characters."
        secureTextEntry
        autoComplete="new-password"
        onSubmitEditing={submit}
      />
      <Button label="Create account" onPress={submit} busy={form.formState.isSubmitting} />
    </>
  );
}
