import { zodResolver } from '@hookform/resolvers/zod';
import { useForm } from 'react-hook-form';
import { StyleSheet, View } from 'react-native';

import type { PendingEmailChange } from '@/shared/api/answers';
import { emailChangeInput, type EmailChangeInput } from '@/shared/schemas';

import { DevInboxLink } from '../auth/dev-inbox-link';
import { serverMessage, submitWithServerErrors } from '../form/apply-server-errors';
import { FormTextField } from '../form/form-text-field';
import { Button } from '../ui/button';
import { formatUtcDateTime } from '../ui/format';
import { Notice } from '../ui/notice';
import { Text } from '../ui/text';
import { space } from '../ui/theme';

export type EmailChangeFormProps = {
  currentEmail: string;
  pending: PendingEmailChange | undefined;
  /** The server's answer to the last request, once sent. */
  sentMessage?: string;
  onSubmit: (values: EmailChangeInput) => Promise<unknown>;
  onCancelPending: () => void;
  cancelling: boolean;
};

/** Change the sign-in e-mail: it changes only when the link mailed to the new address is opened. */
export function EmailChangeForm({ currentEmail, pending, sentMessage, onSubmit, onCancelPending, cancelling }: EmailChangeFormProps) {
  const form = useForm<EmailChangeInput>({ resolver: zodResolver(emailChangeInput), defaultValues: { newEmail: '', password: '' } });
  const submit = submitWithServerErrors(form, async (values) => {
    await onSubmit(values);
    form.reset({ newEmail: '', password: '' });
  });
  const message = serverMessage(form.formState.errors);
  return (
    <View style={styles.form}>
      <Text>{`You sign in with ${currentEmail}. Mail about your account goes there.`}</Text>
      {sentMessage ? <Notice tone="success" message={sentMessage} /> : null}
      {pending ? (
        <View style={styles.pending}>
          <Notice
            tone="info"
            message={`Waiting for you to open the link we sent to ${pending.newEmail} (it works until ${formatUtcDateTime(pending.expiresAtUtc)}). Until then you keep signing in with ${currentEmail}.`}
          />
          <View style={styles.row}>
            <Button label="Cancel the change" variant="secondary" onPress={onCancelPending} busy={cancelling} />
            <DevInboxLink />
          </View>
        </View>
      ) : null}
      {message ? <Notice message={message} /> : null}
      <FormTextField
        control={form.control}
        name="newEmail"
        label="New e-mail"
        autoComplete="email"
        keyboardType="email-address"
        autoCapitalize="none"
        inputMode="email"
      />
      <FormTextField
        control={form.control}
        name="password"
        label="Your password"
        hint="To be sure it is you."
        secureTextEntry
        autoComplete="current-password"
      />
      <Button label="Send confirmation link" onPress={submit} busy={form.formState.isSubmitting} style={styles.button} />
    </View>
  );
}

const styles = StyleSheet.create({
  // long lines of input are hard to read on a wide screen
  form: { gap: space.lg, maxWidth: 640 },
  pending: { gap: space.sm },
  row: { flexDirection: 'row', flexWrap: 'wrap', alignItems: 'center', gap: space.lg },
  button: { alignSelf: 'flex-start' },
});
