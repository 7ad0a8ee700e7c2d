import { useEffect, useRef } from 'react';

import { TextLink } from '../ui/text-link';
import { LoadingState } from '../ui/query-states';
import { Notice } from '../ui/notice';
import { Button } from '../ui/button';
import { useConfirmEmailMutation } from './queries';

export type ConfirmEmailViewProps = { token: string; signedIn: boolean };

/** Opening the link mailed to a new sign-in address confirms it, once, as soon as the page opens. */
export function ConfirmEmailView({ token, signedIn }: ConfirmEmailViewProps) {
  const confirm = useConfirmEmailMutation();
  const sent = useRef(false);
  useEffect(() => {
    if (sent.current || !token) return;
    sent.current = true;
    confirm.mutate({ token });
  }, [confirm, token]);
  const onward = signedIn ? (
    <TextLink href="/settings" label="Back to settings" />
  ) : (
    <TextLink href="/sign-in" label="Sign in with your new address" />
  );
  if (!token) {
    return (
      <>
        <Notice message="This link has no confirmation code. Open the link from the e-mail again." />
        {onward}
      </>
    );
  }
  if (confirm.isSuccess) {
    return (
      <>
        <Notice tone="success" message={confirm.data.message} />
        {onward}
      </>
    );
  }
  if (confirm.isError) {
    return (
      <>
        <Notice message={confirm.error.message} />
        <Button label="Try again" variant="secondary" onPress={() => confirm.mutate({ token })} busy={confirm.isPending} />
        {signedIn ? <TextLink href="/settings" label="Ask for a new link in Settings" /> : onward}
      </>
    );
  }
  return <LoadingState label="Confirming your new address…" />;
}
