import { zodResolver } from '@hookform/resolvers/zod';
import { useState } from 'react';
import { useForm } from 'react-hook-form';
import { StyleSheet, View } from 'react-native';

import type { SessionsEndedAnswer } from '@/shared/api/answers';
import { passwordChangeInput, type PasswordChangeInput } from '@/shared/schemas';

import { serverMessage, submitWithServerErrors } from '../form/apply-server-errors';
import { FormTextField } from '../form/form-text-field';
import { Button } from '../ui/button';
import { Notice } from '../ui/notice';
import { space } from '../ui/theme';

export type PasswordFormProps = { onSubmit: (values: PasswordChangeInput) => Promise<SessionsEndedAnswer> };

export const endedSessionsWords = (ended: number) =>
  ended === 0 ? 'No other session was signed in.' : `${ended} other session${ended === 1 ? ' was' : 's were'} signed out.`;

/** Change password: the current one first; other sessions end, this one stays. */
export function PasswordForm({ onSubmit }: PasswordFormProps) {
  const form = useForm<PasswordChangeInput>({
    resolver: zodResolver(passwordChangeInput),
    defaultValues: { currentPassword: '', newPassword: '' },
  });
  const [done, setDone] = useState<string | null>(null);
  const submit = submitWithServerErrors(form, async (values) => {
    setDone(null);
    const { ended } = await onSubmit(values);
    form.reset({ currentPassword: '', newPassword: '' });
    setDone(`Password changed. ${endedSessionsWords(ended)}`);
  });
  const message = serverMessage(form.formState.errors);
  return (
    <View style={styles.form}>
      {message ? <Notice message={message} /> : null}
      <FormTextField
        control={form.control}
        name="currentPassword"
        label="Current password"
        secureTextEntry
        autoComplete="current-password"
      />
      <FormTextField
        control={form.control}
        name="newPassword"
        label="New password"
        hint="At least 10 characters. Every other browser or phone signed in to your account is signed out."
        secureTextEntry
        autoComplete="new-password"
      />
      {done ? <Notice tone="success" message={done} /> : null}
      <Button label="Change password" onPress={submit} busy={form.formState.isSubmitting} style={styles.button} />
    </View>
  );
}

const styles = StyleSheet.create({
  // long lines of input are hard to read on a wide screen
  form: { gap: space.lg, maxWidth: 640 },
  button: { alignSelf: 'flex-start' },
});
