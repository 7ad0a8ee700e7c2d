import { useRouter } from 'expo-router';

import { useSessionQuery } from '@/components/auth/queries';
import { QueryBoundary } from '@/components/query/query-boundary';
import { useRouteId } from '@/components/query/use-route-id';
import { useUnitQuery, useUpdateUnitMutation } from '@/components/units/queries';
import { LazyUnitForm as UnitForm } from '@/components/units/lazy-parts';
import { Screen } from '@/components/ui/screen';
import { layout } from '@/components/ui/theme';

export default function EditUnitRoute() {
  const router = useRouter();
  const { id: unitId, raw: id, valid } = useRouteId();
  const me = useSessionQuery().data;
  const unit = useUnitQuery(unitId);
  const update = useUpdateUnitMutation(unitId);
  const back = () => (router.canGoBack() ? router.back() : router.replace({ pathname: '/units/[id]', params: { id } }));

  return (
    <Screen maxWidth={layout.maxFormWidth + 280}>
      <QueryBoundary
        query={unit}
        noun="unit"
        validId={valid}
        refuse={(data) => (data.ownerId === me?.id ? null : `This unit belongs to ${data.ownerName}; only its owner can change it.`)}
      >
        {(data) => {
          const { id: _id, ownerId: _owner, ownerName: _name, photos: _photos, createdAt: _c, updatedAt: _u, ...values } = data;
          return (
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
        }}
      </QueryBoundary>
    </Screen>
  );
}
