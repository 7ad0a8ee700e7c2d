import { useState } from 'react';

import { ApiError } from '@/shared/api/client';
import { PHOTO_MAX_BYTES, PHOTO_TYPES } from '@/shared/schemas';

import type { UploadProgress } from './api-upload';
import { pickPhoto } from './pick-photo';
import { useUploadPhotoMutation } from './queries';

/**
 * Adding a photo to a unit: pick a file, say what is wrong with it before sending (the server checks
 * again), upload with progress. `error` is the picker's or the server's message, if any.
 */
export function usePhotoUpload(unitId: number) {
  const [progress, setProgress] = useState<UploadProgress | null>(null);
  const [pickError, setPickError] = useState<string | undefined>();
  const upload = useUploadPhotoMutation(unitId, setProgress);

  const add = async () => {
    setPickError(undefined);
    upload.reset();
    const file = await pickPhoto();
    if (!file) return;
    if (!(PHOTO_TYPES as readonly string[]).includes(file.type))
      return setPickError(`“${file.name}” is not a JPEG, PNG or WebP photo. Choose one of those.`);
    if (file.size > PHOTO_MAX_BYTES)
      return setPickError(
        `“${file.name}” is ${(file.size / 1024 / 1024).toFixed(1)} MB; a photo may be at most ${PHOTO_MAX_BYTES / 1024 / 1024} MB.`,
      );
    setProgress({ sentBytes: 0, totalBytes: file.size });
    upload.mutate(file, { onSettled: () => setProgress(null) });
  };

  const error =
    pickError ?? (upload.error instanceof ApiError ? (upload.error.fields.photo ?? upload.error.message) : upload.error?.message);
  return { add, progress, uploading: upload.isPending, error };
}
