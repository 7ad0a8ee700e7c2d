import { useLocalSearchParams, useRouter } from 'expo-router';
import { useMemo } from 'react';

import { useSessionQuery } from '@/components/auth/queries';
import { useCreateStationMutation } from '@/components/stations/queries';
import { takeStationDraft } from '@/components/stations/station-draft';
import { StationForm } from '@/components/stations/station-form';
import { useUnitsQuery } from '@/components/units/queries';
import { ErrorState, LoadingState } from '@/components/ui/query-states';
import { Card } from '@/components/ui/card';
import { Screen } from '@/components/ui/screen';
import { layout } from '@/components/ui/theme';

export default function NewStationRoute() {
  const router = useRouter();
  const user = useSessionQuery().data;
  const create = useCreateStationMutation();
  const units = useUnitsQuery();
  // back from "Register a unit first": what was typed, with the new unit chosen
  const { unitId } = useLocalSearchParams<{ unitId?: string }>();
  // the screen may still be mounted from before the detour, so the draft is read (once) for each new unitId
  const draft = useMemo(() => (unitId ? takeStationDraft() : null), [unitId]);
  const newUnitId = Number(unitId);
  if (units.isPending)
    return (
      <Screen maxWidth={layout.maxFormWidth + 120}>
        <LoadingState label="Loading your units…" />
      </Screen>
    );
  if (units.isError)
    return (
      <Screen maxWidth={layout.maxFormWidth + 120}>
        <ErrorState title="Your units could not be loaded" error={units.error} onRetry={() => units.refetch()} />
      </Screen>
    );
  return (
    <Screen maxWidth={layout.maxFormWidth + 120}>
      <Card>
        <StationForm
          key={unitId ?? 'no-unit'}
          units={units.data}
          defaultValues={{
            callsign: user?.callsign ?? '',
            ...draft,
            ...(Number.isInteger(newUnitId) && newUnitId > 0 ? { unitId: newUnitId } : {}),
          }}
          onSubmit={async (values) => {
            const station = await create.mutateAsync(values);
            router.replace({ pathname: '/stations/[id]', params: { id: String(station.id) } });
          }}
          onCancel={() => (router.canGoBack() ? router.back() : router.replace('/stations'))}
        />
      </Card>
    </Screen>
  );
}
