import { useState } from 'react';

import { ProposalList } from '@/components/clubs/proposal-list';
import { useDecideProposalMutation, useMyProposalsQuery } from '@/components/clubs/queries';
import { EmptyState, ErrorState, LoadingState } from '@/components/ui/query-states';
import { Screen } from '@/components/ui/screen';
import { Text } from '@/components/ui/text';
import type { OffsetProposal } from '@/shared/schemas';
import { ScreenTitle } from '@/components/ui/screen-title';

export default function ProposalsRoute() {
  const proposals = useMyProposalsQuery();
  const decide = useDecideProposalMutation();
  const [busy, setBusy] = useState<{ id: number; decision: 'accept' | 'decline' } | null>(null);
  const [error, setError] = useState<{ id: number; message: string } | null>(null);
  const onDecide = async (proposal: OffsetProposal, decision: 'accept' | 'decline') => {
    setBusy({ id: proposal.id, decision });
    setError(null);
    try {
      await decide.mutateAsync({ id: proposal.id, decision });
    } catch (caught) {
      setError({ id: proposal.id, message: caught instanceof Error ? caught.message : 'That did not work. Try again.' });
    } finally {
      setBusy(null);
    }
  };
  let body;
  if (proposals.isPending) body = <LoadingState label="Loading the proposals…" />;
  else if (proposals.isError)
    body = <ErrorState title="The proposals could not be loaded" error={proposals.error} onRetry={() => proposals.refetch()} />;
  else if (proposals.data.length === 0)
    body = (
      <EmptyState
        title="No proposals"
        message="When a club admin finds your station sending on top of another member's, a new audio offset for it shows up here."
      />
    );
  else body = <ProposalList proposals={proposals.data} busy={busy} error={error} onDecide={onDecide} />;
  return (
    <Screen>
      <ScreenTitle>Offset proposals</ScreenTitle>
      <Text tone="muted">
        A new audio offset keeps your station clear of another club station in the same slots. Accepting changes the station’s offset
        straight away; declining leaves it as it is.
      </Text>
      {body}
    </Screen>
  );
}
