import { Router } from 'express';
import type { Sequelize } from 'sequelize';
import type { Health } from '@/shared/api/contracts';
import { databaseAnswers } from './liveness.repo';

/** GET /api/health: is the server up and does the database answer (for load balancers and start scripts). */
export function livenessRouter(sequelize: Sequelize) {
  const router = Router();
  router.get('/', async (_req, res) => {
    if (await databaseAnswers(sequelize)) res.json({ status: 'ok', db: 'up' } satisfies Health);
    else res.status(503).json({ status: 'degraded', db: 'down' } satisfies Health);
  });
  return router;
}
