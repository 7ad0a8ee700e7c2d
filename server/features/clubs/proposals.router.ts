import { Router } from 'express';
import type { Sequelize } from 'sequelize';
import { parseId } from '../../lib/params';
import { currentUser, requireSignedIn } from '../../middleware/auth';
import * as moderation from './moderation.service';

/** Mounted at /api/offset-proposals — the station owner's side: read the clubs' proposals, accept or decline them. */
export function proposalsRouter({ sequelize }: { sequelize: Sequelize }) {
  const router = Router();
  router.use(requireSignedIn);
  router.get('/', async (req, res) => {
    res.json(await moderation.listMine(currentUser(req)));
  });
  for (const [verb, accept] of [
    ['accept', true],
    ['decline', false],
  ] as const) {
    router.post(`/:id/${verb}`, async (req, res) => {
      res.json(await moderation.decide(sequelize, currentUser(req), parseId(req.params.id, 'Proposal'), accept));
    });
  }
  return router;
}
