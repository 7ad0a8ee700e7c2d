import { useState } from 'react';
import { StyleSheet, View } from 'react-native';

import type { Invitation } from '@/shared/schemas';

import { useConfirmedMutation } from '../query/use-confirmed-mutation';
import { Button } from '../ui/button';
import { ConfirmDialog } from '../ui/confirm-dialog';
import { Text } from '../ui/text';
import { formatUtcDateTime } from '../ui/format';
import { space } from '../ui/theme';
import { useAppTheme } from '../ui/theme-provider';
import { useResendInvitationMutation, useRevokeInvitationMutation } from './queries';

/** Invitations waiting for an answer; each can be sent again (new link, new week) or withdrawn (after a confirmation). */
export function InvitationList({ clubId, invitations }: { clubId: number; invitations: Invitation[] }) {
  const { colors } = useAppTheme();
  const resend = useResendInvitationMutation(clubId);
  const [resent, setResent] = useState<string | null>(null);
  const revoke = useConfirmedMutation(useRevokeInvitationMutation(clubId), null as Invitation | null);
  if (!invitations.length) {
    return (
      <Text tone="muted" variant="caption">
        No invitations waiting for an answer.
      </Text>
    );
  }
  return (
    <View style={styles.list}>
      {resent ? (
        <Text variant="caption" tone="primary" role="status">
          {resent}
        </Text>
      ) : null}
      {resend.error ? (
        <Text variant="caption" tone="danger" role="alert">
          {resend.error.message}
        </Text>
      ) : null}
      {invitations.map((invitation) => (
        <View key={invitation.id} style={[styles.row, { borderColor: colors.border }]}>
          <Text variant="label" style={styles.email}>
            {invitation.email}
          </Text>
          <Text variant="caption" tone="muted">
            sent {formatUtcDateTime(invitation.createdAt)} · link valid until {formatUtcDateTime(invitation.expiresAt)}
          </Text>
          <View style={styles.actions}>
            <Button
              label="Send again"
              variant="secondary"
              accessibilityLabel={`Send the invitation to ${invitation.email} again`}
              busy={resend.isPending && resend.variables === invitation.id}
              onPress={() => {
                setResent(null);
                resend.mutate(invitation.id, {
                  onSuccess: () => setResent(`Sent again to ${invitation.email}, with a new link valid for 7 days.`),
                });
              }}
            />
            <Button
              label="Withdraw"
              variant="danger"
              accessibilityLabel={`Withdraw the invitation to ${invitation.email}`}
              onPress={() => revoke.ask(invitation)}
            />
          </View>
        </View>
      ))}
      <ConfirmDialog
        {...revoke.dialog}
        title="Withdraw this invitation?"
        message={`The link sent to ${revoke.asking?.email ?? ''} stops working. You can invite the address again later.`}
        confirmLabel="Withdraw invitation"
        destructive
        onConfirm={() => revoke.asking && revoke.confirm(revoke.asking.id)}
      />
    </View>
  );
}

const styles = StyleSheet.create({
  list: { gap: 0 },
  row: { paddingVertical: space.sm, borderTopWidth: 1, gap: 2 },
  email: { flexShrink: 1 },
  actions: { flexDirection: 'row', flexWrap: 'wrap', gap: space.sm, marginTop: space.xs },
});
