import { zodResolver } from '@hookform/resolvers/zod';
import { useEffect, useRef } from 'react';
import { useForm } from 'react-hook-form';

import { ApiError } from '@/shared/api/client';
import { pairCodeForm, type PairCodeForm } from '@/shared/schemas';

import { enterSubmits } from '../form/enter-submits';
import { serverMessage } from '../form/apply-server-errors';
import { FormTextField } from '../form/form-text-field';
import { Button } from '../ui/button';
import { Notice } from '../ui/notice';

export type PairCodeFormProps = {
  /** the code from the link the device showed (verification_uri_complete) */
  initialCode: string;
  /** looks the code up; rejects with the server's answer */
  onLookup: (code: string) => Promise<unknown>;
};

/** Step one of pairing: the code the device shows. Case, spaces and the dash do not matter. */
export function PairCodeFormView({ initialCode, onLookup }: PairCodeFormProps) {
  const form = useForm<PairCodeForm>({ resolver: zodResolver(pairCodeForm), defaultValues: { code: initialCode } });
  const submit = form.handleSubmit(async ({ code }) => {
    try {
      await onLookup(code);
    } catch (error) {
      // a wrong, used or expired code is one sentence beside the field; too many tries is about the form
      if (error instanceof ApiError && (error.status === 404 || error.status === 400))
        form.setError('code', { type: 'server', message: error.fields.code ?? error.message }, { shouldFocus: true });
      else
        form.setError('root.server', {
          type: 'server',
          message: error instanceof Error ? error.message : 'Something went wrong. Please try again.',
        });
    }
  });
  enterSubmits(form.control, submit);
  // arriving from the device's link (or QR code), the code is looked up at once
  const looked = useRef(false);
  useEffect(() => {
    if (initialCode && !looked.current) {
      looked.current = true;
      void submit();
    }
  }, [initialCode, submit]);

  const message = serverMessage(form.formState.errors);
  return (
    <>
      {message ? <Notice message={message} /> : null}
      <FormTextField
        control={form.control}
        name="code"
        label="Pairing code"
        hint="8 letters, as the device shows them, e.g. BCDF-GHJK"
        placeholder="XXXX-XXXX"
        mono
        upperCase
        autoComplete="off"
        autoCorrect={false}
        maxLength={12}
        onSubmitEditing={submit}
      />
      <Button label="Find the device" onPress={submit} busy={form.formState.isSubmitting} />
    </>
  );
}
