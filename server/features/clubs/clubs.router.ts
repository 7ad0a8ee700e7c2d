import { Router } from 'express';
import { parseId } from '../../lib/params';
import { AppError } from '../../lib/app-error';
import { currentUser, requireSignedIn } from '../../middleware/auth';
import { findByOwners } from '../stations/stations.repo';
import { memberIdsOf, membershipOf } from './clubs.repo';

export function clubsRouter() {
  const router = Router();
  router.use(requireSignedIn);

  router.get('/', (req, res) => {
    res.json(currentUser(req).clubs);
  });

  // Every member's stations, for the club's admins (read-only here).
  router.get('/:clubId/stations', async (req, res) => {
    const user = currentUser(req);
    const clubId = parseId(req.params.clubId, 'Club');
    const membership = await membershipOf(user.id, clubId);
    if (!membership) throw new AppError('not-found', `Club ${clubId} does not exist`);
    if (membership.role !== 'admin') throw new AppError('forbidden', 'Only the club’s admins see every member’s stations');
    res.json(await findByOwners(await memberIdsOf(clubId)));
  });
  return router;
}
