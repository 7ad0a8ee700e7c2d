import { Stack, useLocalSearchParams } from 'expo-router';
import { useState } from 'react';

import { ClubNav } from '@/components/clubs/club-nav';
import { useClubQuery, useLiftSuspensionMutation, useReviewQuery, useSuspendMutation } from '@/components/clubs/queries';
import { ReviewTable } from '@/components/clubs/review-table';
import { SuspendDialog } from '@/components/clubs/suspend-dialog';
import { useBreakpoints } from '@/components/ui/breakpoints';
import { ConfirmDialog } from '@/components/ui/confirm-dialog';
import { Notice } from '@/components/ui/notice';
import { EmptyState, ErrorState, LoadingState } from '@/components/ui/query-states';
import { Screen } from '@/components/ui/screen';
import { Text } from '@/components/ui/text';
import type { ReviewRow } from '@/shared/schemas';

export default function ClubReviewRoute() {
  const clubId = Number(useLocalSearchParams<{ clubId: string }>().clubId);
  const { isWide } = useBreakpoints();
  const club = useClubQuery(clubId);
  const review = useReviewQuery(clubId);
  const suspend = useSuspendMutation(clubId);
  const lift = useLiftSuspensionMutation(clubId);
  const [suspending, setSuspending] = useState<ReviewRow | null>(null);
  const [lifting, setLifting] = useState<ReviewRow | null>(null);
  const [liftError, setLiftError] = useState<string>();
  const [message, setMessage] = useState<{ tone: 'success' | 'error'; text: string } | null>(null);

  const closeLift = () => {
    setLifting(null);
    setLiftError(undefined);
  };
  const confirmLift = async () => {
    if (!lifting) return;
    try {
      await lift.mutateAsync({ stationId: lifting.stationId });
      setMessage({ tone: 'success', text: `${lifting.stationName} may send again. ${lifting.ownerName} has been told.` });
      closeLift();
    } catch (error) {
      setLiftError(error instanceof Error ? error.message : 'The stop could not be lifted.');
    }
  };
  let body;
  if (review.isPending) body = <LoadingState label="Checking every member’s stations…" />;
  else if (review.isError)
    body = <ErrorState title="The review could not be loaded" error={review.error} onRetry={() => review.refetch()} />;
  else if (review.data.length === 0)
    body = <EmptyState title="No stations to review" message="None of the members has registered a station yet." />;
  else
    body = (
      <ReviewTable
        rows={review.data}
        layout={isWide ? 'columns' : 'cards'}
        stationHref={(row) => ({ pathname: '/club/station/[id]', params: { id: String(row.stationId) } })}
        onSuspend={(row) => {
          setMessage(null);
          setSuspending(row);
        }}
        onLift={(row) => {
          setMessage(null);
          setLifting(row);
        }}
      />
    );
  const name = club.data?.name ?? 'Club';
  return (
    <Screen
      maxWidth={1180}
      overlay={
        <>
          <ConfirmDialog
            visible={!!lifting}
            title={`Let ${lifting?.stationName} send again?`}
            message={`Its plan and device configuration go back on the air from the next slot, and ${lifting?.ownerName} is told. Lift the stop only once the reason for it is fixed.`}
            confirmLabel="Lift the stop"
            busy={lift.isPending}
            error={liftError}
            onConfirm={confirmLift}
            onCancel={closeLift}
          />
          <SuspendDialog
            station={suspending ? { name: suspending.stationName, ownerName: suspending.ownerName } : null}
            onCancel={() => setSuspending(null)}
            onConfirm={async ({ reason }) => {
              if (!suspending) return;
              await suspend.mutateAsync({ stationId: suspending.stationId, reason });
              setMessage({ tone: 'success', text: `${suspending.stationName} is suspended. ${suspending.ownerName} has been told why.` });
              setSuspending(null);
            }}
          />
        </>
      }
    >
      <Stack.Screen options={{ title: `${name} · Review` }} />
      <ClubNav clubId={clubId} clubName={name} current="review" isAdmin />
      <Text tone="muted">
        Each member’s station checked against the club’s rules and its own hardware: filters, power, tones and calibration. Only the owner
        can fix a station; you can stop one until it is fixed.
      </Text>
      {message ? <Notice tone={message.tone} message={message.text} /> : null}
      {body}
    </Screen>
  );
}
