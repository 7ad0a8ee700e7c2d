import { Router } from 'express';
import { parseId } from '../../lib/params';
import { currentUser, requireSignedIn } from '../../middleware/auth';
import * as notices from './notifications.service';

/** Mounted at /api/notifications — the signed-in person's notices. */
export function notificationsRouter() {
  const router = Router();
  router.use(requireSignedIn);
  router.get('/', async (req, res) => {
    res.json(await notices.listFor(currentUser(req).id));
  });
  router.post('/read-all', async (req, res) => {
    res.json(await notices.markAllRead(currentUser(req).id));
  });
  router.post('/:id/read', async (req, res) => {
    await notices.markRead(currentUser(req).id, parseId(req.params.id, 'Notice'));
    res.status(204).end();
  });
  return router;
}
