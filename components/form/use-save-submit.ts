import { useState } from 'react';
import type { FieldValues, UseFormReturn } from 'react-hook-form';

import { applyServerErrors } from './apply-server-errors';
import { enterSubmits } from './enter-submits';

/**
 * The submit handler of a form that edits saved values: a refusal's messages go beside their
 * fields; after a save the sent values become the form's new baseline, and `saved` stays true
 * until the form is edited again. Without `remember` (a form that creates something and moves on)
 * only the error handling applies.
 */
export function useSaveSubmit<TFields extends FieldValues, TValues>(
  form: UseFormReturn<TFields, unknown, TValues>,
  onSubmit: (values: TValues) => Promise<unknown>,
  remember = true,
) {
  const [saved, setSaved] = useState(false);
  const submit = form.handleSubmit(async (values) => {
    setSaved(false);
    try {
      await onSubmit(values);
      if (!remember) return;
      form.reset(values as unknown as TFields);
      setSaved(true);
    } catch (error) {
      applyServerErrors(form, error);
    }
  });
  enterSubmits(form.control, submit);
  return { submit, saved: saved && !form.formState.isDirty };
}
