import { Router } from 'express';
import type { Sequelize } from 'sequelize';
import type { Health } from '@/shared/api/contracts';

export function healthRouter(sequelize: Sequelize) {
  const router = Router();
  router.get('/', async (_req, res) => {
    try {
      await sequelize.query('SELECT 1');
      res.json({ status: 'ok', db: 'up' } satisfies Health);
    } catch {
      res.status(503).json({ status: 'degraded', db: 'down' } satisfies Health);
    }
  });
  return router;
}
