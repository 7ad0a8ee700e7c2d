import type { FieldValues, Path, UseFormReturn } from 'react-hook-form';

import { ApiError } from '@/shared/api/client';

import { enterSubmits } from './enter-submits';

/**
 * Puts a failed request's messages where the operator looks: a 400's `fields` beside their inputs
 * (flat names like `email` or nested paths like `filters.0.cutoffHz`), everything else (and fields
 * the form does not show) in the form-level message `errors.root.server`. By default a field counts
 * as shown when the form holds that path; `knownPaths` decides instead where that is not enough.
 */
export function applyServerErrors<T extends FieldValues>(
  form: Pick<UseFormReturn<T>, 'setError' | 'getValues'>,
  error: unknown,
  knownPaths?: (path: string) => boolean,
) {
  if (!(error instanceof ApiError)) {
    form.setError('root.server', { type: 'server', message: 'Something went wrong. Please try again.' });
    return;
  }
  const values = (form.getValues() ?? {}) as Record<string, unknown>;
  const isKnown = knownPaths ?? ((path: string) => hasPath(values, path));
  const leftover: string[] = [];
  let placed = 0;
  for (const [name, message] of Object.entries(error.fields)) {
    if (isKnown(name)) {
      form.setError(name as Path<T>, { type: 'server', message }, { shouldFocus: placed === 0 });
      placed += 1;
    } else {
      leftover.push(message);
    }
  }
  if (placed === 0 || leftover.length > 0) {
    form.setError('root.server', { type: 'server', message: placed === 0 ? error.message : leftover.join(' ') });
  }
}

/** The form-level message set by applyServerErrors, if any. */
export function serverMessage(errors: { root?: Record<string, { message?: string } | undefined> }) {
  return errors.root?.server?.message;
}

/** Whether a dotted path names something the form holds (a nested path's last step may be unset, like an empty number). */
function hasPath(values: Record<string, unknown>, path: string): boolean {
  const steps = path.split('.');
  let node: unknown = values;
  for (let i = 0; i < steps.length; i += 1) {
    if (node === null || typeof node !== 'object') return false;
    const record = node as Record<string, unknown>;
    if (!(steps[i] in record)) return i === steps.length - 1 && i > 0;
    node = record[steps[i]];
  }
  return true;
}

/** A form's submit handler that sends the valid values and, when the server refuses, puts its messages in place. */
export function submitWithServerErrors<TFields extends FieldValues, TValues>(
  form: UseFormReturn<TFields, unknown, TValues>,
  send: (values: TValues) => Promise<unknown>,
) {
  return enterSubmits(
    form.control,
    form.handleSubmit(async (values) => {
      try {
        await send(values);
      } catch (error) {
        applyServerErrors(form, error);
      }
    }),
  );
}
