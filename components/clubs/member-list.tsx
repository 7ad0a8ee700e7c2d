import { StyleSheet, View } from 'react-native';

import type { ClubMember } from '@/shared/schemas';

import { Button } from '../ui/button';
import { Card } from '../ui/card';
import { Text } from '../ui/text';
import { formatUtcDateTime } from '../ui/format';
import { space } from '../ui/theme';
import { RoleBadge } from './club-membership-list';

export type MemberListProps = {
  members: ClubMember[];
  myUserId: number;
  /** Admins see e-mail addresses and may change roles and remove members. */
  canManage: boolean;
  busyUserId?: number | null;
  onSetRole: (member: ClubMember, role: 'admin' | 'member') => void;
  onRemove: (member: ClubMember) => void;
};

export function MemberList({ members, myUserId, canManage, busyUserId, onSetRole, onRemove }: MemberListProps) {
  const sorted = [...members].sort((a, b) =>
    a.role === b.role ? a.displayName.localeCompare(b.displayName) : a.role === 'admin' ? -1 : 1,
  );
  return (
    <View style={styles.list}>
      {sorted.map((member) => {
        const me = member.userId === myUserId;
        return (
          <Card key={member.userId} style={styles.card}>
            <View style={styles.head}>
              <View style={styles.grow}>
                <Text variant="label">
                  {member.displayName}
                  {me ? ' (you)' : ''}
                </Text>
                <Text variant="mono" tone="muted" style={styles.small}>
                  {member.callsign ?? 'no callsign'}
                  {canManage && member.email ? ` · ${member.email}` : ''}
                </Text>
              </View>
              <RoleBadge role={member.role} />
            </View>
            <Text variant="caption" tone="muted">
              Joined {formatUtcDateTime(member.joinedAt)}
            </Text>
            {canManage && !me ? (
              <View style={styles.actions}>
                <Button
                  label={member.role === 'admin' ? 'Make member' : 'Make admin'}
                  variant="secondary"
                  accessibilityLabel={`${member.role === 'admin' ? 'Make member' : 'Make admin'}: ${member.displayName}`}
                  busy={busyUserId === member.userId}
                  onPress={() => onSetRole(member, member.role === 'admin' ? 'member' : 'admin')}
                  style={styles.smallButton}
                />
                <Button
                  label="Remove"
                  variant="danger"
                  accessibilityLabel={`Remove ${member.displayName} from the club`}
                  onPress={() => onRemove(member)}
                  style={styles.smallButton}
                />
              </View>
            ) : null}
          </Card>
        );
      })}
    </View>
  );
}

const styles = StyleSheet.create({
  list: { gap: space.sm },
  card: { gap: space.xs, paddingVertical: space.md },
  head: { flexDirection: 'row', alignItems: 'flex-start', gap: space.md },
  grow: { flex: 1, minWidth: 0 },
  small: { fontSize: 13 },
  actions: { flexDirection: 'row', flexWrap: 'wrap', gap: space.sm, marginTop: space.xs },
  smallButton: { minHeight: 38, paddingHorizontal: space.md },
});
