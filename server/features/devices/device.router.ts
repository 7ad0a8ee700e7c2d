import express, { Router, type NextFunction, type Request, type Response } from 'express';
import { rateLimit } from 'express-rate-limit';
import type { StoredAnswer } from '@/shared/api/answers';
import { heartbeatInput, transmissionLogInput } from '@/shared/schemas';
import type { Config } from '../../config';
import type { TransactionRunner } from '../../db/transaction';
import { AppError } from '../../lib/app-error';
import { RATE_WINDOW_MS, sendConfig, type DeviceGateway } from './device-gateway';
import { createReportStore } from './reports.service';
import type { DeviceIdentity } from './tokens.service';

type DeviceRequest = Request & { device?: DeviceIdentity };

/**
 * The machine API under /api/device/v1: bearer tokens, no cookies, no session store.
 * Config answers carry an ETag; an unchanged config answers 304 from memory.
 */
export function deviceRouter({ db, gateway, config }: { db: TransactionRunner; gateway: DeviceGateway; config: Config }) {
  const router = Router();
  const reports = createReportStore(db);

  async function authenticate(req: DeviceRequest, _res: Response, next: NextFunction) {
    req.device = await gateway.authenticate(req.get('authorization'), req.ip);
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
    await reports.heartbeat(req.device!.stationId, report);
    res.status(202).json({ stored: true } satisfies StoredAnswer);
  });

  router.post('/transmissions', async (req: DeviceRequest, res) => {
    const { transmissions } = transmissionLogInput.parse(req.body);
    await reports.transmissions(req.device!.stationId, transmissions);
    res.status(202).json({ stored: transmissions.length } satisfies StoredAnswer);
  });

  router.use((req, res) => {
    res.status(404).json({ error: { code: 'not-found', message: `No device route ${req.method} ${req.originalUrl}` } });
  });
  // For a graceful shutdown: resolves once every heartbeat handed in is stored or refused.
  return Object.assign(router, { drainWrites: reports.drain });
}
