import type { NextFunction, Request, Response } from 'express';
import type { SessionUser } from '@/shared/api/contracts';
import { AppError } from '../lib/app-error';

export function currentUser(req: Request): SessionUser {
  if (!req.user) throw new AppError('unauthenticated', 'Sign in first');
  return req.user as SessionUser;
}

export function requireSignedIn(req: Request, _res: Response, next: NextFunction) {
  currentUser(req);
  next();
}
