import { StyleSheet, View } from 'react-native';

import type { Invitation } from '@/shared/schemas';

import { Text } from '../ui/text';
import { formatUtcDateTime } from '../ui/format';
import { space } from '../ui/theme';
import { useAppTheme } from '../ui/theme-provider';

export function InvitationList({ invitations }: { invitations: Invitation[] }) {
  const { colors } = useAppTheme();
  if (!invitations.length) {
    return (
      <Text tone="muted" variant="caption">
        No invitations waiting for an answer.
      </Text>
    );
  }
  return (
    <View style={styles.list}>
      {invitations.map((invitation) => (
        <View key={invitation.id} style={[styles.row, { borderColor: colors.border }]}>
          <Text variant="label" style={styles.email}>
            {invitation.email}
          </Text>
          <Text variant="caption" tone="muted">
            sent {formatUtcDateTime(invitation.createdAt)} · link valid until {formatUtcDateTime(invitation.expiresAt)}
          </Text>
        </View>
      ))}
    </View>
  );
}

const styles = StyleSheet.create({
  list: { gap: 0 },
  row: { paddingVertical: space.sm, borderTopWidth: 1, gap: 2 },
  email: { flexShrink: 1 },
});
