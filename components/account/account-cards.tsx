import type { SessionUser } from '@/shared/api/contracts';
import type { AccountDeleteInput } from '@/shared/schemas';

import { ErrorState, LoadingState } from '../ui/query-states';
import { Card } from '../ui/card';
import { Heading } from '../ui/heading';
import { DeleteAccountForm } from './delete-account-form';
import { EmailChangeForm } from './email-change-form';
import { PasswordForm } from './password-form';
import {
  useCancelEmailChangeMutation,
  useChangePasswordMutation,
  useDeletionPreviewQuery,
  usePendingEmailChangeQuery,
  useRequestEmailChangeMutation,
} from './queries';

/** Settings: sign-in e-mail and password. */
export function SignInCards({ user }: { user: SessionUser }) {
  const pending = usePendingEmailChangeQuery();
  const request = useRequestEmailChangeMutation();
  const cancel = useCancelEmailChangeMutation();
  const changePassword = useChangePasswordMutation();
  return (
    <>
      <Card>
        <Heading level={2}>Sign-in e-mail</Heading>
        <EmailChangeForm
          currentEmail={user.email}
          pending={pending.data}
          sentMessage={request.data?.message}
          onSubmit={request.mutateAsync}
          onCancelPending={() => cancel.mutate(undefined, { onSuccess: () => request.reset() })}
          cancelling={cancel.isPending}
        />
      </Card>
      <Card>
        <Heading level={2}>Password</Heading>
        <PasswordForm onSubmit={changePassword.mutateAsync} />
      </Card>
    </>
  );
}

/** Settings: delete the account (the route asks once more in a dialog). */
export function DeleteAccountCard({ onAsk }: { onAsk: (values: AccountDeleteInput) => void }) {
  const preview = useDeletionPreviewQuery();
  return (
    <Card>
      <Heading level={2}>Delete account</Heading>
      {preview.isPending ? (
        <LoadingState label="Finding what goes with your account…" />
      ) : preview.isError ? (
        <ErrorState title="Could not list what goes with your account" error={preview.error} onRetry={() => preview.refetch()} />
      ) : (
        <DeleteAccountForm preview={preview.data} onAsk={onAsk} />
      )}
    </Card>
  );
}
