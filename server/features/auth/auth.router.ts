import { Router, type Request } from 'express';
import { rateLimit, ipKeyGenerator } from 'express-rate-limit';
import passport from 'passport';
import type { Sequelize } from 'sequelize';
import type { MessageAnswer } from '@/shared/api/answers';
import type { SessionUser } from '@/shared/api/contracts';
import { profileInput, registerInput, resetConfirmInput, resetRequestInput, signInInput } from '@/shared/schemas';
import type { Config } from '../../config';
import { AppError } from '../../lib/app-error';
import type { Logger } from '../../lib/logger';
import type { Mailer } from '../../mail/mailer';
import { currentUser } from '../../middleware/auth';
import * as auth from './auth.service';

type Deps = { config: Config; sequelize: Sequelize; mailer: Mailer; logger: Logger };

const tooMany = (message: string) => (_req: Request, _res: unknown, next: (e: unknown) => void) =>
  next(new AppError('rate-limited', message));

function logIn(req: Request, user: SessionUser) {
  // passport regenerates the session id here, so a planted id is never kept.
  return new Promise<void>((resolve, reject) => req.login(user, (error) => (error ? reject(error) : resolve())));
}

export function authRouter({ config, sequelize, mailer, logger }: Deps) {
  const router = Router();

  const signInLimiter = rateLimit({
    windowMs: 15 * 60_000,
    limit: config.SIGN_IN_ATTEMPTS,
    skipSuccessfulRequests: true,
    standardHeaders: 'draft-8',
    legacyHeaders: false,
    keyGenerator: (req) => `${ipKeyGenerator(req.ip ?? '')}:${auth.normaliseEmail(req.body?.email)}`,
    // A 503 (database down) is not a failed guess.
    requestWasSuccessful: (_req, res) => res.statusCode < 400 || res.statusCode >= 500,
    handler: tooMany('Too many failed sign-ins. Wait 15 minutes, or reset your password.'),
  });
  const resetLimiter = rateLimit({
    windowMs: 15 * 60_000,
    limit: 5,
    standardHeaders: 'draft-8',
    legacyHeaders: false,
    handler: tooMany('Too many reset requests. Wait 15 minutes and try again.'),
  });

  router.post('/register', async (req, res) => {
    const input = registerInput.parse(req.body);
    const userId = await auth.register(input, config.BCRYPT_COST);
    const user = await auth.sessionUserOf(userId);
    if (!user) throw new AppError('internal', 'The new account could not be read back');
    await logIn(req, user);
    res.status(201).json(user);
  });

  router.post('/sign-in', signInLimiter, (req, res, next) => {
    signInInput.parse(req.body);
    passport.authenticate('local', async (error: unknown, user: SessionUser | false) => {
      try {
        if (error) throw error;
        if (!user) throw new AppError('unauthenticated', 'Wrong e-mail or password');
        await logIn(req, user);
        res.json(user);
      } catch (failure) {
        next(failure);
      }
    })(req, res, next);
  });

  router.post('/sign-out', (req, res, next) => {
    req.logout((error) => {
      if (error) return next(error);
      req.session.destroy(() => {
        res.clearCookie('faintline.sid');
        res.status(204).end();
      });
    });
  });

  /** "Sign out everywhere else": every other session of this account ends; this one stays. */
  router.post('/sessions/end-others', async (req, res) => {
    const user = currentUser(req);
    res.json({ ended: await auth.endOtherSessions(sequelize, user, req.sessionID) });
  });

  router.get('/me', (req, res) => {
    res.json(currentUser(req));
  });

  router.patch('/me', async (req, res) => {
    const user = currentUser(req);
    await auth.updateProfile(sequelize, user, profileInput.parse(req.body));
    res.json(await auth.sessionUserOf(user.id));
  });

  router.post('/password-reset', resetLimiter, async (req, res) => {
    const { email } = resetRequestInput.parse(req.body);
    const reset = await auth.createPasswordReset(email);
    // The same answer whether or not the account exists; the mail goes out after the write.
    res.status(202).json({
      message: 'If an account uses this e-mail, a reset link is on its way. It works once, for 30 minutes.',
    } satisfies MessageAnswer);
    if (reset) {
      const link = `${config.WEB_ORIGIN}/reset-password?token=${encodeURIComponent(reset.token)}`;
      mailer
        .send({
          to: reset.email,
          subject: 'Reset your Faintline password',
          text: `Hello ${reset.displayName},\n\nSomeone asked to reset the password of your Faintline account. Open this link within ${auth.RESET_TOKEN_LIFETIME_MIN} minutes to choose a new one (it works once):\n\n${link}\n\nIf it was not you, ignore this mail; your password stays as it is.\n`,
        })
        .catch((failure) => logger.error({ err: failure }, 'password reset mail failed'));
    }
  });

  router.post('/password-reset/confirm', async (req, res) => {
    const input = resetConfirmInput.parse(req.body);
    await auth.confirmPasswordReset(sequelize, input, config.BCRYPT_COST);
    res.json({ message: 'Your password is changed. Sign in with the new one.' } satisfies MessageAnswer);
  });

  return router;
}
