import { Router } from 'express';
import { stationInput, stationPatch } from '@/shared/schemas';
import { parseId } from '../../lib/params';
import { currentUser, requireSignedIn } from '../../middleware/auth';
import * as stations from './stations.service';

export function stationsRouter() {
  const router = Router();
  router.use(requireSignedIn);

  router.get('/', async (req, res) => {
    res.json(await stations.listFor(currentUser(req)));
  });
  router.post('/', async (req, res) => {
    const input = stationInput.parse(req.body) as Required<ReturnType<typeof stationInput.parse>>;
    res.status(201).json(await stations.create(currentUser(req), input));
  });
  router.get('/:id', async (req, res) => {
    res.json(await stations.getFor(currentUser(req), parseId(req.params.id, 'Station')));
  });
  router.patch('/:id', async (req, res) => {
    const patch = stationPatch.parse(req.body);
    res.json(await stations.update(currentUser(req), parseId(req.params.id, 'Station'), patch));
  });
  router.delete('/:id', async (req, res) => {
    await stations.remove(currentUser(req), parseId(req.params.id, 'Station'));
    res.status(204).end();
  });
  return router;
}
