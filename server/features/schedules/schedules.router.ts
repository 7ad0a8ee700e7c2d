import { Router } from 'express';
import type { Sequelize } from 'sequelize';
import { planQueryInput, scheduleInput, schedulePatch } from '@/shared/schemas/schedule';
import { parseId } from '../../lib/params';
import { currentUser, requireSignedIn } from '../../middleware/auth';
import * as schedules from './schedules.service';

const planQuery = planQueryInput.transform((q, ctx) => {
  const fromMs = q.from ? Date.parse(q.from) : Date.now();
  const toMs = q.to ? Date.parse(q.to) : fromMs + 86_400_000;
  if (toMs <= fromMs) ctx.addIssue({ code: 'custom', path: ['to'], message: 'to must be later than from' });
  if (toMs - fromMs > schedules.MAX_PLAN_RANGE_MS)
    ctx.addIssue({ code: 'custom', path: ['to'], message: 'Ask for at most 8 days at a time' });
  return { fromMs, toMs };
});

/** Mounted at /api/stations/:id — the station's schedule and its plan. */
export function schedulesRouter({ sequelize }: { sequelize: Sequelize }) {
  const router = Router({ mergeParams: true });
  router.use(requireSignedIn);
  const stationId = (params: Record<string, string>) => parseId(params.id, 'Station');

  router.get('/schedule', async (req, res) => {
    res.json(await schedules.getFor(currentUser(req), stationId(req.params)));
  });
  router.post('/schedule', async (req, res) => {
    res.status(201).json(await schedules.create(sequelize, currentUser(req), stationId(req.params), scheduleInput.parse(req.body)));
  });
  router.patch('/schedule', async (req, res) => {
    res.json(await schedules.update(sequelize, currentUser(req), stationId(req.params), schedulePatch.parse(req.body)));
  });
  router.delete('/schedule', async (req, res) => {
    await schedules.remove(sequelize, currentUser(req), stationId(req.params));
    res.status(204).end();
  });
  router.get('/plan', async (req, res) => {
    const { fromMs, toMs } = planQuery.parse(req.query);
    res.json(await schedules.planRange(currentUser(req), stationId(req.params), fromMs, toMs));
  });
  return router;
}
