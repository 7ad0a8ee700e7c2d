import { zodResolver } from '@hookform/resolvers/zod';
import { useState } from 'react';
import { useForm } from 'react-hook-form';
import { StyleSheet, View } from 'react-native';
import type { z } from 'zod';

import { invitationInput } from '@/shared/schemas';

import { enterSubmits } from '../form/enter-submits';
import { applyServerErrors, serverMessage } from '../form/apply-server-errors';
import { FormTextField } from '../form/form-text-field';
import { Button } from '../ui/button';
import { Notice } from '../ui/notice';
import { space } from '../ui/theme';

export type InviteInput = z.infer<typeof invitationInput>;
export type InviteFormProps = { onSubmit: (values: InviteInput) => Promise<unknown> };

/** Invite one person by e-mail: they get a single-use link, valid for 7 days. */
export function InviteForm({ onSubmit }: InviteFormProps) {
  const [sentTo, setSentTo] = useState<string | null>(null);
  const form = useForm<InviteInput>({ resolver: zodResolver(invitationInput), defaultValues: { email: '' } });
  const submit = form.handleSubmit(async (values) => {
    setSentTo(null);
    try {
      await onSubmit(values);
      setSentTo(values.email);
      form.reset({ email: '' });
    } catch (error) {
      applyServerErrors(form, error);
    }
  });
  enterSubmits(form.control, submit);
  const rootError = serverMessage(form.formState.errors);
  return (
    <View style={styles.form}>
      <FormTextField
        control={form.control}
        name="email"
        label="E-mail of the person to invite"
        hint="They get a link that works once, for 7 days."
        keyboardType="email-address"
        autoCapitalize="none"
        autoComplete="off"
        onSubmitEditing={submit}
      />
      {rootError ? <Notice message={rootError} /> : null}
      {sentTo ? <Notice tone="success" message={`Invitation sent to ${sentTo}.`} /> : null}
      <Button label="Send invitation" onPress={submit} busy={form.formState.isSubmitting} style={styles.button} />
    </View>
  );
}

const styles = StyleSheet.create({
  form: { gap: space.md },
  button: { alignSelf: 'flex-start' },
});
