import { Router, type Request } from 'express';
import { rateLimit } from 'express-rate-limit';
import type { Sequelize } from 'sequelize';
import type { MessageAnswer, SessionsEndedAnswer } from '@/shared/api/answers';
import { accountDeleteInput, emailChangeInput, emailConfirmInput, passwordChangeInput } from '@/shared/schemas';
import type { Config } from '../../config';
import { AppError } from '../../lib/app-error';
import type { Logger } from '../../lib/logger';
import type { Mailer } from '../../mail/mailer';
import { currentUser, requireSignedIn } from '../../middleware/auth';
import type { FileStorage } from '../../storage';
import { removeStored } from '../units/photos.service';
import * as account from './account.service';

type Deps = { config: Config; sequelize: Sequelize; mailer: Mailer; logger: Logger; storage: FileStorage };

const utc = (at: Date) => `${at.toISOString().slice(0, 16).replace('T', ' ')} UTC`;

/** A signed-in person's own account: password, sign-in e-mail, deletion. */
export function accountRouter({ config, sequelize, mailer, logger, storage }: Deps) {
  const router = Router();
  const mail = (to: string, subject: string, text: string) =>
    mailer.send({ to, subject, text }).catch((failure) => logger.error({ err: failure, subject }, 'account mail failed'));

  // Routes that check the current password: a stolen session cannot guess it quickly.
  const passwordGuesses = rateLimit({
    windowMs: 15 * 60_000,
    limit: config.SIGN_IN_ATTEMPTS,
    skipSuccessfulRequests: true,
    standardHeaders: 'draft-8',
    legacyHeaders: false,
    keyGenerator: (req: Request) => `account:${(req.user as { id?: number } | undefined)?.id ?? 'anonymous'}`,
    requestWasSuccessful: (_req, res) => res.statusCode < 400 || res.statusCode >= 500,
    handler: (_req, _res, next) => next(new AppError('rate-limited', 'Too many wrong passwords. Wait 15 minutes and try again.')),
  });

  router.post('/password', requireSignedIn, passwordGuesses, async (req, res) => {
    const user = currentUser(req);
    const ended = await account.changePassword(sequelize, user, passwordChangeInput.parse(req.body), config.BCRYPT_COST, req.sessionID);
    res.json({ ended } satisfies SessionsEndedAnswer);
    void mail(
      user.email,
      'Your Faintline password was changed',
      `Hello ${user.displayName},\n\nThe password of your Faintline account was changed on ${utc(new Date())}, and every other session was signed out.\n\nIf it was not you, reset your password now from the sign-in screen.\n`,
    );
  });

  router.get('/email-change', async (req, res) => {
    res.json(await account.pendingEmailChange(currentUser(req)));
  });

  router.post('/email-change', requireSignedIn, passwordGuesses, async (req, res) => {
    const user = currentUser(req);
    const change = await account.requestEmailChange(sequelize, user, emailChangeInput.parse(req.body));
    res.status(202).json({
      message: `We sent a confirmation link to ${change.newEmail}. Your sign-in e-mail changes when you open it (within ${account.EMAIL_CHANGE_LIFETIME_HOURS} hours).`,
    } satisfies MessageAnswer);
    const link = `${config.WEB_ORIGIN}/confirm-email?token=${encodeURIComponent(change.token)}`;
    void mail(
      change.newEmail,
      'Confirm your new Faintline e-mail address',
      `Hello ${change.displayName},\n\nYou asked to sign in to Faintline with this address from now on. Open this link to confirm (it works once, until ${utc(change.expiresAt)}):\n\n${link}\n\nUntil then your account keeps its current address. If it was not you, ignore this mail.\n`,
    );
  });

  router.delete('/email-change', async (req, res) => {
    await account.cancelEmailChange(sequelize, currentUser(req));
    res.status(204).end();
  });

  // Needs no session: the link may be opened on another device; the token alone proves the new address.
  router.post('/email-change/confirm', async (req, res) => {
    const changed = await account.confirmEmailChange(sequelize, emailConfirmInput.parse(req.body));
    res.json({ message: `Your sign-in e-mail is now ${changed.newEmail}.` } satisfies MessageAnswer);
    void mail(
      changed.oldEmail,
      'Your Faintline sign-in e-mail was changed',
      `Hello ${changed.displayName},\n\nOn ${utc(new Date())} the sign-in e-mail of your Faintline account changed from this address to ${changed.newEmail} (confirmed from the new address). Mail about the account now goes there.\n\nIf it was not you, tell the people who run your Faintline server at once.\n`,
    );
  });

  router.get('/account/deletion', async (req, res) => {
    res.json(await account.deletionPreview(sequelize, currentUser(req)));
  });

  router.post('/account/delete', requireSignedIn, passwordGuesses, async (req, res) => {
    const user = currentUser(req);
    const deleted = await account.deleteAccount(sequelize, user, accountDeleteInput.parse(req.body));
    // The session's row is already gone with the others; this request's session and cookie go too.
    await new Promise<void>((resolve) => req.logout(() => req.session.destroy(() => resolve())));
    res.clearCookie('faintline.sid');
    res.json({ message: 'Your account is deleted.' } satisfies MessageAnswer);
    void removeStored(storage, deleted.photos, logger);
    void mail(
      deleted.email,
      'Your Faintline account is deleted',
      `Hello ${deleted.displayName},\n\nYour Faintline account was deleted on ${utc(new Date())}, with its stations, units and listening posts. Its device tokens stopped working.\n`,
    );
  });

  return router;
}
