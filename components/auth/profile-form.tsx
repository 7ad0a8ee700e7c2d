import { zodResolver } from '@hookform/resolvers/zod';
import { useForm } from 'react-hook-form';
import { StyleSheet, View } from 'react-native';
import type { z } from 'zod';

import { profileInput } from '@/shared/schemas';

import { serverMessage } from '../form/apply-server-errors';
import { FormTextField } from '../form/form-text-field';
import { useSaveSubmit } from '../form/use-save-submit';
import { Button } from '../ui/button';
import { Notice } from '../ui/notice';
import { space } from '../ui/theme';

type ProfileFields = z.input<typeof profileInput>;
type ProfileValues = z.output<typeof profileInput>;

export type ProfileFormProps = {
  initialValues: { displayName: string; callsign: string | null };
  onSubmit: (values: ProfileValues) => Promise<unknown>;
};

/** The account's name and personal callsign; each station still carries its own callsign. */
export function ProfileForm({ initialValues, onSubmit }: ProfileFormProps) {
  const form = useForm<ProfileFields, unknown, ProfileValues>({
    resolver: zodResolver(profileInput),
    defaultValues: { displayName: initialValues.displayName, callsign: initialValues.callsign ?? '' },
  });
  const { submit, saved } = useSaveSubmit(form, onSubmit);
  const message = serverMessage(form.formState.errors);
  return (
    <View style={styles.form}>
      {message ? <Notice message={message} /> : null}
      <FormTextField
        control={form.control}
        name="displayName"
        label="Display name"
        hint="Club admins and members see this name."
        autoComplete="name"
      />
      <FormTextField
        control={form.control}
        name="callsign"
        label="Your callsign (optional)"
        hint="Your own licensed callsign. Each station keeps its own callsign: change those on the station."
        upperCase
        mono
        autoCorrect={false}
        onSubmitEditing={submit}
      />
      {saved ? <Notice tone="success" message="Saved." /> : null}
      <Button label="Save account" onPress={submit} busy={form.formState.isSubmitting} style={styles.button} />
    </View>
  );
}

const styles = StyleSheet.create({
  form: { gap: space.lg },
  button: { alignSelf: 'flex-start' },
});
