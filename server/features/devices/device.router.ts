import express, { Router, type NextFunction, type Request, type Response } from 'express';
import { rateLimit } from 'express-rate-limit';
import { heartbeatInput, transmissionLogInput } from '@/shared/schemas';
import type { Config } from '../../config';
import { DeviceTransmissionModel, HeartbeatModel } from '../../db/models/device.model';
import { AppError } from '../../lib/app-error';
import { RATE_WINDOW_MS, type DeviceGateway } from './device-gateway';
import type { DeviceIdentity } from './tokens.service';

type DeviceRequest = Request & { device?: DeviceIdentity };

/**
 * The machine API under /api/device/v1: bearer tokens, no cookies, no session store.
 * Config answers carry an ETag; an unchanged config answers 304 from memory.
 */
export function deviceRouter({ gateway, config }: { gateway: DeviceGateway; config: Config }) {
  const router = Router();

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
    const answer = await gateway.config(req.device!, req.get('if-none-match'));
    res.setHeader('ETag', answer.etag);
    res.setHeader('Cache-Control', 'private, no-cache');
    if (answer.status === 304) return void res.status(304).end();
    res.type('json').send(answer.body);
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
