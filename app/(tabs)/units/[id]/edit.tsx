import { useLocalSearchParams, useRouter } from 'expo-router';

import { useSessionQuery } from '@/components/auth/queries';
import { useUnitQuery, useUpdateUnitMutation } from '@/components/units/queries';
import { LazyUnitForm as UnitForm } from '@/components/units/lazy-parts';
import { ErrorState, LoadingState } from '@/components/ui/query-states';
import { Screen } from '@/components/ui/screen';
import { layout } from '@/components/ui/theme';

export default function EditUnitRoute() {
  const router = useRouter();
  const { id } = useLocalSearchParams<{ id: string }>();
  const unitId = Number(id);
  const me = useSessionQuery().data;
  const unit = useUnitQuery(unitId);
  const update = useUpdateUnitMutation(unitId);
  const back = () => (router.canGoBack() ? router.back() : router.replace({ pathname: '/units/[id]', params: { id: String(unitId) } }));

  let body;
  if (!Number.isInteger(unitId) || unitId <= 0)
    body = <ErrorState title="Unit not found" error={new Error('This address does not name a unit.')} />;
  else if (unit.isPending) body = <LoadingState label="Loading the unit…" />;
  else if (unit.isError) body = <ErrorState title="The unit could not be loaded" error={unit.error} onRetry={() => unit.refetch()} />;
  else if (unit.data.ownerId !== me?.id)
    body = <ErrorState title="Read-only" error={new Error(`This unit belongs to ${unit.data.ownerName}; only its owner can change it.`)} />;
  else {
    const { id: _id, ownerId: _owner, ownerName: _name, photos: _photos, createdAt: _c, updatedAt: _u, ...values } = unit.data;
    body = (
      <UnitForm
        defaultValues={values}
        submitLabel="Save unit"
        onSubmit={async (next) => {
          await update.mutateAsync(next);
          back();
        }}
        onCancel={back}
      />
    );
  }
  return <Screen maxWidth={layout.maxFormWidth + 280}>{body}</Screen>;
}
