import { Image, Pressable, StyleSheet, View } from 'react-native';

import { PHOTO_MAX_BYTES, type UnitPhoto } from '@/shared/schemas';

import { Button } from '../ui/button';
import { Notice } from '../ui/notice';
import { Text } from '../ui/text';
import { radius, space } from '../ui/theme';
import { useAppTheme } from '../ui/theme-provider';
import type { UploadProgress } from './api-upload';

export type UnitPhotosProps = {
  unitName: string;
  photos: UnitPhoto[];
  readOnly?: boolean;
  /** null = no upload running */
  progress: UploadProgress | null;
  uploading: boolean;
  error?: string;
  onAdd: () => void;
  onDelete: (photo: UnitPhoto) => void;
  onOpen?: (photo: UnitPhoto) => void;
};

const mb = (bytes: number) => `${(bytes / 1024 / 1024).toFixed(1)} MB`;
const kb = (bytes: number) => (bytes >= 1024 * 1024 ? mb(bytes) : `${Math.max(1, Math.round(bytes / 1024))} KB`);

/** Photos of the board and its wiring: thumbnails, an upload with progress, delete per photo. */
export function UnitPhotos({ unitName, photos, readOnly, progress, uploading, error, onAdd, onDelete, onOpen }: UnitPhotosProps) {
  const { colors } = useAppTheme();
  const percent = progress && progress.totalBytes > 0 ? Math.round((progress.sentBytes / progress.totalBytes) * 100) : null;
  return (
    <View style={styles.wrap}>
      {photos.length === 0 ? <Text tone="muted">No photos yet. A photo of the board and its filters helps your club help you.</Text> : null}
      <View style={styles.grid}>
        {photos.map((photo, index) => (
          <View key={photo.id} style={[styles.tile, { borderColor: colors.border, backgroundColor: colors.background }]}>
            <Pressable
              accessibilityRole="imagebutton"
              accessibilityLabel={`Open photo ${index + 1} of ${unitName}`}
              onPress={() => onOpen?.(photo)}
            >
              <Image source={{ uri: photo.thumbUrl }} style={styles.thumb} accessibilityLabel={`Photo ${index + 1} of ${unitName}`} />
            </Pressable>
            <View style={styles.tileFoot}>
              <Text variant="caption" tone="muted">
                {kb(photo.bytes)}
              </Text>
              {readOnly ? null : (
                <Button
                  label="Delete"
                  variant="danger"
                  accessibilityLabel={`Delete photo ${index + 1}`}
                  onPress={() => onDelete(photo)}
                  style={styles.deleteButton}
                />
              )}
            </View>
          </View>
        ))}
      </View>
      {uploading ? (
        <View
          style={styles.progress}
          accessibilityRole="progressbar"
          accessibilityLabel="Uploading the photo"
          accessibilityValue={{ now: percent ?? 0, min: 0, max: 100 }}
        >
          <Text variant="label">
            Uploading the photo…{percent === null ? '' : ` ${percent} %`}
            {progress ? ` (${kb(progress.sentBytes)} of ${kb(progress.totalBytes)})` : ''}
          </Text>
          <View style={[styles.bar, { backgroundColor: colors.border }]}>
            <View style={[styles.barFill, { backgroundColor: colors.primary, width: `${percent ?? 5}%` }]} />
          </View>
        </View>
      ) : null}
      {error ? <Notice message={error} /> : null}
      {readOnly ? null : (
        <View style={styles.add}>
          <Button label="Add a photo" variant="secondary" onPress={onAdd} disabled={uploading} />
          <Text variant="caption" tone="muted">
            JPEG, PNG or WebP, up to {mb(PHOTO_MAX_BYTES)}.
          </Text>
        </View>
      )}
    </View>
  );
}

const styles = StyleSheet.create({
  wrap: { gap: space.md },
  grid: { flexDirection: 'row', flexWrap: 'wrap', gap: space.md },
  tile: { borderWidth: 1, borderRadius: radius.md, overflow: 'hidden', width: 148 },
  thumb: { width: 148, height: 148 },
  tileFoot: { flexDirection: 'row', alignItems: 'center', justifyContent: 'space-between', paddingLeft: space.sm },
  deleteButton: { minHeight: 36, paddingHorizontal: space.sm },
  progress: { gap: space.xs },
  bar: { height: 6, borderRadius: 3, overflow: 'hidden' },
  barFill: { height: 6 },
  add: { flexDirection: 'row', flexWrap: 'wrap', alignItems: 'center', gap: space.md },
});
