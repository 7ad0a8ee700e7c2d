import { useLocalSearchParams, useRouter } from 'expo-router';
import { useState } from 'react';
import { Linking, StyleSheet, View } from 'react-native';

import { useSessionQuery } from '@/components/auth/queries';
import { pickPhoto } from '@/components/units/pick-photo';
import {
  useCopyUnitMutation,
  useDeletePhotoMutation,
  useDeleteUnitMutation,
  useUnitQuery,
  useUploadPhotoMutation,
} from '@/components/units/queries';
import type { UploadProgress } from '@/components/units/api-upload';
import { FittedFilterCard } from '@/components/units/fitted-filter-card';
import { LazyUnitDetails as UnitDetails } from '@/components/units/lazy-parts';
import { UnitPhotos } from '@/components/units/unit-photos';
import { generatorSummary } from '@/components/units/unit-summary';
import { Button } from '@/components/ui/button';
import { Card } from '@/components/ui/card';
import { ConfirmDialog } from '@/components/ui/confirm-dialog';
import { Notice } from '@/components/ui/notice';
import { ErrorState, LoadingState } from '@/components/ui/query-states';
import { Screen } from '@/components/ui/screen';
import { Text } from '@/components/ui/text';
import { space } from '@/components/ui/theme';
import { FormSection } from '@/components/workshop/form-section';
import { ApiError } from '@/shared/api/client';
import { PHOTO_MAX_BYTES, PHOTO_TYPES, type UnitPhoto } from '@/shared/schemas';

type Asking = { kind: 'unit' } | { kind: 'photo'; photo: UnitPhoto } | null;

export default function UnitDetailRoute() {
  const router = useRouter();
  const { id } = useLocalSearchParams<{ id: string }>();
  const unitId = Number(id);
  const me = useSessionQuery().data;
  const unit = useUnitQuery(unitId);
  const [progress, setProgress] = useState<UploadProgress | null>(null);
  const [pickError, setPickError] = useState<string | undefined>();
  const upload = useUploadPhotoMutation(unitId, setProgress);
  const removePhoto = useDeletePhotoMutation(unitId);
  const removeUnit = useDeleteUnitMutation(unitId);
  const copy = useCopyUnitMutation(unitId);
  const [asking, setAsking] = useState<Asking>(null);

  const addPhoto = async () => {
    setPickError(undefined);
    upload.reset();
    const file = await pickPhoto();
    if (!file) return;
    // say what is wrong before sending; the server checks again
    if (!(PHOTO_TYPES as readonly string[]).includes(file.type))
      return setPickError(`“${file.name}” is not a JPEG, PNG or WebP photo. Choose one of those.`);
    if (file.size > PHOTO_MAX_BYTES)
      return setPickError(
        `“${file.name}” is ${(file.size / 1024 / 1024).toFixed(1)} MB; a photo may be at most ${PHOTO_MAX_BYTES / 1024 / 1024} MB.`,
      );
    setProgress({ sentBytes: 0, totalBytes: file.size });
    upload.mutate(file, { onSettled: () => setProgress(null) });
  };

  let body;
  if (!Number.isInteger(unitId) || unitId <= 0)
    body = <ErrorState title="Unit not found" error={new Error('This address does not name a unit.')} />;
  else if (unit.isPending) body = <LoadingState label="Loading the unit…" />;
  else if (unit.isError) {
    const missing = unit.error instanceof ApiError && unit.error.status === 404;
    body = (
      <ErrorState
        title={missing ? 'Unit not found' : 'The unit could not be loaded'}
        error={unit.error}
        onRetry={missing ? undefined : () => unit.refetch()}
      />
    );
  } else {
    const readOnly = unit.data.ownerId !== me?.id;
    const uploadError =
      pickError ?? (upload.error instanceof ApiError ? (upload.error.fields.photo ?? upload.error.message) : upload.error?.message);
    body = (
      <>
        <View style={styles.head}>
          <View style={styles.titleBlock}>
            <Text variant="title" accessibilityRole="header">
              {unit.data.name}
            </Text>
            <Text variant="mono" tone="primary">
              {generatorSummary(unit.data)}
              {unit.data.serialLabel ? ` · ${unit.data.serialLabel}` : ''}
            </Text>
          </View>
          {readOnly ? null : (
            <View style={styles.actions}>
              <Button
                label="Edit"
                variant="secondary"
                accessibilityLabel={`Edit ${unit.data.name}`}
                onPress={() => router.push({ pathname: '/units/[id]/edit', params: { id: String(unitId) } })}
              />
              <Button
                label="Copy unit"
                variant="secondary"
                busy={copy.isPending}
                onPress={() =>
                  copy.mutate(undefined, {
                    onSuccess: (created) => router.push({ pathname: '/units/[id]', params: { id: String(created.id) } }),
                  })
                }
              />
              <Button
                label="Delete"
                variant="danger"
                accessibilityLabel={`Delete ${unit.data.name}`}
                onPress={() => setAsking({ kind: 'unit' })}
              />
            </View>
          )}
        </View>
        {copy.error ? <Notice message={copy.error.message} /> : null}
        {readOnly ? (
          <Card tone="signal">
            <Text variant="label">Read-only: this unit belongs to {unit.data.ownerName}</Text>
          </Card>
        ) : null}
        <FittedFilterCard unit={unit.data} readOnly={readOnly} />
        <FormSection title="Photos">
          <UnitPhotos
            unitName={unit.data.name}
            photos={unit.data.photos}
            readOnly={readOnly}
            progress={progress}
            uploading={upload.isPending}
            error={uploadError}
            onAdd={addPhoto}
            onDelete={(photo) => setAsking({ kind: 'photo', photo })}
            onOpen={(photo) => Linking.openURL(photo.url)}
          />
        </FormSection>
        <UnitDetails unit={unit.data} />
      </>
    );
  }

  const close = () => {
    removeUnit.reset();
    removePhoto.reset();
    setAsking(null);
  };
  const dialog =
    asking?.kind === 'unit' ? (
      <ConfirmDialog
        visible
        title="Delete this unit?"
        message={`“${unit.data?.name ?? 'This unit'}” and its photos will be removed for good. Stations that use it keep their settings but lose their hardware and cannot transmit until you assign another unit.`}
        confirmLabel="Delete unit"
        destructive
        busy={removeUnit.isPending}
        error={removeUnit.error?.message}
        onCancel={close}
        onConfirm={() =>
          removeUnit.mutate(undefined, {
            onSuccess: () => {
              setAsking(null);
              router.replace('/units');
            },
          })
        }
      />
    ) : asking?.kind === 'photo' ? (
      <ConfirmDialog
        visible
        title="Delete this photo?"
        message="The photo will be removed from the unit for good."
        confirmLabel="Delete photo"
        destructive
        busy={removePhoto.isPending}
        error={removePhoto.error?.message}
        onCancel={close}
        onConfirm={() => removePhoto.mutate(asking.photo.id, { onSuccess: () => setAsking(null) })}
      />
    ) : null;

  return <Screen overlay={dialog}>{body}</Screen>;
}

const styles = StyleSheet.create({
  head: { flexDirection: 'row', flexWrap: 'wrap', alignItems: 'flex-end', justifyContent: 'space-between', gap: space.md },
  titleBlock: { gap: space.xs, flexShrink: 1 },
  actions: { flexDirection: 'row', flexWrap: 'wrap', gap: space.sm },
});
