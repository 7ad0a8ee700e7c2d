import { Router } from 'express';
import type { Sequelize } from 'sequelize';
import { acceptInvitationInput } from '@/shared/schemas';
import { currentUser, requireSignedIn } from '../../middleware/auth';
import * as invitations from './invitations.service';

/** Mounted at /api/invitations — the invited person's side (the admins' side is under /api/clubs/:clubId/invitations). */
export function invitationsRouter({ sequelize }: { sequelize: Sequelize }) {
  const router = Router();
  router.use(requireSignedIn);
  router.post('/accept', async (req, res) => {
    const { token } = acceptInvitationInput.parse(req.body);
    res.json(await invitations.accept(sequelize, currentUser(req), token));
  });
  return router;
}
