import { zodResolver } from '@hookform/resolvers/zod';
import { useForm } from 'react-hook-form';
import { StyleSheet, View } from 'react-native';
import type { z } from 'zod';

import { stationInput } from '@/shared/schemas';

import { applyServerErrors, serverMessage } from '../form/apply-server-errors';
import { FormTextField } from '../form/form-text-field';
import { Button } from '../ui/button';
import { Notice } from '../ui/notice';
import { space } from '../ui/theme';

type StationFields = z.input<typeof stationInput>;
/** What the form hands over: its own four fields, trimmed and upper-cased by the shared schema. */
export type StationFormValues = Pick<z.output<typeof stationInput>, 'name' | 'callsign' | 'locator' | 'notes'>;

export type StationFormProps = {
  defaultValues?: Partial<StationFields>;
  submitLabel?: string;
  onSubmit: (values: StationFormValues) => Promise<unknown>;
  onCancel?: () => void;
};

export function StationForm({ defaultValues, submitLabel = 'Save station', onSubmit, onCancel }: StationFormProps) {
  const form = useForm<StationFields, unknown, z.output<typeof stationInput>>({
    resolver: zodResolver(stationInput),
    defaultValues: { name: '', callsign: '', locator: '', notes: '', ...defaultValues },
  });
  const submit = form.handleSubmit(async ({ name, callsign, locator, notes }) => {
    try {
      // only the fields shown here: an edit must not reset settings made elsewhere to schema defaults
      await onSubmit({ name, callsign, locator, notes });
    } catch (error) {
      applyServerErrors(form, error);
    }
  });
  const message = serverMessage(form.formState.errors);
  return (
    <View style={styles.form}>
      {message ? <Notice message={message} /> : null}
      <FormTextField
        control={form.control}
        name="name"
        label="Name"
        hint="Your own name for it, such as “Loft beacon”."
      />
      <FormTextField
        control={form.control}
        name="callsign"
        label="Callsign"
        hint="The licensed callsign it transmits, for example Q1ABC or Q1ABC/P."
        upperCase
        mono
        autoCorrect={false}
      />
      <FormTextField
        control={form.control}
        name="locator"
        label="Locator"
        hint="Maidenhead locator, 4 or 6 characters, for example IO91 or IO91wm."
        mono
        autoCorrect={false}
        autoCapitalize="characters"
      />
      <FormTextField control={form.control} name="notes" label="Notes" multiline numberOfLines={4} />
      <View style={styles.actions}>
        <Button label={submitLabel} onPress={submit} busy={form.formState.isSubmitting} />
        {onCancel ? <Button label="Cancel" variant="ghost" onPress={onCancel} /> : null}
      </View>
    </View>
  );
}

const styles = StyleSheet.create({
  form: { gap: space.lg },
  actions: { flexDirection: 'row', gap: space.sm, flexWrap: 'wrap' },
});
