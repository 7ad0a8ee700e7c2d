import { Link, type Href } from 'expo-router';
import { useState } from 'react';
import { Pressable, StyleSheet, View } from 'react-native';

import type { ClubMembership } from '@/shared/api/contracts';

import { Button } from '../ui/button';
import { Card } from '../ui/card';
import { Text } from '../ui/text';
import { TextLink } from '../ui/text-link';
import { radius, space } from '../ui/theme';
import { useAppTheme } from '../ui/theme-provider';
import { RoleBadge } from './club-membership-list';

export type ClubHubProps = {
  clubs: ClubMembership[];
  /** Proposals waiting for the operator's answer; undefined while loading. */
  pendingProposals?: number;
  onCreate: () => void;
};

/** The Club tab's start: the operator's clubs, proposals waiting for them, their own log, and a new club. */
export function ClubHub({ clubs, pendingProposals, onCreate }: ClubHubProps) {
  return (
    <View style={styles.wrap}>
      {clubs.length ? (
        <View style={styles.list}>
          {clubs.map((club) => (
            <ClubRow key={club.clubId} club={club} />
          ))}
        </View>
      ) : (
        <Card>
          <Text variant="heading">You are not in a club yet</Text>
          <Text tone="muted">
            Ask a club admin to invite you (the link arrives by e-mail), or start a club of your own and invite others.
          </Text>
        </Card>
      )}
      <Card tone={pendingProposals ? 'signal' : 'plain'}>
        <Text variant="heading">Offset proposals</Text>
        <Text tone="muted">
          {pendingProposals === undefined
            ? 'Club admins may propose a new audio offset for your stations.'
            : pendingProposals === 0
              ? 'No proposal is waiting for your answer.'
              : `${pendingProposals} ${pendingProposals === 1 ? 'proposal is' : 'proposals are'} waiting for your answer.`}
        </Text>
        <TextLink href="/proposals" label="See offset proposals" />
      </Card>
      <Card>
        <Text variant="heading">Your activity log</Text>
        <Text tone="muted">Every change to your stations, units and schedules, by you or by a club admin.</Text>
        <TextLink href="/activity" label="Open your log" />
      </Card>
      <Button label="Create a club" variant="secondary" onPress={onCreate} style={styles.create} />
    </View>
  );
}

function ClubRow({ club }: { club: ClubMembership }) {
  const { colors } = useAppTheme();
  const [hovered, setHovered] = useState(false);
  const href: Href = { pathname: '/club/[clubId]', params: { clubId: String(club.clubId) } };
  return (
    <Link href={href} asChild>
      <Pressable
        accessibilityRole="link"
        onHoverIn={() => setHovered(true)}
        onHoverOut={() => setHovered(false)}
        // Link's asChild spreads the child's style into an object: pass one flat object
        style={StyleSheet.flatten([
          styles.row,
          { borderColor: colors.border, backgroundColor: hovered ? colors.surfaceRaised : colors.surface },
        ])}
      >
        <View style={styles.grow}>
          <Text variant="heading">{club.clubName}</Text>
          <Text variant="caption" tone="muted">
            {club.role === 'admin' ? 'Members, review, collisions, band use and log' : 'Members'}
          </Text>
        </View>
        <RoleBadge role={club.role} />
      </Pressable>
    </Link>
  );
}

const styles = StyleSheet.create({
  wrap: { gap: space.lg },
  list: { gap: space.md },
  row: { flexDirection: 'row', alignItems: 'center', gap: space.md, borderWidth: 1, borderRadius: radius.lg, padding: space.lg },
  grow: { flex: 1, minWidth: 0, gap: 2 },
  create: { alignSelf: 'flex-start' },
});
