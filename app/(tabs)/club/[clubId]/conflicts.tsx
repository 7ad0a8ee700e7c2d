import { Stack, useLocalSearchParams } from 'expo-router';
import { useState } from 'react';

import { ClubNav } from '@/components/clubs/club-nav';
import { ConflictList, type ProposalSendState } from '@/components/clubs/conflict-list';
import { useClubQuery, useConflictsQuery, useProposeOffsetMutation } from '@/components/clubs/queries';
import { ErrorState, LoadingState } from '@/components/ui/query-states';
import { Screen } from '@/components/ui/screen';
import { Text } from '@/components/ui/text';

export default function ClubConflictsRoute() {
  const clubId = Number(useLocalSearchParams<{ clubId: string }>().clubId);
  const club = useClubQuery(clubId);
  const conflicts = useConflictsQuery(clubId);
  const propose = useProposeOffsetMutation(clubId);
  const [sendState, setSendState] = useState<Record<string, ProposalSendState | undefined>>({});
  let body;
  if (conflicts.isPending) body = <LoadingState label="Looking for stations that step on each other…" />;
  else if (conflicts.isError)
    body = <ErrorState title="The collisions could not be worked out" error={conflicts.error} onRetry={() => conflicts.refetch()} />;
  else
    body = (
      <ConflictList
        data={conflicts.data}
        sendState={sendState}
        onPropose={async (proposal) => {
          const key = String(proposal.stationId);
          setSendState((state) => ({ ...state, [key]: { status: 'sending' } }));
          try {
            await propose.mutateAsync({ stationId: Number(proposal.stationId), proposedOffsetHz: proposal.proposedOffsetHz });
            setSendState((state) => ({ ...state, [key]: { status: 'sent' } }));
          } catch (error) {
            const message = error instanceof Error ? error.message : 'The proposal could not be sent.';
            setSendState((state) => ({ ...state, [key]: { status: 'failed', message } }));
          }
        }}
      />
    );
  const name = club.data?.name ?? 'Club';
  return (
    <Screen>
      <Stack.Screen options={{ title: `${name} · Collisions` }} />
      <ClubNav clubId={clubId} clubName={name} current="conflicts" isAdmin />
      <Text tone="muted">
        Two stations collide when they send in the same two-minute slot on the same band with their tones too close together for a receiver
        to tell them apart. Moving one audio offset within the 1400–1600 Hz window parts them.
      </Text>
      {body}
    </Screen>
  );
}
