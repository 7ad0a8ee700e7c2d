import { randomUUID } from 'node:crypto';
import type Sharp from 'sharp';
import type { SessionUser } from '@/shared/api/contracts';
import type { TransactionRunner } from '../../db/transaction';
import { AppError } from '../../lib/app-error';
import * as audit from '../audit/audit.service';
import type { Logger } from '../../lib/logger';
import type { FileStorage } from '../../storage';
import * as repo from './units.repo';
import { getFor, getOwnedBy } from './units.service';

const EXTENSIONS: Record<string, string> = { jpeg: 'jpg', png: 'png', webp: 'webp' };

/** A phone photo is 12–50 MP; anything larger is refused before it is decoded (50 MP RGBA is 200 MB raw). */
export const PHOTO_MAX_PIXELS = 50_000_000;
/** Decodes running at once in this process; further uploads wait their turn (a 49 MP decode peaks near 100 MB). */
const DECODES_AT_ONCE = 1;
let decoding = 0;
const waiting: (() => void)[] = [];
async function oneDecodeAtATime<T>(work: () => Promise<T>): Promise<T> {
  if (decoding >= DECODES_AT_ONCE) await new Promise<void>((resolve) => waiting.push(resolve));
  decoding += 1;
  try {
    return await work();
  } finally {
    decoding -= 1;
    waiting.shift()?.();
  }
}

/** Re-encodes the photo (which drops EXIF data such as a GPS position) and makes a thumbnail. */
async function process(buffer: Buffer) {
  // Loaded on the first upload, so servers that never see one do not carry the image library.
  const sharp = (await import('sharp')).default;
  // No cache of decoded images between requests, and one worker thread per decode: memory stays bounded.
  sharp.cache(false);
  sharp.concurrency(1);
  let format: string | undefined;
  let pixels = 0;
  try {
    const meta = await sharp(buffer).metadata();
    format = meta.format;
    pixels = (meta.width ?? 0) * (meta.height ?? 0);
  } catch {
    format = undefined;
  }
  if (!format || !EXTENSIONS[format]) {
    throw new AppError('bad-request', 'This file is not a JPEG, PNG or WebP image', { photo: 'Choose a JPEG, PNG or WebP photo' });
  }
  if (pixels > PHOTO_MAX_PIXELS) {
    const mp = Math.round(PHOTO_MAX_PIXELS / 1e6);
    throw new AppError('payload-too-large', `The photo has ${Math.round(pixels / 1e6)} megapixels; at most ${mp} are accepted`, {
      photo: `Choose a photo of at most ${mp} megapixels`,
    });
  }
  return oneDecodeAtATime(() => encode(sharp, buffer, format));
}

async function encode(sharp: typeof Sharp, buffer: Buffer, format: string) {
  const options = { limitInputPixels: PHOTO_MAX_PIXELS, sequentialRead: true };
  const base = sharp(buffer, options).rotate().resize({ width: 2000, height: 2000, fit: 'inside', withoutEnlargement: true });
  const main = await (
    format === 'png' ? base.png() : format === 'webp' ? base.webp({ quality: 85 }) : base.jpeg({ quality: 85 })
  ).toBuffer();
  // The thumbnail comes from the (at most 2000 px) re-encoded photo: the original is decoded only once.
  const thumb = await sharp(main).resize(320, 240, { fit: 'cover' }).webp({ quality: 70 }).toBuffer();
  return { main, thumb, contentType: `image/${format}`, extension: EXTENSIONS[format] };
}

export async function addPhoto(db: TransactionRunner, storage: FileStorage, user: SessionUser, unitId: number, buffer: Buffer) {
  const unit = await getOwnedBy(user, unitId);
  const { main, thumb, contentType, extension } = await process(buffer);
  const name = randomUUID();
  const storageKey = `units/${unitId}/${name}.${extension}`;
  const thumbKey = `units/${unitId}/${name}-thumb.webp`;
  await storage.put(storageKey, main, contentType);
  await storage.put(thumbKey, thumb, 'image/webp');
  return db.transaction(async (transaction) => {
    const photo = await repo.insertPhoto({ unitId, storageKey, thumbKey, contentType, bytes: main.length }, transaction);
    await audit.record(
      {
        actor: user,
        ownerId: user.id,
        action: 'photo.add',
        entityType: 'photo',
        entityId: photo.id,
        summary: `Added a photo to unit ${unit.name}`,
      },
      transaction,
    );
    return photo;
  });
}

export async function readPhoto(storage: FileStorage, user: SessionUser, unitId: number, photoId: number, which: 'main' | 'thumb') {
  await getFor(user, unitId);
  const photo = await repo.findPhoto(unitId, photoId);
  if (!photo) throw new AppError('not-found', `Photo ${photoId} does not exist`);
  const stored = await storage.get(which === 'thumb' ? photo.thumbKey : photo.storageKey);
  if (!stored) throw new AppError('not-found', `Photo ${photoId} is missing from storage`);
  return stored;
}

export async function deletePhoto(db: TransactionRunner, storage: FileStorage, user: SessionUser, unitId: number, photoId: number) {
  const unit = await getOwnedBy(user, unitId);
  const photo = await repo.findPhoto(unitId, photoId);
  if (!photo) throw new AppError('not-found', `Photo ${photoId} does not exist`);
  await db.transaction(async (transaction) => {
    await repo.removePhoto(photo.id, transaction);
    await audit.record(
      {
        actor: user,
        ownerId: user.id,
        action: 'photo.delete',
        entityType: 'photo',
        entityId: photoId,
        summary: `Deleted a photo of unit ${unit.name}`,
      },
      transaction,
    );
  });
  await removeStored(storage, [photo]);
}

/** Deletes stored files after their rows are gone; a storage failure is logged, not returned. */
export async function removeStored(storage: FileStorage, photos: { storageKey: string; thumbKey: string }[], logger?: Logger) {
  for (const photo of photos) {
    await Promise.all([storage.delete(photo.storageKey), storage.delete(photo.thumbKey)]).catch((error) =>
      logger?.warn({ err: error }, 'could not delete a stored photo'),
    );
  }
}
