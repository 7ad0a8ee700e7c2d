import { zodResolver } from '@hookform/resolvers/zod';
import { useForm } from 'react-hook-form';

import { resetRequestInput, type ResetRequestInput } from '@/shared/schemas';

import { serverMessage, submitWithServerErrors } from '../form/apply-server-errors';
import { FormTextField } from '../form/form-text-field';
import { Button } from '../ui/button';
import { Notice } from '../ui/notice';

export type ForgotPasswordFormProps = {
  onSubmit: (values: ResetRequestInput) => Promise<unknown>;
  /** What was typed on the sign-in screen. */
  initialEmail?: string;
  /** The server's answer once the request went through. */
  sentMessage?: string;
};

export function ForgotPasswordForm({ onSubmit, sentMessage, initialEmail = '' }: ForgotPasswordFormProps) {
  const form = useForm<ResetRequestInput>({
    resolver: zodResolver(resetRequestInput),
    defaultValues: { email: initialEmail.slice(0, 190) },
  });
  const submit = submitWithServerErrors(form, onSubmit);
  const message = serverMessage(form.formState.errors);
  return (
    <>
      {sentMessage ? <Notice tone="success" message={sentMessage} /> : null}
      {message ? <Notice message={message} /> : null}
      <FormTextField
        control={form.control}
        name="email"
        label="E-mail"
        autoComplete="email"
        keyboardType="email-address"
        autoCapitalize="none"
        inputMode="email"
        onSubmitEditing={submit}
      />
      <Button
        label={sentMessage ? 'Send the link again' : 'Send reset link'}
        variant={sentMessage ? 'secondary' : 'primary'}
        onPress={submit}
        busy={form.formState.isSubmitting}
      />
    </>
  );
}
