import express, { Router, type NextFunction, type Request, type Response } from 'express';
import { rateLimit } from 'express-rate-limit';
import type { InferCreationAttributes } from 'sequelize';
import { heartbeatInput, transmissionLogInput } from '@/shared/schemas';
import type { Config } from '../../config';
import { DeviceTransmissionModel, HeartbeatModel } from '../../db/models/device.model';
import { AppError } from '../../lib/app-error';
import { isDatabaseUnavailable } from '../../lib/db-errors';
import { createGroupWriter } from '../../lib/group-writer';
import { RATE_WINDOW_MS, sendConfig, type DeviceGateway } from './device-gateway';
import type { DeviceIdentity } from './tokens.service';

type DeviceRequest = Request & { device?: DeviceIdentity };

/**
 * The machine API under /api/device/v1: bearer tokens, no cookies, no session store.
 * Config answers carry an ETag; an unchanged config answers 304 from memory.
 */
export function deviceRouter({ gateway, config }: { gateway: DeviceGateway; config: Config }) {
  const router = Router();
  // Heartbeats from many devices at once are stored a group per INSERT; each is acknowledged once written.
  // A database outage fails the whole group at once (503 to each device), so nothing unsaved is acknowledged.
  const storeHeartbeat = createGroupWriter(
    (rows: Omit<InferCreationAttributes<HeartbeatModel>, 'id'>[]) => HeartbeatModel.bulkCreate(rows, { validate: false }),
    { isUnavailable: isDatabaseUnavailable },
  );

  async function authenticate(req: DeviceRequest, _res: Response, next: NextFunction) {
    req.device = await gateway.authenticate(req.get('authorization'));
    next();
  }

  const perDevice = rateLimit({
    windowMs: RATE_WINDOW_MS,
    limit: config.DEVICE_RATE_LIMIT,
    store: gateway.store,
    standardHeaders: 'draft-8',
    legacyHeaders: false,
    keyGenerator: (req) => (req as DeviceRequest).device!.tokenHash,
    handler: (_req, _res, next) =>
      next(new AppError('rate-limited', `Too many requests from this device: at most ${config.DEVICE_RATE_LIMIT} a minute`)),
  });

  router.use((_req, res, next) => {
    res.setHeader('X-Content-Type-Options', 'nosniff');
    next();
  });
  router.use(express.json({ limit: '32kb' }));
  router.use((req, _res, next) => void authenticate(req, _res, next).catch(next));
  router.use(perDevice);

  router.get('/config', async (req: DeviceRequest, res) => {
    const answer = await gateway.config(req.device!, { ifNoneMatch: req.get('if-none-match'), acceptEncoding: req.get('accept-encoding') });
    sendConfig(res, answer);
  });

  router.post('/heartbeat', async (req: DeviceRequest, res) => {
    const report = heartbeatInput.parse(req.body);
    await storeHeartbeat({
      stationId: req.device!.stationId,
      receivedAt: new Date(),
      report: JSON.stringify(report),
      clockOffsetMs: report.clockOffsetMs,
      temperatureC: report.temperatureC,
    });
    res.status(202).json({ stored: true });
  });

  router.post('/transmissions', async (req: DeviceRequest, res) => {
    const { transmissions } = transmissionLogInput.parse(req.body);
    const receivedAt = new Date();
    await DeviceTransmissionModel.bulkCreate(
      transmissions.map((t) => ({
        stationId: req.device!.stationId,
        startedAt: new Date(t.startUtc),
        bandId: t.bandId,
        frequencyHz: t.frequencyHz,
        messageText: t.messageText,
        receivedAt,
      })),
    );
    res.status(202).json({ stored: transmissions.length });
  });

  router.use((req, res) => {
    res.status(404).json({ error: { code: 'not-found', message: `No device route ${req.method} ${req.originalUrl}` } });
  });
  // For a graceful shutdown: resolves once every heartbeat handed in is stored or refused.
  return Object.assign(router, { drainWrites: storeHeartbeat.drain });
}
