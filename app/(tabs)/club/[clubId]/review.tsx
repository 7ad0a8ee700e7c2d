import { Stack } from 'expo-router';
import { useState } from 'react';

import { ClubNav } from '@/components/clubs/club-nav';
import { useClubQuery, useLiftSuspensionMutation, useReviewQuery, useSuspendMutation } from '@/components/clubs/queries';
import { LazyReviewTable as ReviewTable } from '@/components/clubs/lazy-review-table';
import { SuspendDialog } from '@/components/clubs/suspend-dialog';
import { QueryBoundary } from '@/components/query/query-boundary';
import { useConfirmedMutation } from '@/components/query/use-confirmed-mutation';
import { useRouteId } from '@/components/query/use-route-id';
import { useBreakpoints } from '@/components/ui/breakpoints';
import { ConfirmDialog } from '@/components/ui/confirm-dialog';
import { Notice } from '@/components/ui/notice';
import { EmptyState } from '@/components/ui/query-states';
import { Screen } from '@/components/ui/screen';
import { Text } from '@/components/ui/text';
import type { ReviewRow } from '@/shared/schemas';

export default function ClubReviewRoute() {
  const { id: clubId } = useRouteId('clubId');
  const { isWide } = useBreakpoints();
  const club = useClubQuery(clubId);
  const review = useReviewQuery(clubId);
  const suspend = useSuspendMutation(clubId);
  const lift = useConfirmedMutation(useLiftSuspensionMutation(clubId), null as ReviewRow | null);
  const [suspending, setSuspending] = useState<ReviewRow | null>(null);
  const [message, setMessage] = useState<{ tone: 'success' | 'error'; text: string } | null>(null);
  const name = club.data?.name ?? 'Club';
  return (
    <Screen
      maxWidth={1180}
      overlay={
        <>
          <ConfirmDialog
            {...lift.dialog}
            title={`Let ${lift.asking?.stationName} send again?`}
            message={`Its plan and device configuration go back on the air from the next slot, and ${lift.asking?.ownerName} is told. Lift the stop only once the reason for it is fixed.`}
            confirmLabel="Lift the stop"
            onConfirm={() =>
              lift.asking &&
              lift.confirm({ stationId: lift.asking.stationId }, (_, row) =>
                setMessage({ tone: 'success', text: `${row.stationName} may send again. ${row.ownerName} has been told.` }),
              )
            }
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
      <QueryBoundary query={review} noun="review" loadingLabel="Checking every member’s stations…">
        {(rows) =>
          rows.length === 0 ? (
            <EmptyState title="No stations to review" message="None of the members has registered a station yet." />
          ) : (
            <ReviewTable
              rows={rows}
              layout={isWide ? 'columns' : 'cards'}
              stationHref={(row) => ({ pathname: '/club/station/[id]', params: { id: String(row.stationId) } })}
              onSuspend={(row) => {
                setMessage(null);
                setSuspending(row);
              }}
              onLift={(row) => {
                setMessage(null);
                lift.ask(row);
              }}
            />
          )
        }
      </QueryBoundary>
    </Screen>
  );
}
