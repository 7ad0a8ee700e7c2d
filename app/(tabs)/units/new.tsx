import { useLocalSearchParams, useRouter } from 'expo-router';

import { useCreateUnitMutation } from '@/components/units/queries';
import { LazyUnitForm as UnitForm } from '@/components/units/lazy-parts';
import { Screen } from '@/components/ui/screen';
import { layout } from '@/components/ui/theme';

export default function NewUnitRoute() {
  const router = useRouter();
  const create = useCreateUnitMutation();
  // "Register a unit first" from a new station: go back to it with the new unit chosen
  const { then } = useLocalSearchParams<{ then?: string }>();
  return (
    <Screen maxWidth={layout.maxFormWidth + 280}>
      <UnitForm
        submitLabel="Save unit"
        onSubmit={async (values) => {
          const unit = await create.mutateAsync(values);
          if (then === 'new-station') router.replace({ pathname: '/stations/new', params: { unitId: String(unit.id) } });
          else router.replace({ pathname: '/units/[id]', params: { id: String(unit.id) } });
        }}
        onCancel={() => (router.canGoBack() ? router.back() : router.replace('/units'))}
      />
    </Screen>
  );
}
