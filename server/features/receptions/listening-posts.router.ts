import { Router } from 'express';
import type { Sequelize } from 'sequelize';
import { listeningPostInput } from '@/shared/schemas';
import { parseId } from '../../lib/params';
import { currentUser, requireSignedIn } from '../../middleware/auth';
import * as posts from './listening-posts.service';

/** /api/listening-posts: receive-only stations that post what they decoded. */
export function listeningPostsRouter({ sequelize }: { sequelize: Sequelize }) {
  const router = Router();
  router.use(requireSignedIn);
  const id = (value: unknown) => parseId(value, 'Listening post');

  router.get('/', async (req, res) => {
    res.json(await posts.listFor(sequelize, currentUser(req), req.query.include === 'club'));
  });
  router.post('/', async (req, res) => {
    res.status(201).json(await posts.create(sequelize, currentUser(req), listeningPostInput.parse(req.body)));
  });
  router.get('/:id', async (req, res) => {
    res.json(await posts.getFor(sequelize, currentUser(req), id(req.params.id)));
  });
  router.post('/:id/token', async (req, res) => {
    res.setHeader('Cache-Control', 'no-store');
    res.status(201).json({ token: await posts.rotateToken(sequelize, currentUser(req), id(req.params.id)) });
  });
  router.delete('/:id', async (req, res) => {
    await posts.remove(sequelize, currentUser(req), id(req.params.id));
    res.status(204).end();
  });
  return router;
}
