import { useState } from 'react';

/** What the hook reads of a React Query mutation. */
export type MutationLike<TData, TVariables> = {
  mutate: (variables: TVariables, options?: { onSuccess?: (data: TData) => void }) => void;
  reset: () => void;
  isPending: boolean;
  error: Error | null;
};

/**
 * A mutation behind a confirm dialog: `ask(subject)` opens it, `confirm(variables)` runs the mutation and
 * closes the dialog once it succeeded, and a failure stays in the open dialog (`dialog.error`) so the
 * operator can try again or cancel. `dialog` spreads into <ConfirmDialog>. The subject is whatever the
 * dialog talks about (a photo, a member); give its type through `closed`, as with useState:
 * `useConfirmedMutation(removePhoto, null as UnitPhoto | null)`. Without it the subject is just `true`.
 */
export function useConfirmedMutation<TData, TVariables, TSubject = true>(
  mutation: MutationLike<TData, TVariables>,
  closed: TSubject | null = null,
) {
  const [asking, setAsking] = useState<TSubject | null>(closed);
  const close = () => {
    mutation.reset();
    setAsking(null);
  };
  return {
    /** What the open dialog is about; null while it is closed. */
    asking,
    ask: (...subject: TSubject extends true ? [] : [TSubject]) => {
      mutation.reset();
      setAsking((subject.length ? subject[0] : true) as TSubject);
    },
    close,
    /** Runs the mutation; on success the dialog closes and `then` gets the answer and the subject. */
    confirm: (variables: TVariables, then?: (data: TData, subject: TSubject) => void) => {
      const subject = asking;
      mutation.mutate(variables, {
        onSuccess: (data) => {
          setAsking(null);
          if (subject !== null) then?.(data, subject);
        },
      });
    },
    dialog: { visible: asking !== null, busy: mutation.isPending, error: mutation.error?.message, onCancel: close },
  };
}
