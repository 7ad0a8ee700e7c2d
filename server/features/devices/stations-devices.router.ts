import { Router } from 'express';
import type { Sequelize } from 'sequelize';
import { alertSettingsInput } from '@/shared/schemas';
import { parseId } from '../../lib/params';
import { currentUser, requireSignedIn } from '../../middleware/auth';
import { getOwnedBy } from '../stations/stations.service';
import * as health from './health.service';
import * as tokens from './tokens.service';

/** Mounted at /api/stations/:id — device credentials, health and alert thresholds (cookie session). */
export function stationDevicesRouter({ sequelize, offlineAfterS }: { sequelize: Sequelize; offlineAfterS: number }) {
  const router = Router({ mergeParams: true });
  router.use(requireSignedIn);
  const stationId = (params: Record<string, string>) => parseId(params.id, 'Station');

  router.post('/device-token', async (req, res) => {
    res.status(201).json({ token: await tokens.rotate(sequelize, currentUser(req), stationId(req.params)) });
  });
  router.delete('/device-token', async (req, res) => {
    await tokens.revoke(sequelize, currentUser(req), stationId(req.params));
    res.status(204).end();
  });
  router.get('/health', async (req, res) => {
    res.json(await health.forStation(currentUser(req), stationId(req.params), { offlineAfterS }));
  });
  router.put('/alert-settings', async (req, res) => {
    const settings = alertSettingsInput.parse(req.body);
    await getOwnedBy(currentUser(req), stationId(req.params));
    await health.saveSettings(stationId(req.params), settings);
    res.json(settings);
  });
  return router;
}

export function fleetHealthRouter({ offlineAfterS }: { offlineAfterS: number }) {
  const router = Router();
  router.get('/fleet/health', requireSignedIn, async (req, res) => {
    res.json(await health.forOwner(currentUser(req), { offlineAfterS }));
  });
  router.get('/clubs/:clubId/health', requireSignedIn, async (req, res) => {
    res.json(await health.forClub(currentUser(req), parseId(req.params.clubId, 'Club'), { offlineAfterS }));
  });
  return router;
}
