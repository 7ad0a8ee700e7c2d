import { Router } from 'express';
import type { DeviceTokenAnswer } from '@/shared/api/answers';
import type { Sequelize } from 'sequelize';
import { alertSettingsInput, stabilityQuery } from '@/shared/schemas';
import { parseId } from '../../lib/params';
import { currentUser, requireSignedIn } from '../../middleware/auth';
import { getOwnedBy } from '../stations/stations.service';
import * as beacons from './beacon-status.service';
import { stabilityFor } from './stability.service';
import * as tokens from './tokens.service';

/** Mounted at /api/stations/:id — device credentials, beacon status and alert thresholds (cookie session). */
export function stationDevicesRouter({ sequelize, offlineAfterS }: { sequelize: Sequelize; offlineAfterS: number }) {
  const router = Router({ mergeParams: true });
  router.use(requireSignedIn);
  const stationId = (params: Record<string, string>) => parseId(params.id, 'Station');

  router.post('/device-token', async (req, res) => {
    res.status(201).json({ token: await tokens.rotate(sequelize, currentUser(req), stationId(req.params)) } satisfies DeviceTokenAnswer);
  });
  router.delete('/device-token', async (req, res) => {
    await tokens.revoke(sequelize, currentUser(req), stationId(req.params));
    res.status(204).end();
  });
  router.get('/health', async (req, res) => {
    res.json(await beacons.forStation(currentUser(req), stationId(req.params), { offlineAfterS }));
  });
  router.get('/stability', async (req, res) => {
    res.json(await stabilityFor(sequelize, currentUser(req), stationId(req.params), stabilityQuery.parse(req.query), Date.now()));
  });
  router.put('/alert-settings', async (req, res) => {
    const settings = alertSettingsInput.parse(req.body);
    await getOwnedBy(currentUser(req), stationId(req.params));
    await beacons.saveSettings(stationId(req.params), settings);
    res.json(settings);
  });
  return router;
}

/** Mounted at /api/fleet — the signed-in operator's own beacons. */
export function fleetRouter({ offlineAfterS }: { offlineAfterS: number }) {
  const router = Router();
  router.use(requireSignedIn);
  router.get('/health', async (req, res) => {
    res.json(await beacons.forOwner(currentUser(req), { offlineAfterS }));
  });
  return router;
}

/** Mounted at /api/clubs/:clubId/health — every member's beacons, for the club's admins. */
export function clubBeaconsRouter({ offlineAfterS }: { offlineAfterS: number }) {
  const router = Router({ mergeParams: true });
  router.use(requireSignedIn);
  router.get('/', async (req, res) => {
    res.json(await beacons.forClub(currentUser(req), parseId((req.params as { clubId?: string }).clubId, 'Club'), { offlineAfterS }));
  });
  return router;
}
