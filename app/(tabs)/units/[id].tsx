import { useRouter } from 'expo-router';
import { Linking } from 'react-native';

import { useSessionQuery } from '@/components/auth/queries';
import { FormSection } from '@/components/form/form-section';
import { QueryBoundary } from '@/components/query/query-boundary';
import { useConfirmedMutation } from '@/components/query/use-confirmed-mutation';
import { useRouteId } from '@/components/query/use-route-id';
import { LazyUnitDetails as UnitDetails } from '@/components/units/lazy-parts';
import { useCopyUnitMutation, useDeletePhotoMutation, useDeleteUnitMutation, useUnitQuery } from '@/components/units/queries';
import { FittedFilterCard } from '@/components/units/fitted-filter-card';
import { UnitHead } from '@/components/units/unit-head';
import { UnitPhotos } from '@/components/units/unit-photos';
import { usePhotoUpload } from '@/components/units/use-photo-upload';
import { ConfirmDialog } from '@/components/ui/confirm-dialog';
import { Screen } from '@/components/ui/screen';
import type { UnitPhoto } from '@/shared/schemas';

export default function UnitDetailRoute() {
  const router = useRouter();
  const { id: unitId, raw: id, valid } = useRouteId();
  const me = useSessionQuery().data;
  const unit = useUnitQuery(unitId);
  const photo = usePhotoUpload(unitId);
  const copy = useCopyUnitMutation(unitId);
  const removeUnit = useConfirmedMutation(useDeleteUnitMutation(unitId));
  const removePhoto = useConfirmedMutation(useDeletePhotoMutation(unitId), null as UnitPhoto | null);

  return (
    <Screen
      overlay={
        <>
          <ConfirmDialog
            {...removeUnit.dialog}
            title="Delete this unit?"
            message={`“${unit.data?.name ?? 'This unit'}” and its photos will be removed for good. Stations that use it keep their settings but lose their hardware and cannot transmit until you assign another unit.`}
            confirmLabel="Delete unit"
            destructive
            onConfirm={() => removeUnit.confirm(undefined, () => router.replace('/units'))}
          />
          <ConfirmDialog
            {...removePhoto.dialog}
            title="Delete this photo?"
            message="The photo will be removed from the unit for good."
            confirmLabel="Delete photo"
            destructive
            onConfirm={() => removePhoto.asking && removePhoto.confirm(removePhoto.asking.id)}
          />
        </>
      }
    >
      <QueryBoundary query={unit} noun="unit" validId={valid}>
        {(data) => {
          const readOnly = data.ownerId !== me?.id;
          return (
            <>
              <UnitHead
                unit={data}
                readOnly={readOnly}
                copying={copy.isPending}
                copyError={copy.error?.message}
                onEdit={() => router.push({ pathname: '/units/[id]/edit', params: { id } })}
                onCopy={() =>
                  copy.mutate(undefined, {
                    onSuccess: (created) => router.push({ pathname: '/units/[id]', params: { id: String(created.id) } }),
                  })
                }
                onDelete={() => removeUnit.ask()}
              />
              <FittedFilterCard unit={data} readOnly={readOnly} />
              <FormSection title="Photos">
                <UnitPhotos
                  unitName={data.name}
                  photos={data.photos}
                  readOnly={readOnly}
                  progress={photo.progress}
                  uploading={photo.uploading}
                  error={photo.error}
                  onAdd={photo.add}
                  onDelete={(picked) => removePhoto.ask(picked)}
                  onOpen={(picked) => Linking.openURL(picked.url)}
                />
              </FormSection>
              <UnitDetails unit={data} />
            </>
          );
        }}
      </QueryBoundary>
    </Screen>
  );
}
