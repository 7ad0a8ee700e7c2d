import { Router } from 'express';
import type { SuspensionAnswer } from '@/shared/api/answers';
import type { Sequelize } from 'sequelize';
import { clubInput, clubPatch, invitationInput, memberRoleInput, offsetProposalInput, suspensionInput } from '@/shared/schemas';
import type { Config } from '../../config';
import type { Logger } from '../../lib/logger';
import { parseId } from '../../lib/params';
import { sendLater } from '../../mail/send-later';
import type { Mailer } from '../../mail/mailer';
import { currentUser, requireSignedIn } from '../../middleware/auth';
import * as audit from '../audit/audit.service';
import { sessionUserOf } from '../auth/auth.service';
import { stationsOfOwners } from '../stations/stations.service';
import { memberIdsOf, requireAdmin } from './access';
import * as clubs from './clubs.service';
import * as invitations from './invitations.service';
import * as moderation from './moderation.service';
import * as reviews from './review.service';

type Deps = { sequelize: Sequelize; mailer: Mailer; logger: Logger; config: Config };

export function clubsRouter({ sequelize, mailer, logger, config }: Deps) {
  const router = Router();
  router.use(requireSignedIn);
  const club = (params: Record<string, string>) => parseId(params.clubId, 'Club');

  router.get('/', (req, res) => {
    res.json(currentUser(req).clubs);
  });
  router.post('/', async (req, res) => {
    const user = currentUser(req);
    const id = await clubs.createClub(sequelize, user, clubInput.parse(req.body) as { name: string; maxPowerDbm: number });
    res.status(201).json(await clubs.detail((await sessionUserOf(user.id))!, id));
  });
  router.get('/:clubId', async (req, res) => {
    res.json(await clubs.detail(currentUser(req), club(req.params)));
  });
  router.patch('/:clubId', async (req, res) => {
    const user = currentUser(req);
    await clubs.update(sequelize, user, club(req.params), clubPatch.parse(req.body));
    res.json(await clubs.detail(user, club(req.params)));
  });

  // Every member's stations, for the club's admins (read-only).
  router.get('/:clubId/stations', async (req, res) => {
    const clubId = club(req.params);
    await requireAdmin(currentUser(req), clubId);
    res.json(await stationsOfOwners(await memberIdsOf(clubId)));
  });

  router.delete('/:clubId/members/:userId', async (req, res) => {
    await clubs.removeMember(sequelize, currentUser(req), club(req.params), parseId(req.params.userId, 'Member'));
    res.status(204).end();
  });
  router.patch('/:clubId/members/:userId', async (req, res) => {
    const user = currentUser(req);
    await clubs.setRole(sequelize, user, club(req.params), parseId(req.params.userId, 'Member'), memberRoleInput.parse(req.body).role);
    res.json(await clubs.detail(user, club(req.params)));
  });

  router.get('/:clubId/invitations', async (req, res) => {
    res.json(await invitations.listPending(currentUser(req), club(req.params)));
  });
  router.post('/:clubId/invitations', async (req, res) => {
    const { email } = invitationInput.parse(req.body);
    const { invitation, mail } = await invitations.invite(sequelize, currentUser(req), club(req.params), email, config.WEB_ORIGIN);
    res.status(201).json(invitation);
    sendLater(mailer, logger, mail);
  });

  router.delete('/:clubId/invitations/:invitationId', async (req, res) => {
    await invitations.revoke(sequelize, currentUser(req), club(req.params), parseId(req.params.invitationId, 'Invitation'));
    res.status(204).end();
  });
  router.post('/:clubId/invitations/:invitationId/resend', async (req, res) => {
    const { mail } = await invitations.resend(
      sequelize,
      currentUser(req),
      club(req.params),
      parseId(req.params.invitationId, 'Invitation'),
      config.WEB_ORIGIN,
    );
    res.status(204).end();
    sendLater(mailer, logger, mail);
  });

  router.get('/:clubId/review', async (req, res) => {
    res.json(await reviews.review(currentUser(req), club(req.params)));
  });
  router.get('/:clubId/conflicts', async (req, res) => {
    res.json(await reviews.conflicts(currentUser(req), club(req.params)));
  });
  router.get('/:clubId/occupancy', async (req, res) => {
    res.json(await reviews.occupancy(currentUser(req), club(req.params)));
  });
  router.post('/:clubId/offset-proposals', async (req, res) => {
    const input = offsetProposalInput.parse(req.body) as { stationId: number; proposedOffsetHz: number; reason: string };
    const { proposal, mail } = await moderation.propose(sequelize, currentUser(req), club(req.params), input);
    res.status(201).json(proposal);
    sendLater(mailer, logger, mail);
  });

  router.post('/:clubId/stations/:stationId/suspension', async (req, res) => {
    const { reason } = suspensionInput.parse(req.body);
    const { mail } = await moderation.suspend(
      sequelize,
      currentUser(req),
      club(req.params),
      parseId(req.params.stationId, 'Station'),
      reason,
    );
    res.status(201).json({ suspended: true, reason } satisfies SuspensionAnswer);
    sendLater(mailer, logger, mail);
  });
  router.delete('/:clubId/stations/:stationId/suspension', async (req, res) => {
    const { mail } = await moderation.lift(sequelize, currentUser(req), club(req.params), parseId(req.params.stationId, 'Station'));
    res.status(204).end();
    sendLater(mailer, logger, mail);
  });

  router.get('/:clubId/audit', async (req, res) => {
    const clubId = club(req.params);
    await requireAdmin(currentUser(req), clubId);
    const entries = await audit.listForClub(clubId, await memberIdsOf(clubId));
    if (req.query.format === 'csv') {
      res.type('text/csv').attachment(`faintline-club-${clubId}-log.csv`).send(audit.toCsv(entries));
    } else res.json(entries);
  });
  return router;
}
