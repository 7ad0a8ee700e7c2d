import { StyleSheet, View } from 'react-native';

import type { OffsetProposal } from '@/shared/schemas';

import { Button } from '../ui/button';
import { Card } from '../ui/card';
import { Text } from '../ui/text';
import { formatOffsetHz, formatUtcDateTime } from '../ui/format';
import { space } from '../ui/theme';
import { Heading } from '../ui/heading';

export type ProposalListProps = {
  proposals: OffsetProposal[];
  busy?: { id: number; decision: 'accept' | 'decline' } | null;
  error?: { id: number; message: string } | null;
  onDecide: (proposal: OffsetProposal, decision: 'accept' | 'decline') => void;
};

const outcome: Record<Exclude<OffsetProposal['status'], 'pending'>, string> = {
  accepted: 'Accepted: the station uses the new offset',
  declined: 'Declined: the station keeps its offset',
  withdrawn: 'Withdrawn by the club',
};

/** Offsets a club admin has proposed for the operator's stations: accept or decline each one. */
export function ProposalList({ proposals, busy, error, onDecide }: ProposalListProps) {
  const pending = proposals.filter((proposal) => proposal.status === 'pending');
  const decided = proposals.filter((proposal) => proposal.status !== 'pending');
  return (
    <View style={styles.wrap}>
      {pending.length === 0 ? <Text tone="muted">No proposals waiting for you.</Text> : null}
      {pending.map((proposal) => (
        <Card key={proposal.id} tone="signal" style={styles.card}>
          <Text variant="heading">{proposal.stationName}</Text>
          <Text variant="caption" tone="muted">
            From {proposal.clubName} · {formatUtcDateTime(proposal.createdAt)}
          </Text>
          <Text variant="monoLarge">
            {formatOffsetHz(proposal.currentOffsetHz)} → {formatOffsetHz(proposal.proposedOffsetHz)}
          </Text>
          <Text>{proposal.reason}</Text>
          {error?.id === proposal.id ? (
            <Text tone="danger" accessibilityRole="alert">
              {error.message}
            </Text>
          ) : null}
          <View style={styles.actions}>
            <Button
              label="Accept"
              accessibilityLabel={`Accept ${formatOffsetHz(proposal.proposedOffsetHz)} for ${proposal.stationName}`}
              busy={busy?.id === proposal.id && busy.decision === 'accept'}
              disabled={busy?.id === proposal.id}
              onPress={() => onDecide(proposal, 'accept')}
            />
            <Button
              label="Decline"
              variant="secondary"
              accessibilityLabel={`Decline the new offset for ${proposal.stationName}`}
              busy={busy?.id === proposal.id && busy.decision === 'decline'}
              disabled={busy?.id === proposal.id}
              onPress={() => onDecide(proposal, 'decline')}
            />
          </View>
        </Card>
      ))}
      {decided.length ? (
        <View style={styles.section}>
          <Heading level={2}>Decided</Heading>
          {decided.map((proposal) => (
            <Card key={proposal.id} style={styles.card}>
              <Text variant="label">{proposal.stationName}</Text>
              <Text variant="mono" tone="muted">
                {formatOffsetHz(proposal.currentOffsetHz)} → {formatOffsetHz(proposal.proposedOffsetHz)}
              </Text>
              <Text variant="caption" tone={proposal.status === 'accepted' ? 'primary' : 'muted'}>
                {outcome[proposal.status as keyof typeof outcome]}
                {proposal.decidedAt ? ` · ${formatUtcDateTime(proposal.decidedAt)}` : ''}
              </Text>
            </Card>
          ))}
        </View>
      ) : null}
    </View>
  );
}

const styles = StyleSheet.create({
  wrap: { gap: space.md },
  section: { gap: space.sm, marginTop: space.md },
  card: { gap: space.xs },
  actions: { flexDirection: 'row', flexWrap: 'wrap', gap: space.sm, marginTop: space.sm },
});
