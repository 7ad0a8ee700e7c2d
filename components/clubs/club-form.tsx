import { zodResolver } from '@hookform/resolvers/zod';
import { useState } from 'react';
import { useController, useForm, type Control } from 'react-hook-form';
import { StyleSheet, View } from 'react-native';

import { clubInput, type ClubInput } from '@/shared/schemas';

import { serverMessage } from '../form/apply-server-errors';
import { FormTextField } from '../form/form-text-field';
import { useSaveSubmit } from '../form/use-save-submit';
import { Button } from '../ui/button';
import { Notice } from '../ui/notice';
import { TextField } from '../ui/text-field';
import { space } from '../ui/theme';

export type ClubFormProps = {
  onSubmit: (values: ClubInput) => Promise<unknown>;
  /** An existing club's values, when editing it; a new club starts empty at 30 dBm. */
  initialValues?: { name: string; maxPowerDbm: number };
  submitLabel?: string;
};

/** A club's name and the highest power its members' stations may use: for a new club or an existing one. */
export function ClubForm({ onSubmit, initialValues, submitLabel = 'Create club' }: ClubFormProps) {
  const form = useForm<ClubInput>({ resolver: zodResolver(clubInput), defaultValues: initialValues ?? { name: '', maxPowerDbm: 30 } });
  const { submit, saved } = useSaveSubmit(form, onSubmit, !!initialValues);
  const rootError = serverMessage(form.formState.errors);
  return (
    <View style={styles.form}>
      <FormTextField control={form.control} name="name" label="Club name" autoComplete="off" />
      <PowerField control={form.control} />
      {rootError ? <Notice message={rootError} /> : null}
      {saved ? <Notice tone="success" message="Saved. The review uses the new limit at once." /> : null}
      <Button label={submitLabel} onPress={submit} busy={form.formState.isSubmitting} style={styles.button} />
    </View>
  );
}

/** Whole dBm, typed as text: an empty or non-number entry stays visible so the schema can say what to fix. */
function PowerField({ control }: { control: Control<ClubInput> }) {
  const { field, fieldState } = useController({ control, name: 'maxPowerDbm' });
  const [text, setText] = useState(field.value == null ? '' : String(field.value));
  return (
    <TextField
      label="Power limit for members (dBm)"
      hint="30 dBm is 1 W. The review flags stations set above it."
      keyboardType="number-pad"
      mono
      value={text}
      onChangeText={(next) => {
        setText(next);
        const trimmed = next.trim();
        field.onChange(trimmed === '' ? undefined : /^-?\d+(\.\d+)?$/.test(trimmed) ? Number(trimmed) : Number.NaN);
      }}
      onBlur={field.onBlur}
      error={
        fieldState.error
          ? Number.isNaN(field.value)
            ? 'Give the limit as a number of dBm, such as 30'
            : fieldState.error.message
          : undefined
      }
    />
  );
}

const styles = StyleSheet.create({
  form: { gap: space.lg },
  button: { alignSelf: 'flex-start' },
});
