import { useController, type Control, type FieldValues, type Path } from 'react-hook-form';

import { TextField, type TextFieldProps } from '../ui/text-field';
import { submitOnEnterOf } from './enter-submits';

export type FormTextFieldProps<T extends FieldValues> = Omit<TextFieldProps, 'value' | 'onChangeText' | 'error'> & {
  control: Control<T>;
  name: Path<T>;
  /** Upper-case as the operator types (autoCapitalize does nothing on desktop web). */
  upperCase?: boolean;
};

/** The one react-hook-form binding for text: value, change, blur and the field's error message. */
export function FormTextField<T extends FieldValues>({ control, name, upperCase = false, onBlur, ...rest }: FormTextFieldProps<T>) {
  const { field, fieldState } = useController({ control, name });
  return (
    <TextField
      ref={field.ref}
      value={typeof field.value === 'string' ? field.value : field.value == null ? '' : String(field.value)}
      onChangeText={(text) => field.onChange(upperCase ? text.toUpperCase() : text)}
      onBlur={(event) => {
        field.onBlur();
        onBlur?.(event);
      }}
      error={fieldState.error?.message}
      autoCapitalize={upperCase ? 'characters' : rest.autoCapitalize}
      onSubmitEditing={rest.multiline ? undefined : submitOnEnterOf(control)}
      {...rest}
    />
  );
}
