import { zodResolver } from '@hookform/resolvers/zod';
import { useForm } from 'react-hook-form';
import { StyleSheet, View } from 'react-native';

import type { AccountDeletionPreview } from '@/shared/api/answers';
import { accountDeleteInput, type AccountDeleteInput } from '@/shared/schemas';

import { enterSubmits } from '../form/enter-submits';
import { FormTextField } from '../form/form-text-field';
import { Button } from '../ui/button';
import { Notice } from '../ui/notice';
import { Text } from '../ui/text';
import { space } from '../ui/theme';
import { deletionWords } from './deletion-words';

export type DeleteAccountFormProps = {
  preview: AccountDeletionPreview;
  /** The typed password is checked by the form; the route asks once more in a dialog before deleting. */
  onAsk: (values: AccountDeleteInput) => void;
};

/** Delete account: what goes with it, confirmed by typing the password. */
export function DeleteAccountForm({ preview, onAsk }: DeleteAccountFormProps) {
  const form = useForm<AccountDeleteInput>({ resolver: zodResolver(accountDeleteInput), defaultValues: { password: '' } });
  const ask = enterSubmits(form.control, form.handleSubmit(onAsk));
  return (
    <View style={styles.form}>
      <View style={styles.list}>
        {deletionWords(preview).map((line) => (
          <Text key={line}>• {line}</Text>
        ))}
      </View>
      {preview.allowed ? (
        <>
          <FormTextField
            control={form.control}
            name="password"
            label="Type your password to confirm"
            secureTextEntry
            autoComplete="current-password"
          />
          <Button label="Delete my account…" variant="danger" onPress={ask} style={styles.button} />
        </>
      ) : (
        <Notice message="Your account cannot be deleted yet: every club you run needs another admin first." />
      )}
    </View>
  );
}

const styles = StyleSheet.create({
  // long lines of input are hard to read on a wide screen
  form: { gap: space.lg, maxWidth: 640 },
  list: { gap: space.xs },
  button: { alignSelf: 'flex-start' },
});
