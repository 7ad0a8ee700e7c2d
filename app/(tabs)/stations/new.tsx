import { useRouter } from 'expo-router';

import { useSessionQuery } from '@/components/auth/queries';
import { useCreateStationMutation } from '@/components/stations/queries';
import { StationForm } from '@/components/stations/station-form';
import { Card } from '@/components/ui/card';
import { Screen } from '@/components/ui/screen';
import { layout } from '@/components/ui/theme';

export default function NewStationRoute() {
  const router = useRouter();
  const user = useSessionQuery().data;
  const create = useCreateStationMutation();
  return (
    <Screen maxWidth={layout.maxFormWidth + 120}>
      <Card>
        <StationForm
          defaultValues={{ callsign: user?.callsign ?? '' }}
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
