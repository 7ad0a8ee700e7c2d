import { StyleSheet, View } from 'react-native';

import { Button } from '../ui/button';
import { Card } from '../ui/card';
import { EmptyState } from '../ui/query-states';
import { Text } from '../ui/text';
import { TextLink } from '../ui/text-link';
import { formatUtcDateTime } from '../ui/format';
import { space } from '../ui/theme';
import { formatOffsetHz } from '../ui/format';
import { bandLabel } from './club-words';
import type { ClubConflicts, ConflictProposal } from './queries';
import { Heading } from '../ui/heading';

export type ProposalSendState = { status: 'sending' | 'sent' } | { status: 'failed'; message: string };

export type ConflictListProps = {
  data: ClubConflicts;
  /** By station id: what happened to "Propose to owner". */
  sendState: Record<string, ProposalSendState | undefined>;
  onPropose: (proposal: ConflictProposal) => void;
};

/** Stations of the club that send in the same slot on the same band too close in frequency, and offsets that would part them. */
export function ConflictList({ data, sendState, onPropose }: ConflictListProps) {
  if (!data.conflicts.length) {
    return (
      <EmptyState
        title="No collisions in the coming plan"
        message={`No two club stations send on the same band in the same slot close enough to step on each other (checked from ${formatUtcDateTime(data.fromUtc)}).`}
      />
    );
  }
  return (
    <View style={styles.wrap}>
      <View style={styles.section}>
        <Heading level={2}>Colliding pairs</Heading>
        {data.conflicts.map((conflict) => (
          <Card key={`${conflict.a}-${conflict.b}-${conflict.bandId}`} style={styles.card}>
            <View style={styles.pairRow}>
              <Text variant="mono" tone="signal">
                {bandLabel(conflict.bandId)}
              </Text>
              <Text variant="caption" tone="muted">
                {conflict.slotCount} shared {conflict.slotCount === 1 ? 'slot' : 'slots'} · first at{' '}
                {formatUtcDateTime(conflict.firstSlotUtc)}
              </Text>
            </View>
            <Text variant="label">
              {conflict.aStation?.name ?? `Station ${conflict.a}`}{' '}
              <Text variant="caption" tone="muted">
                ({conflict.aStation?.owner}, {conflict.aStation?.callsign})
              </Text>
            </Text>
            <Text variant="caption" tone="muted">
              meets
            </Text>
            <Text variant="label">
              {conflict.bStation?.name ?? `Station ${conflict.b}`}{' '}
              <Text variant="caption" tone="muted">
                ({conflict.bStation?.owner}, {conflict.bStation?.callsign})
              </Text>
            </Text>
          </Card>
        ))}
      </View>
      <View style={styles.section}>
        <Heading level={2}>Offsets that would part them</Heading>
        <Text tone="muted">Each owner gets a proposal by e-mail and in their notices. Nothing changes until they accept it.</Text>
        {data.proposals.length === 0 ? (
          <Text tone="muted">No new offset helps here: there are more stations than the 200 Hz window can hold apart.</Text>
        ) : null}
        {data.proposals.map((proposal) => {
          const state = sendState[String(proposal.stationId)];
          return (
            <Card key={proposal.stationId} style={styles.card}>
              <Text variant="label">{proposal.stationName}</Text>
              <Text variant="mono">
                {formatOffsetHz(proposal.currentOffsetHz)} → {formatOffsetHz(proposal.proposedOffsetHz)}
              </Text>
              {proposal.meets.length ? (
                <Text variant="caption" tone="muted">
                  Parts it from {proposal.meets.join(', ')}.
                </Text>
              ) : null}
              {proposal.mine ? (
                <TextLink
                  href={{ pathname: '/stations/[id]/edit', params: { id: String(proposal.stationId) } }}
                  label={`Your own station: set ${formatOffsetHz(proposal.proposedOffsetHz)} yourself`}
                />
              ) : state?.status === 'sent' ? (
                <Text variant="label" tone="primary" accessibilityLiveRegion="polite">
                  Sent — waiting for the owner
                </Text>
              ) : (
                <View style={styles.actions}>
                  <Button
                    label="Propose"
                    accessibilityLabel={`Propose ${formatOffsetHz(proposal.proposedOffsetHz)} to the owner of ${proposal.stationName}`}
                    busy={state?.status === 'sending'}
                    onPress={() => onPropose(proposal)}
                    style={styles.button}
                  />
                  {state?.status === 'failed' ? (
                    <Text variant="caption" tone="danger" accessibilityRole="alert">
                      {state.message}
                    </Text>
                  ) : null}
                </View>
              )}
            </Card>
          );
        })}
        {data.unresolved.length ? (
          <Text variant="caption" tone="muted">
            {data.unresolved.length} {data.unresolved.length === 1 ? 'station still meets' : 'stations still meet'} another after these
            moves.
          </Text>
        ) : null}
      </View>
    </View>
  );
}

const styles = StyleSheet.create({
  wrap: { gap: space.xl },
  section: { gap: space.md },
  card: { gap: space.xs },
  pairRow: { flexDirection: 'row', flexWrap: 'wrap', alignItems: 'baseline', gap: space.md },
  actions: { gap: space.xs, marginTop: space.xs, alignItems: 'flex-start' },
  button: { minHeight: 40 },
});
