import { useLocalSearchParams, useRouter } from 'expo-router';
import { useState } from 'react';
import { StyleSheet, View } from 'react-native';

import { useSessionQuery } from '@/components/auth/queries';
import { useDeleteStationMutation, useStationQuery } from '@/components/stations/queries';
import { StationDetails } from '@/components/stations/station-details';
import { Button } from '@/components/ui/button';
import { ConfirmDialog } from '@/components/ui/confirm-dialog';
import { formatLocator } from '@/components/ui/format';
import { ErrorState, LoadingState } from '@/components/ui/query-states';
import { Screen } from '@/components/ui/screen';
import { Text } from '@/components/ui/text';
import { space } from '@/components/ui/theme';

export default function StationDetailRoute() {
  const router = useRouter();
  const { id } = useLocalSearchParams<{ id: string }>();
  const stationId = Number(id);
  const me = useSessionQuery().data;
  const station = useStationQuery(stationId);
  const remove = useDeleteStationMutation(stationId);
  const [confirming, setConfirming] = useState(false);

  const goToList = () => (router.canGoBack() ? router.back() : router.replace('/stations'));

  let body;
  if (!Number.isInteger(stationId) || stationId <= 0)
    body = <ErrorState title="Station not found" error={new Error('This address does not name a station.')} />;
  else if (station.isPending) body = <LoadingState label="Loading the station…" />;
  else if (station.isError)
    body = (
      <ErrorState
        title={station.error instanceof Error && 'status' in station.error && station.error.status === 404 ? 'Station not found' : 'The station could not be loaded'}
        error={station.error}
        onRetry={() => station.refetch()}
      />
    );
  else {
    const readOnly = station.data.ownerId !== me?.id;
    body = (
      <>
        <View style={styles.head}>
          <View style={styles.titleBlock}>
            <Text variant="title" accessibilityRole="header">
              {station.data.name}
            </Text>
            <Text variant="mono" tone="primary">
              {station.data.callsign} · {formatLocator(station.data.locator)}
            </Text>
          </View>
          {readOnly ? null : (
            <View style={styles.actions}>
              <Button
                label="Edit"
                variant="secondary"
                accessibilityLabel={`Edit ${station.data.name}`}
                onPress={() => router.push({ pathname: '/stations/[id]/edit', params: { id: String(stationId) } })}
              />
              <Button
                label="Delete"
                variant="danger"
                accessibilityLabel={`Delete ${station.data.name}`}
                onPress={() => setConfirming(true)}
              />
            </View>
          )}
        </View>
        <StationDetails station={station.data} readOnly={readOnly} />
      </>
    );
  }

  return (
    <Screen
      overlay={
        <ConfirmDialog
          visible={confirming}
          title="Delete this station?"
          message={`“${station.data?.name ?? 'This station'}” and its notes will be removed for good.`}
          confirmLabel="Delete station"
          destructive
          busy={remove.isPending}
          error={remove.error instanceof Error ? remove.error.message : undefined}
          onCancel={() => {
            remove.reset();
            setConfirming(false);
          }}
          onConfirm={() =>
            remove.mutate(undefined, {
              onSuccess: () => {
                setConfirming(false);
                goToList();
              },
            })
          }
        />
      }
    >
      {body}
    </Screen>
  );
}

const styles = StyleSheet.create({
  head: { flexDirection: 'row', flexWrap: 'wrap', alignItems: 'flex-end', justifyContent: 'space-between', gap: space.md },
  titleBlock: { gap: space.xs, flexShrink: 1 },
  actions: { flexDirection: 'row', gap: space.sm },
});
