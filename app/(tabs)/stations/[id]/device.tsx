import { router, Stack, useFocusEffect, useLocalSearchParams } from 'expo-router';
import { useCallback, useState } from 'react';
import { Platform } from 'react-native';

import { useSessionQuery } from '@/components/auth/queries';
import { DeviceCredentials } from '@/components/devices/device-credentials';
import { PairingCard } from '@/components/devices/pairing-card';
import { useIssueDeviceTokenMutation, useRevokeDeviceTokenMutation } from '@/components/devices/queries';
import { useStationHealthQuery } from '@/components/health/queries';
import { heardWords } from '@/components/health/words';
import { useStationQuery } from '@/components/stations/queries';
import { ConfirmDialog } from '@/components/ui/confirm-dialog';
import { ErrorState, LoadingState } from '@/components/ui/query-states';
import { Screen } from '@/components/ui/screen';
import { ApiError } from '@/shared/api/client';

const origin = Platform.OS === 'web' && typeof window !== 'undefined' ? window.location.origin : 'https://faintline.example';

export default function StationDeviceRoute() {
  const { id } = useLocalSearchParams<{ id: string }>();
  const stationId = Number(id);
  const me = useSessionQuery().data;
  const station = useStationQuery(stationId);
  const health = useStationHealthQuery(stationId);
  const issue = useIssueDeviceTokenMutation(stationId);
  const revoke = useRevokeDeviceTokenMutation(stationId);
  // the new token lives in this screen's state only: leaving the screen forgets it
  const [freshToken, setFreshToken] = useState<string | null>(null);
  const [confirming, setConfirming] = useState<'rotate' | 'revoke' | null>(null);
  // …and so does moving away from it while it stays in the stack (another tab, a pushed screen)
  useFocusEffect(useCallback(() => () => setFreshToken(null), []));

  const issueToken = () =>
    issue.mutate(undefined, {
      onSuccess: ({ token }) => {
        setFreshToken(token);
        setConfirming(null);
        issue.reset();
      },
    });

  let body;
  if (!Number.isInteger(stationId) || stationId <= 0)
    body = <ErrorState title="Station not found" error={new Error('This address does not name a station.')} />;
  else if (station.isPending || health.isPending) body = <LoadingState label="Loading the device…" />;
  else if (station.isError || health.isError) {
    const error = station.error ?? health.error;
    const missing = error instanceof ApiError && error.status === 404;
    body = (
      <ErrorState
        title={missing ? 'Station not found' : 'The device could not be loaded'}
        error={error}
        onRetry={missing ? undefined : () => Promise.all([station.refetch(), health.refetch()])}
      />
    );
  } else {
    body = (
      <DeviceCredentials
        stationName={station.data.name}
        hasDevice={health.data.hasDevice}
        heard={heardWords(health.data)}
        freshToken={freshToken}
        readOnly={station.data.ownerId !== me?.id}
        issuing={issue.isPending}
        error={confirming ? undefined : (issue.error?.message ?? revoke.error?.message)}
        origin={origin}
        onCreate={issueToken}
        onRotate={() => setConfirming('rotate')}
        onRevoke={() => setConfirming('revoke')}
        onHideToken={() => setFreshToken(null)}
        pairing={station.data.ownerId === me?.id ? <PairingCard origin={origin} onPair={() => router.push('/pair')} /> : null}
      />
    );
  }

  const close = () => {
    issue.reset();
    revoke.reset();
    setConfirming(null);
  };
  return (
    <Screen
      overlay={
        <>
          <ConfirmDialog
            visible={confirming === 'rotate'}
            title="Replace the device token?"
            message="The current token stops working at once: the beacon stays offline until it has the new one."
            confirmLabel="Replace token"
            destructive
            busy={issue.isPending}
            error={issue.error?.message}
            onCancel={close}
            onConfirm={issueToken}
          />
          <ConfirmDialog
            visible={confirming === 'revoke'}
            title="Revoke the device token?"
            message="The token stops working at once and the station has no device until you create a new one. Its health history stays."
            confirmLabel="Revoke token"
            destructive
            busy={revoke.isPending}
            error={revoke.error?.message}
            onCancel={close}
            onConfirm={() =>
              revoke.mutate(undefined, {
                onSuccess: () => {
                  setFreshToken(null);
                  setConfirming(null);
                },
              })
            }
          />
        </>
      }
    >
      <Stack.Screen options={{ title: station.data ? `${station.data.name} · device` : 'Station · device' }} />
      {body}
    </Screen>
  );
}
