/**
 * Enter in any single-line field submits its form, as on any good site. The form's submit handler is
 * registered against its react-hook-form `control` (by submitWithServerErrors, useSaveSubmit, or
 * `enterSubmits(form.control, submit)` for a form with its own handler); FormTextField and NumberField,
 * which hold the same `control`, call it on Enter.
 */
const submits = new WeakMap<object, () => unknown>();

export function enterSubmits<T extends () => unknown>(control: object, submit: T): T {
  submits.set(control, submit);
  return submit;
}

/** The Enter handler for a field of the form that owns `control` (none while the form registered no submit). */
export function submitOnEnterOf(control: object) {
  return () => void submits.get(control)?.();
}
