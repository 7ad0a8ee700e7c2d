import { useEffect, useState } from 'react';
import { useController, type Control, type FieldValues, type Path } from 'react-hook-form';
import type { StyleProp, ViewStyle } from 'react-native';

import { TextField } from '../ui/text-field';

export type NumberFieldProps<T extends FieldValues> = {
  control: Control<T>;
  name: Path<T>;
  label: string;
  hint?: string;
  /** A message from outside the form (the server or the live checks). */
  error?: string;
  style?: StyleProp<ViewStyle>;
  /** `numeric` for whole numbers (the keyboard), `decimal` otherwise */
  inputMode?: 'numeric' | 'decimal';
};

const parse = (text: string) => (text.trim() === '' ? Number.NaN : Number(text.trim().replace(',', '.')));
const show = (value: unknown) => (typeof value === 'number' && Number.isFinite(value) ? String(value) : '');

/** A number input bound to react-hook-form: text in, a number (NaN while not one) out, so the schema stays z.number(). */
export function NumberField<T extends FieldValues>({
  control,
  name,
  label,
  hint,
  error,
  style,
  inputMode = 'decimal',
}: NumberFieldProps<T>) {
  const { field, fieldState } = useController({ control, name });
  const [text, setText] = useState(() => show(field.value));
  // follow changes made elsewhere (a preset, a reset) without fighting the operator's typing
  useEffect(() => {
    const typed = parse(text);
    const value = field.value as unknown;
    if (typeof value === 'number' && (value === typed || (Number.isNaN(value) && Number.isNaN(typed)))) return;
    setText(show(value));
    // eslint-disable-next-line react-hooks/exhaustive-deps
  }, [field.value]);
  return (
    <TextField
      ref={field.ref}
      label={label}
      hint={hint}
      value={text}
      mono
      inputMode={inputMode}
      onChangeText={(next) => {
        setText(next);
        field.onChange(parse(next));
      }}
      onBlur={field.onBlur}
      error={fieldState.error?.message ?? error}
      style={style}
    />
  );
}
