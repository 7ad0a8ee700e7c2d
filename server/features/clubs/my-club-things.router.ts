import { Router } from 'express';
import type { Sequelize } from 'sequelize';
import { acceptInvitationInput } from '@/shared/schemas';
import { parseId } from '../../lib/params';
import { currentUser, requireSignedIn } from '../../middleware/auth';
import * as audit from '../audit/audit.service';
import * as notices from '../notifications/notifications.service';
import * as invitations from './invitations.service';
import * as moderation from './moderation.service';

/** What a signed-in operator does with the club side: accept invitations and proposals, read notices and their own log. */
export function myClubThingsRouter({ sequelize }: { sequelize: Sequelize }) {
  // Mounted at the API root, so each route checks the session itself (unknown paths stay 404).
  const router = Router();

  router.post('/invitations/accept', requireSignedIn, async (req, res) => {
    const { token } = acceptInvitationInput.parse(req.body);
    res.json(await invitations.accept(sequelize, currentUser(req), token));
  });
  router.get('/offset-proposals', requireSignedIn, async (req, res) => {
    res.json(await moderation.listMine(currentUser(req)));
  });
  for (const [verb, accept] of [
    ['accept', true],
    ['decline', false],
  ] as const) {
    router.post(`/offset-proposals/:id/${verb}`, requireSignedIn, async (req, res) => {
      res.json(await moderation.decide(sequelize, currentUser(req), parseId(req.params.id, 'Proposal'), accept));
    });
  }
  router.get('/notifications', requireSignedIn, async (req, res) => {
    res.json(await notices.listFor(currentUser(req).id));
  });
  router.post('/notifications/:id/read', requireSignedIn, async (req, res) => {
    await notices.markRead(currentUser(req).id, parseId(req.params.id, 'Notice'));
    res.status(204).end();
  });
  router.get('/audit', requireSignedIn, async (req, res) => {
    const entries = await audit.listForOwner(currentUser(req).id);
    if (req.query.format === 'csv') res.type('text/csv').attachment('faintline-my-log.csv').send(audit.toCsv(entries));
    else res.json(entries);
  });
  return router;
}
