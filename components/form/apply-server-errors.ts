import type { FieldValues, Path, UseFormReturn } from 'react-hook-form';

import { ApiError } from '@/shared/api/client';

/**
 * Puts a failed request's messages where the operator looks: a 400's `fields` beside their inputs,
 * everything else (and fields the form does not show) in the form-level message `errors.root.server`.
 */
export function applyServerErrors<T extends FieldValues>(form: Pick<UseFormReturn<T>, 'setError' | 'getValues'>, error: unknown) {
  if (!(error instanceof ApiError)) {
    form.setError('root.server', { type: 'server', message: 'Something went wrong. Please try again.' });
    return;
  }
  const known = new Set(Object.keys(form.getValues() ?? {}));
  const leftover: string[] = [];
  let placed = 0;
  for (const [name, message] of Object.entries(error.fields)) {
    if (known.has(name)) {
      form.setError(name as Path<T>, { type: 'server', message }, { shouldFocus: placed === 0 });
      placed += 1;
    } else {
      leftover.push(message);
    }
  }
  if (placed === 0 || leftover.length > 0) {
    form.setError('root.server', {
      type: 'server',
      message: placed === 0 ? error.message : leftover.join(' '),
    });
  }
}

/** The form-level message set by applyServerErrors, if any. */
export function serverMessage(errors: { root?: Record<string, { message?: string } | undefined> }) {
  return errors.root?.server?.message;
}
