import { zodResolver } from '@hookform/resolvers/zod';
import { useForm } from 'react-hook-form';

import { resetConfirmInput, type ResetConfirmInput } from '@/shared/schemas';

import { serverMessage, submitWithServerErrors } from '../form/apply-server-errors';
import { FormTextField } from '../form/form-text-field';
import { Button } from '../ui/button';
import { Notice } from '../ui/notice';

export type ResetPasswordFormProps = {
  token: string;
  onSubmit: (values: ResetConfirmInput) => Promise<unknown>;
};

export function ResetPasswordForm({ token, onSubmit }: ResetPasswordFormProps) {
  const form = useForm<ResetConfirmInput>({
    resolver: zodResolver(resetConfirmInput),
    defaultValues: { token, password: '' },
  });
  const submit = submitWithServerErrors(form, onSubmit);
  // a token problem is not something the operator can fix in a field: show it at the top
  const message = serverMessage(form.formState.errors) ?? form.formState.errors.token?.message;
  return (
    <>
      {message ? <Notice message={message} /> : null}
      <FormTextField
        control={form.control}
        name="password"
        label="New password"
        hint="At least 10 characters."
        secureTextEntry
        autoComplete="new-password"
        onSubmitEditing={submit}
      />
      <Button label="Set new password" onPress={submit} busy={form.formState.isSubmitting} />
    </>
  );
}
