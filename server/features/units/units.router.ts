import { Router } from 'express';
import type { Sequelize } from 'sequelize';
import { fittedFilterInput, PHOTO_MAX_BYTES, PHOTO_TYPES, unitInput, unitPatch } from '@/shared/schemas';
import type { Logger } from '../../lib/logger';
import { parseId } from '../../lib/params';
import { singleUpload } from '../../lib/upload';
import { currentUser, requireSignedIn } from '../../middleware/auth';
import type { FileStorage } from '../../storage';
import * as photos from './photos.service';
import * as units from './units.service';

const upload = singleUpload({
  field: 'photo',
  maxBytes: PHOTO_MAX_BYTES,
  types: PHOTO_TYPES,
  what: 'photo',
  typesInWords: 'JPEG, PNG or WebP',
});

export function unitsRouter({ sequelize, storage, logger }: { sequelize: Sequelize; storage: FileStorage; logger: Logger }) {
  const router = Router();
  router.use(requireSignedIn);
  const id = (value: unknown) => parseId(value, 'Unit');

  router.get('/', async (req, res) => {
    res.json(await units.listFor(currentUser(req)));
  });
  router.post('/', async (req, res) => {
    res.status(201).json(await units.create(sequelize, currentUser(req), unitInput.parse(req.body)));
  });
  router.get('/:id', async (req, res) => {
    res.json(await units.getFor(currentUser(req), id(req.params.id)));
  });
  router.patch('/:id', async (req, res) => {
    res.json(await units.update(sequelize, currentUser(req), id(req.params.id), unitPatch.parse(req.body)));
  });
  router.delete('/:id', async (req, res) => {
    const removed = await units.remove(sequelize, currentUser(req), id(req.params.id));
    res.status(204).end();
    void photos.removeStored(storage, removed, logger);
  });
  router.post('/:id/fitted-filter', async (req, res) => {
    const { filterIndex } = fittedFilterInput.parse(req.body);
    res.json(await units.recordFittedFilter(sequelize, currentUser(req), id(req.params.id), filterIndex));
  });
  router.post('/:id/copy', async (req, res) => {
    res.status(201).json(await units.copy(sequelize, currentUser(req), id(req.params.id)));
  });

  router.post('/:id/photos', async (req, res) => {
    const file = await upload(req, res);
    res.status(201).json(await photos.addPhoto(sequelize, storage, currentUser(req), id(req.params.id), file.buffer));
  });
  for (const which of ['main', 'thumb'] as const) {
    router.get(which === 'main' ? '/:id/photos/:photoId' : '/:id/photos/:photoId/thumb', async (req, res) => {
      const stored = await photos.readPhoto(storage, currentUser(req), id(req.params.id), parseId(req.params.photoId, 'Photo'), which);
      res.setHeader('Cache-Control', 'no-store');
      res.type(stored.contentType).send(stored.body);
    });
  }
  router.delete('/:id/photos/:photoId', async (req, res) => {
    await photos.deletePhoto(sequelize, storage, currentUser(req), id(req.params.id), parseId(req.params.photoId, 'Photo'));
    res.status(204).end();
  });
  return router;
}
