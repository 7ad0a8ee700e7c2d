import express, { Router, type NextFunction, type Request, type Response } from 'express';
import { rateLimit } from 'express-rate-limit';
import type { Sequelize } from 'sequelize';
import { receptionBatchInput } from '@/shared/schemas';
import type { Config } from '../../config';
import { AppError } from '../../lib/app-error';
import { SlidingWindowStore } from '../../lib/sliding-window-store';
import { createUnknownTokenGuard } from '../../lib/unknown-token-guard';
import type { PostIdentity } from './listening-posts.repo';
import { ingestFromPost } from './ingest.service';
import { authenticatePost } from './post-tokens';

type PostRequest = Request & { post?: PostIdentity };

/**
 * POST /api/device/v1/receptions: a listening post sends what it decoded, with its own bearer token.
 * No cookies or session; a rate limit per token. A 202 answers only after the reports are committed.
 */
export function deviceReceptionsRouter({ sequelize, config }: { sequelize: Sequelize; config: Config }) {
  const router = Router();
  const perPost = rateLimit({
    windowMs: 60_000,
    limit: config.DEVICE_RATE_LIMIT,
    store: new SlidingWindowStore(),
    standardHeaders: 'draft-8',
    legacyHeaders: false,
    keyGenerator: (req) => (req as PostRequest).post!.tokenHash,
    handler: (_req, _res, next) =>
      next(new AppError('rate-limited', `Too many requests from this listening post: at most ${config.DEVICE_RATE_LIMIT} a minute`)),
  });
  const unknownTokens = createUnknownTokenGuard({ what: 'listening post', perAddressPerMinute: config.UNKNOWN_TOKENS_PER_ADDRESS });
  async function authenticate(req: PostRequest, _res: Response, next: NextFunction) {
    req.post = await authenticatePost(req.get('authorization'), config.DEVICE_CACHE_MS, unknownTokens, req.ip);
    next();
  }

  router.use((_req, res, next) => {
    res.setHeader('X-Content-Type-Options', 'nosniff');
    next();
  });
  router.use((req, res, next) => void authenticate(req, res, next).catch(next));
  router.use(perPost);
  // 500 reports of about 200 bytes each, with room to spare.
  router.use(express.json({ limit: '512kb' }));
  router.post('/', async (req: PostRequest, res) => {
    const { reports } = receptionBatchInput.parse(req.body);
    res.status(202).json(await ingestFromPost(sequelize, req.post!, reports, new Date()));
  });
  return router;
}
