import { Router } from 'express';
import type { Sequelize } from 'sequelize';
import { clubReachQuery, comparisonQuery } from '@/shared/schemas/comparison';
import { parseId } from '../../lib/params';
import { currentUser, requireSignedIn } from '../../middleware/auth';
import * as analyses from './analyses.service';

/** GET /api/comparisons and GET /api/clubs/:clubId/reach. */
export function analysesRouter({ sequelize }: { sequelize: Sequelize }) {
  const router = Router();
  router.use(['/comparisons', '/clubs/:clubId/reach'], requireSignedIn);

  router.get('/comparisons', async (req, res) => {
    res.json(await analyses.compare(sequelize, currentUser(req), comparisonQuery.parse(req.query), Date.now()));
  });

  router.get('/clubs/:clubId/reach', async (req, res) => {
    const clubId = parseId(req.params.clubId, 'Club');
    res.json(await analyses.clubReach(sequelize, currentUser(req), clubId, clubReachQuery.parse(req.query), Date.now()));
  });
  return router;
}
