import { useEffect, useState } from 'react';
import { useController, type Control, type FieldValues, type Path } from 'react-hook-form';

import { TextField, type TextFieldProps } from '../ui/text-field';
import { submitOnEnterOf } from './enter-submits';
import { parseNumberText } from './number-text';

export type NumberFieldProps<T extends FieldValues> = Omit<TextFieldProps, 'value' | 'onChangeText' | 'error'> & {
  control: Control<T>;
  name: Path<T>;
  /** The field shows value ÷ scale: 1e6 lets the operator type MHz for a value kept in Hz. */
  scale?: number;
  /** A message from outside the form (the live checks); the field's own error wins. */
  error?: string;
};

const round = (value: number) => Math.round(value * 1000) / 1000;

function toText(value: unknown, scale: number): string {
  return typeof value === 'number' && Number.isFinite(value) ? String(Number((value / scale).toPrecision(12))) : '';
}

function toValue(text: string, scale: number): number | undefined {
  const parsed = parseNumberText(text);
  return parsed === undefined ? undefined : Number.isNaN(parsed) ? Number.NaN : round(parsed * scale);
}

/**
 * The one react-hook-form binding for numbers: the operator types text, the form holds a number —
 * undefined when the field is empty, NaN when the text is not a number — so the shared schemas stay
 * `z.number()`. Pass `numberFieldErrors` to zodResolver to word those two cases.
 */
export function NumberField<T extends FieldValues>({ control, name, scale = 1, error, onBlur, ...rest }: NumberFieldProps<T>) {
  const { field, fieldState } = useController({ control, name });
  const [text, setText] = useState(() => toText(field.value, scale));
  // a reset or setValue from outside: show the new value unless the text already means it
  useEffect(() => {
    const current = toValue(text, scale);
    const value = field.value as unknown;
    if (current !== value && !(Number.isNaN(current) && Number.isNaN(value))) setText(toText(value, scale));
    // eslint-disable-next-line react-hooks/exhaustive-deps -- follows the form's value only; the typed text is read, not watched
  }, [field.value, scale]);
  return (
    <TextField
      ref={field.ref}
      value={text}
      inputMode="decimal"
      mono
      autoCorrect={false}
      onChangeText={(next) => {
        setText(next);
        field.onChange(toValue(next, scale));
      }}
      onBlur={(event) => {
        field.onBlur();
        onBlur?.(event);
      }}
      error={fieldState.error?.message ?? error}
      onSubmitEditing={submitOnEnterOf(control)}
      {...rest}
    />
  );
}
