import { Router } from 'express';
import multer from 'multer';
import { fittedFilterInput, PHOTO_MAX_BYTES, PHOTO_TYPES, unitInput, unitPatch } from '@/shared/schemas';
import { AppError } from '../../lib/app-error';
import type { Logger } from '../../lib/logger';
import { parseId } from '../../lib/params';
import { currentUser, requireSignedIn } from '../../middleware/auth';
import type { FileStorage } from '../../storage';
import * as photos from './photos.service';
import * as units from './units.service';

const upload = multer({
  storage: multer.memoryStorage(),
  limits: { fileSize: PHOTO_MAX_BYTES, files: 1, fields: 5 },
  fileFilter: (_req, file, done) => {
    if ((PHOTO_TYPES as readonly string[]).includes(file.mimetype)) return done(null, true);
    done(
      new AppError('unsupported-media-type', `Photos must be JPEG, PNG or WebP; this file is ${file.mimetype}`, {
        photo: 'Choose a JPEG, PNG or WebP photo',
      }),
    );
  },
}).single('photo');

const MB = PHOTO_MAX_BYTES / 1024 / 1024;

export function unitsRouter({ storage, logger }: { storage: FileStorage; logger: Logger }) {
  const router = Router();
  router.use(requireSignedIn);
  const id = (value: unknown) => parseId(value, 'Unit');

  router.get('/', async (req, res) => {
    res.json(await units.listFor(currentUser(req)));
  });
  router.post('/', async (req, res) => {
    res.status(201).json(await units.create(currentUser(req), unitInput.parse(req.body)));
  });
  router.get('/:id', async (req, res) => {
    res.json(await units.getFor(currentUser(req), id(req.params.id)));
  });
  router.patch('/:id', async (req, res) => {
    res.json(await units.update(currentUser(req), id(req.params.id), unitPatch.parse(req.body)));
  });
  router.delete('/:id', async (req, res) => {
    const removed = await units.remove(currentUser(req), id(req.params.id));
    res.status(204).end();
    void photos.removeStored(storage, removed, logger);
  });
  router.post('/:id/fitted-filter', async (req, res) => {
    const { filterIndex } = fittedFilterInput.parse(req.body);
    res.json(await units.recordFittedFilter(currentUser(req), id(req.params.id), filterIndex));
  });
  router.post('/:id/copy', async (req, res) => {
    res.status(201).json(await units.copy(currentUser(req), id(req.params.id)));
  });

  router.post('/:id/photos', (req, res, next) => {
    upload(req, res, async (error: unknown) => {
      try {
        if (error instanceof multer.MulterError) {
          throw error.code === 'LIMIT_FILE_SIZE'
            ? new AppError('payload-too-large', `A photo may be at most ${MB} MB`, { photo: `Choose a photo of at most ${MB} MB` })
            : new AppError('bad-request', `Upload one photo in the field 'photo' (${error.message})`, { photo: 'Upload one photo' });
        }
        if (error) throw error;
        if (!req.file) throw new AppError('bad-request', 'No photo was sent', { photo: 'Choose a photo to upload' });
        res.status(201).json(await photos.addPhoto(storage, currentUser(req), id(req.params.id), req.file.buffer));
      } catch (failure) {
        next(failure);
      }
    });
  });
  for (const which of ['main', 'thumb'] as const) {
    router.get(which === 'main' ? '/:id/photos/:photoId' : '/:id/photos/:photoId/thumb', async (req, res) => {
      const stored = await photos.readPhoto(storage, currentUser(req), id(req.params.id), parseId(req.params.photoId, 'Photo'), which);
      res.setHeader('Cache-Control', 'private, max-age=3600');
      res.type(stored.contentType).send(stored.body);
    });
  }
  router.delete('/:id/photos/:photoId', async (req, res) => {
    await photos.deletePhoto(storage, currentUser(req), id(req.params.id), parseId(req.params.photoId, 'Photo'));
    res.status(204).end();
  });
  return router;
}
