import type { FieldValues, Path, UseFormReturn } from 'react-hook-form';

import { ApiError } from '@/shared/api/client';

/**
 * Like applyServerErrors, for forms with nested fields: a 400's `fields` keyed by input path
 * (`filters.0.cutoffHz`) go beside that input when the form has it; the rest into `root.server`.
 */
export function applyNestedServerErrors<T extends FieldValues>(
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
    } else leftover.push(message);
  }
  if (placed === 0 || leftover.length > 0) {
    form.setError('root.server', { type: 'server', message: placed === 0 ? error.message : leftover.join(' ') });
  }
}

/** Whether a dotted path names something the form holds (its last step may be unset, like an empty number). */
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
