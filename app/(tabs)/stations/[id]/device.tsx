import { router, Stack, useFocusEffect } from 'expo-router';
import { useCallback, useState } from 'react';
import { Platform } from 'react-native';

import { useSessionQuery } from '@/components/auth/queries';
import { DeviceCredentials } from '@/components/devices/device-credentials';
import { PairingCard } from '@/components/devices/pairing-card';
import { useIssueDeviceTokenMutation, useRevokeDeviceTokenMutation } from '@/components/devices/queries';
import { useStationHealthQuery } from '@/components/health/queries';
import { heardWords } from '@/components/health/words';
import { QueryBoundary } from '@/components/query/query-boundary';
import { useConfirmedMutation } from '@/components/query/use-confirmed-mutation';
import { useRouteId } from '@/components/query/use-route-id';
import { useStationQuery } from '@/components/stations/queries';
import { ConfirmDialog } from '@/components/ui/confirm-dialog';
import { Screen } from '@/components/ui/screen';

const origin = Platform.OS === 'web' && typeof window !== 'undefined' ? window.location.origin : 'https://faintline.example';

export default function StationDeviceRoute() {
  const { id: stationId, valid } = useRouteId();
  const me = useSessionQuery().data;
  const station = useStationQuery(stationId);
  const health = useStationHealthQuery(stationId);
  const issue = useIssueDeviceTokenMutation(stationId);
  const rotate = useConfirmedMutation(issue);
  const revoke = useConfirmedMutation(useRevokeDeviceTokenMutation(stationId));
  // the new token lives in this screen's state only: leaving the screen forgets it
  const [freshToken, setFreshToken] = useState<string | null>(null);
  // …and so does moving away from it while it stays in the stack (another tab, a pushed screen)
  useFocusEffect(useCallback(() => () => setFreshToken(null), []));
  const showToken = ({ token }: { token: string }) => {
    setFreshToken(token);
    issue.reset();
  };
  const asking = rotate.asking !== null || revoke.asking !== null;

  return (
    <Screen
      overlay={
        <>
          <ConfirmDialog
            {...rotate.dialog}
            title="Replace the device token?"
            message="The current token stops working at once: the beacon stays offline until it has the new one."
            confirmLabel="Replace token"
            destructive
            onConfirm={() => rotate.confirm(undefined, showToken)}
          />
          <ConfirmDialog
            {...revoke.dialog}
            title="Revoke the device token?"
            message="The token stops working at once and the station has no device until you create a new one. Its health history stays."
            confirmLabel="Revoke token"
            destructive
            onConfirm={() => revoke.confirm(undefined, () => setFreshToken(null))}
          />
        </>
      }
    >
      <Stack.Screen options={{ title: station.data ? `${station.data.name} · device` : 'Station · device' }} />
      <QueryBoundary
        query={station}
        noun="station"
        validId={valid}
        loadingLabel="Loading the device…"
        errorTitle="The device could not be loaded"
        alongside={[{ query: health, errorTitle: 'The device could not be loaded' }]}
      >
        {(data) =>
          health.data ? (
            <DeviceCredentials
              stationName={data.name}
              hasDevice={health.data.hasDevice}
              heard={heardWords(health.data)}
              freshToken={freshToken}
              readOnly={data.ownerId !== me?.id}
              issuing={issue.isPending}
              error={asking ? undefined : (issue.error?.message ?? revoke.dialog.error)}
              origin={origin}
              pairing={data.ownerId === me?.id ? <PairingCard origin={origin} onPair={() => router.push('/pair')} /> : null}
              onCreate={() => issue.mutate(undefined, { onSuccess: showToken })}
              onRotate={() => rotate.ask()}
              onRevoke={() => revoke.ask()}
              onHideToken={() => setFreshToken(null)}
            />
          ) : null
        }
      </QueryBoundary>
    </Screen>
  );
}
