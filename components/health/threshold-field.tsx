import { useState } from 'react';
import { useController, type Control, type FieldValues, type Path } from 'react-hook-form';

import { TextField } from '../ui/text-field';

export type ThresholdFieldProps<T extends FieldValues> = { control: Control<T>; name: Path<T>; label: string; hint?: string };

const parse = (text: string) => (text.trim() === '' ? Number.NaN : Number(text.trim().replace(',', '.')));

/** A whole-number input for react-hook-form: text in, a number (NaN while not one) out, so the schema stays z.number(). */
export function ThresholdField<T extends FieldValues>({ control, name, label, hint }: ThresholdFieldProps<T>) {
  const { field, fieldState } = useController({ control, name });
  const [text, setText] = useState(() => (typeof field.value === 'number' && Number.isFinite(field.value) ? String(field.value) : ''));
  return (
    <TextField
      ref={field.ref}
      label={label}
      hint={hint}
      value={text}
      mono
      inputMode="numeric"
      onChangeText={(next) => {
        setText(next);
        field.onChange(parse(next));
      }}
      onBlur={field.onBlur}
      error={fieldState.error?.message}
    />
  );
}
