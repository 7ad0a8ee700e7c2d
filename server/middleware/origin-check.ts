import type { RequestHandler } from 'express';
import { AppError } from '../lib/app-error';

const SAFE_METHODS = new Set(['GET', 'HEAD', 'OPTIONS']);

/**
 * Refuses state-changing requests sent from a foreign page. Browsers always send Origin on
 * cross-site POST/PATCH/DELETE; requests without one (curl, devices) carry no cookie risk here.
 */
export function originCheck(allowedOrigins: string[]): RequestHandler {
  const allowed = new Set(allowedOrigins.map((o) => o.replace(/\/$/, '')));
  return (req, _res, next) => {
    const origin = req.get('origin');
    if (SAFE_METHODS.has(req.method) || !origin) return next();
    const own = `${req.protocol}://${req.get('host')}`;
    if (origin === own || allowed.has(origin)) return next();
    next(new AppError('forbidden', 'This request came from a page of another site and was refused'));
  };
}
