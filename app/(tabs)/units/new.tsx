import { useRouter } from 'expo-router';

import { useCreateUnitMutation } from '@/components/units/queries';
import { LazyUnitForm as UnitForm } from '@/components/units/lazy-parts';
import { Screen } from '@/components/ui/screen';
import { layout } from '@/components/ui/theme';

export default function NewUnitRoute() {
  const router = useRouter();
  const create = useCreateUnitMutation();
  return (
    <Screen maxWidth={layout.maxFormWidth + 280}>
      <UnitForm
        submitLabel="Save unit"
        onSubmit={async (values) => {
          const unit = await create.mutateAsync(values);
          router.replace({ pathname: '/units/[id]', params: { id: String(unit.id) } });
        }}
        onCancel={() => (router.canGoBack() ? router.back() : router.replace('/units'))}
      />
    </Screen>
  );
}
