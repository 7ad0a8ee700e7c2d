import { rateLimit } from 'express-rate-limit';
import type { SessionUser } from '@/shared/api/contracts';
import { AppError } from '../lib/app-error';
import { SlidingWindowStore } from '../lib/sliding-window-store';

export const UPLOAD_WINDOW_MS = 10 * 60_000;

/** Uploads (photos, report files, their previews) per signed-in account in a sliding 10 minutes; 429 beyond. */
export function uploadLimit(perUser: number) {
  return rateLimit({
    windowMs: UPLOAD_WINDOW_MS,
    limit: perUser,
    store: new SlidingWindowStore({ windowMs: UPLOAD_WINDOW_MS }),
    standardHeaders: 'draft-8',
    legacyHeaders: false,
    // Not signed in: the route itself answers 401.
    skip: (req) => !req.user,
    keyGenerator: (req) => `user:${(req.user as SessionUser).id}`,
    handler: (_req, res, next) => {
      res.setHeader('Retry-After', String(Math.ceil(UPLOAD_WINDOW_MS / 1000 / perUser)));
      next(new AppError('rate-limited', `At most ${perUser} uploads in 10 minutes from one account: try again in a few minutes`));
    },
  });
}
