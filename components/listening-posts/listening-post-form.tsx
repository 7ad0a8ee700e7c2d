import { zodResolver } from '@hookform/resolvers/zod';
import { useForm } from 'react-hook-form';
import { StyleSheet, View } from 'react-native';
import type { z } from 'zod';

import { listeningPostInput } from '@/shared/schemas/reception';

import { enterSubmits } from '../form/enter-submits';
import { applyServerErrors, serverMessage } from '../form/apply-server-errors';
import { FormTextField } from '../form/form-text-field';
import { Button } from '../ui/button';
import { Notice } from '../ui/notice';
import { space } from '../ui/theme';

type Fields = z.input<typeof listeningPostInput>;
export type ListeningPostFormValues = z.output<typeof listeningPostInput>;

export type ListeningPostFormProps = { onSubmit: (values: ListeningPostFormValues) => Promise<unknown>; onCancel?: () => void };

export function ListeningPostForm({ onSubmit, onCancel }: ListeningPostFormProps) {
  const form = useForm<Fields, unknown, ListeningPostFormValues>({
    resolver: zodResolver(listeningPostInput),
    defaultValues: { name: '', callsign: '', locator: '' },
  });
  const submit = form.handleSubmit(async (values) => {
    try {
      await onSubmit(values);
    } catch (error) {
      applyServerErrors(form, error);
    }
  });
  enterSubmits(form.control, submit);
  const message = serverMessage(form.formState.errors);
  return (
    <View style={styles.form}>
      {message ? <Notice message={message} /> : null}
      <FormTextField control={form.control} name="name" label="Name" hint="Your own name for it, such as “Garden receiver”." />
      <FormTextField
        control={form.control}
        name="callsign"
        label="Receiver callsign"
        hint="The callsign its reports carry as the receiver."
        upperCase
        mono
        autoCorrect={false}
      />
      <FormTextField
        control={form.control}
        name="locator"
        label="Locator"
        hint="Where it listens: Maidenhead, 4 or 6 characters, for example JO62qm. Distances start here."
        mono
        autoCorrect={false}
        autoCapitalize="characters"
        onSubmitEditing={submit}
      />
      <View style={styles.actions}>
        <Button label="Add listening post" busy={form.formState.isSubmitting} onPress={submit} />
        {onCancel ? <Button label="Cancel" variant="ghost" onPress={onCancel} /> : null}
      </View>
    </View>
  );
}

const styles = StyleSheet.create({
  form: { gap: space.lg },
  actions: { flexDirection: 'row', flexWrap: 'wrap', gap: space.sm },
});
