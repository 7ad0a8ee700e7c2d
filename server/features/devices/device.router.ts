import express, { Router, type NextFunction, type Request, type Response } from 'express';
import { rateLimit } from 'express-rate-limit';
import type { Sequelize } from 'sequelize';
import { heartbeatInput, transmissionLogInput } from '@/shared/schemas';
import type { Config } from '../../config';
import { DeviceTransmissionModel, HeartbeatModel } from '../../db/models/device.model';
import { AppError } from '../../lib/app-error';
import { onStationChanged } from '../../lib/change-feed';
import * as schedulesRepo from '../schedules/schedules.repo';
import * as stationsRepo from '../stations/stations.repo';
import * as unitsRepo from '../units/units.repo';
import { deviceConfig, etagFor } from './device-config';
import { identify, type DeviceIdentity } from './tokens.service';

type DeviceRequest = Request & { device?: DeviceIdentity };

/**
 * The machine API under /api/device/v1: bearer tokens, no cookies, no session store.
 * Config answers carry an ETag; an unchanged config costs one SELECT and a 304.
 */
export function deviceRouter({ sequelize, config }: { sequelize: Sequelize; config: Config }) {
  const router = Router();
  const cache = new Map<number, { etag: string; body: string }>();
  // Known tokens for a moment, so a poll costs no query; any change in this process drops the
  // entry at once, and other processes see it within DEVICE_CACHE_MS.
  const known = new Map<string, { device: DeviceIdentity; at: number }>();
  onStationChanged((stationId) => {
    if (stationId === 'all') known.clear();
    else for (const [token, entry] of known) if (entry.device.stationId === stationId) known.delete(token);
  });

  async function lookUp(token: string) {
    const hit = known.get(token);
    if (hit && Date.now() - hit.at < config.DEVICE_CACHE_MS) return hit.device;
    const device = await identify(sequelize, token);
    if (device) known.set(token, { device, at: Date.now() });
    else known.delete(token);
    return device;
  }

  async function authenticate(req: DeviceRequest, _res: Response, next: NextFunction) {
    const header = req.get('authorization') ?? '';
    const match = /^Bearer\s+(\S+)$/i.exec(header);
    if (!match) return next(new AppError('unauthenticated', 'Send the device token as "Authorization: Bearer <token>"'));
    const device = await lookUp(match[1]);
    if (!device) return next(new AppError('unauthenticated', 'This device token is not valid (revoked or rotated?)'));
    req.device = device;
    next();
  }

  const perDevice = rateLimit({
    windowMs: 60_000,
    limit: config.DEVICE_RATE_LIMIT,
    standardHeaders: 'draft-8',
    legacyHeaders: false,
    keyGenerator: (req) => (req as DeviceRequest).device!.tokenHash,
    handler: (_req, _res, next) => next(new AppError('rate-limited', `Too many requests from this device: at most ${config.DEVICE_RATE_LIMIT} a minute`)),
  });

  router.use((_req, res, next) => {
    res.setHeader('X-Content-Type-Options', 'nosniff');
    next();
  });
  router.use(express.json({ limit: '32kb' }));
  router.use((req, _res, next) => void authenticate(req, _res, next).catch(next));
  router.use(perDevice);

  router.get('/config', async (req: DeviceRequest, res) => {
    const device = req.device!;
    const now = Date.now();
    const etag = etagFor(device.version, now);
    res.setHeader('ETag', etag);
    res.setHeader('Cache-Control', 'private, no-cache');
    if (req.get('if-none-match') === etag) return void res.status(304).end();
    let cached = cache.get(device.stationId);
    if (!cached || cached.etag !== etag) {
      const station = (await stationsRepo.findById(device.stationId))!;
      const [unit, schedule] = await Promise.all([
        station.unitId === null ? null : unitsRepo.findById(station.unitId),
        schedulesRepo.findByStation(station.id),
      ]);
      cached = { etag, body: JSON.stringify(deviceConfig(station, unit, schedule, now)) };
      cache.set(device.stationId, cached);
    }
    res.type('json').send(cached.body);
  });

  router.post('/heartbeat', async (req: DeviceRequest, res) => {
    const report = heartbeatInput.parse(req.body);
    const row = await HeartbeatModel.create({
      stationId: req.device!.stationId,
      receivedAt: new Date(),
      report: JSON.stringify(report),
      clockOffsetMs: report.clockOffsetMs,
      temperatureC: report.temperatureC,
    });
    res.status(202).json({ stored: true, id: Number(row.id) });
  });

  router.post('/transmissions', async (req: DeviceRequest, res) => {
    const { transmissions } = transmissionLogInput.parse(req.body);
    const receivedAt = new Date();
    await DeviceTransmissionModel.bulkCreate(
      transmissions.map((t) => ({ stationId: req.device!.stationId, startedAt: new Date(t.startUtc), bandId: t.bandId, frequencyHz: t.frequencyHz, messageText: t.messageText, receivedAt })),
    );
    res.status(202).json({ stored: transmissions.length });
  });

  router.use((req, res) => {
    res.status(404).json({ error: { code: 'not-found', message: `No device route ${req.method} ${req.originalUrl}` } });
  });
  return router;
}
