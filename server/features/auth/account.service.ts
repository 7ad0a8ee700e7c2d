import bcrypt from 'bcryptjs';
import { createHash, randomBytes } from 'node:crypto';
import { UniqueConstraintError, type Sequelize } from 'sequelize';
import type { AccountDeletionPreview, PendingEmailChange } from '@/shared/api/answers';
import type { SessionUser } from '@/shared/api/contracts';
import type { AccountDeleteInput, EmailChangeInput, EmailConfirmInput, PasswordChangeInput } from '@/shared/schemas';
import type { TransactionRunner } from '../../db/transaction';
import { AppError } from '../../lib/app-error';
import * as audit from '../audit/audit.service';
import * as clubs from '../clubs/clubs.service';
import { hasToken } from '../devices/tokens.service';
import * as listeningPosts from '../receptions/listening-posts.service';
import * as stations from '../stations/stations.service';
import * as units from '../units/units.service';
import * as emailChanges from './email-changes.repo';
import * as resets from './password-resets.repo';
import * as users from './users.repo';

export const EMAIL_CHANGE_LIFETIME_HOURS = 24;

const sha256 = (value: string) => createHash('sha256').update(value).digest('hex');

/** Refuses unless `password` is the account's current password; the message sits beside `field`. */
async function requirePassword(userId: number, password: string, field: string) {
  const row = await users.findById(userId);
  if (!row) throw new AppError('unauthenticated', 'Sign in first');
  if (!(await bcrypt.compare(password, row.passwordHash))) {
    throw new AppError('bad-request', 'The password is not right', { [field]: 'This is not your current password' });
  }
  return row;
}

/** A new password; every other session ends and outstanding reset links stop working. Returns how many sessions ended. */
export async function changePassword(
  db: TransactionRunner,
  user: SessionUser,
  input: PasswordChangeInput,
  bcryptCost: number,
  keepSid: string,
) {
  await requirePassword(user.id, input.currentPassword, 'currentPassword');
  const passwordHash = await bcrypt.hash(input.newPassword, bcryptCost);
  return db.transaction(async (transaction) => {
    await users.update(user.id, { passwordHash }, transaction);
    await resets.useAllOf(user.id, new Date(), transaction);
    const ended = await users.endSessionsOf(user.id, keepSid, transaction);
    await audit.record(
      {
        actor: user,
        ownerId: user.id,
        action: 'password.change',
        entityType: 'user',
        entityId: user.id,
        summary: `Changed the password (signed out ${ended} other session${ended === 1 ? '' : 's'})`,
      },
      transaction,
    );
    return ended;
  });
}

const taken = (field: string) =>
  new AppError('conflict', 'Another account already uses this e-mail address', {
    [field]: 'Another account already uses this e-mail address. Choose a different one.',
  });

/** Starts a change of sign-in address: returns the token to mail to the new address (the address changes on confirmation). */
export async function requestEmailChange(db: TransactionRunner, user: SessionUser, input: EmailChangeInput, now = new Date()) {
  await requirePassword(user.id, input.password, 'password');
  if (input.newEmail === user.email) {
    throw new AppError('bad-request', 'This is already your e-mail address', { newEmail: 'This is already your e-mail address' });
  }
  if (await users.emailTaken(input.newEmail)) throw taken('newEmail');
  const token = randomBytes(32).toString('base64url');
  const expiresAt = new Date(now.getTime() + EMAIL_CHANGE_LIFETIME_HOURS * 3600_000);
  await db.transaction(async (transaction) => {
    // A new request replaces any earlier one: only the newest link works.
    await emailChanges.useAllOf(user.id, now, transaction);
    await emailChanges.insert({ userId: user.id, newEmail: input.newEmail, tokenHash: sha256(token), expiresAt }, transaction);
    await audit.record(
      {
        actor: user,
        ownerId: user.id,
        action: 'email.change-requested',
        entityType: 'user',
        entityId: user.id,
        summary: 'Asked to change the sign-in e-mail; waiting for the link mailed to the new address',
      },
      transaction,
    );
  });
  return { token, newEmail: input.newEmail, displayName: user.displayName, expiresAt };
}

export async function pendingEmailChange(user: SessionUser, now = new Date()): Promise<PendingEmailChange> {
  const row = await emailChanges.findPending(user.id, now);
  return row && { newEmail: row.newEmail, expiresAtUtc: row.expiresAt.toISOString() };
}

export async function cancelEmailChange(db: TransactionRunner, user: SessionUser, now = new Date()) {
  await db.transaction((transaction) => emailChanges.useAllOf(user.id, now, transaction));
}

const badLink = (message: string) => new AppError('bad-request', message, { token: message });

/** Opens a confirmation link: the address changes now. Returns both addresses, for the notice to the old one. */
export async function confirmEmailChange(db: TransactionRunner, input: EmailConfirmInput, now = new Date()) {
  try {
    return await db.transaction(async (transaction) => {
      const change = await emailChanges.findUnusedForUpdate(sha256(input.token), transaction);
      if (!change) throw badLink('This confirmation link is invalid or was already used. Ask for a new one in Settings.');
      if (change.expiresAt <= now) {
        throw badLink(
          `This confirmation link has expired (links work for ${EMAIL_CHANGE_LIFETIME_HOURS} hours). Ask for a new one in Settings.`,
        );
      }
      const user = await users.findByIdForUpdate(change.userId, transaction);
      if (!user) throw badLink('This confirmation link is invalid or was already used. Ask for a new one in Settings.');
      if (await users.emailTaken(change.newEmail, transaction)) throw taken('token');
      const oldEmail = user.email;
      await users.update(user.id, { email: change.newEmail }, transaction);
      await emailChanges.useAllOf(user.id, now, transaction);
      // Reset links mailed to the old address stop working.
      await resets.useAllOf(user.id, now, transaction);
      await audit.record(
        {
          actor: user,
          ownerId: user.id,
          action: 'email.change',
          entityType: 'user',
          entityId: user.id,
          summary: 'Changed the sign-in e-mail (confirmed from the new address)',
          before: { email: oldEmail },
          after: { email: change.newEmail },
        },
        transaction,
      );
      return { oldEmail, newEmail: change.newEmail, displayName: user.displayName };
    });
  } catch (error) {
    if (error instanceof UniqueConstraintError) throw taken('token');
    throw error;
  }
}

/** What deleting the account would take with it, and whether a club still needs another admin first. */
export async function deletionPreview(sequelize: Sequelize, user: SessionUser): Promise<AccountDeletionPreview> {
  const [own, ownUnits, posts, clubOutcomes] = await Promise.all([
    stations.listFor(user),
    units.listFor(user),
    listeningPosts.listFor(sequelize, user),
    clubs.clubsOnDeletion(user.id),
  ]);
  const tokens = await Promise.all(own.map((s) => hasToken(s.id)));
  return {
    stations: own.length,
    deviceTokens: tokens.filter(Boolean).length,
    units: ownUnits.length,
    listeningPosts: posts.length,
    clubs: clubOutcomes,
    allowed: !clubOutcomes.some((c) => c.outcome === 'hand-over'),
  };
}

/**
 * Deletes the account in one transaction: its clubs record that it left (a club with no other member goes), its
 * stations (with schedules, device tokens, heartbeats, alerts), units, listening posts, own log, sessions and the
 * account itself. Reception reports stay. Returns the stored photo files to delete after the commit.
 */
export async function deleteAccount(db: TransactionRunner, user: SessionUser, input: AccountDeleteInput) {
  const row = await requirePassword(user.id, input.password, 'password');
  return db.transaction(async (transaction) => {
    const locked = await users.findByIdForUpdate(row.id, transaction);
    if (!locked) throw new AppError('unauthenticated', 'Sign in first');
    const stationCount = await stations.removeAllOwnedBy(user.id, transaction);
    // Refused (and everything above rolled back) while the person is a club's only admin.
    await clubs.leaveAllOnDeletion(user, stationCount, transaction);
    const { count: unitCount, photos } = await units.removeAllOwnedBy(user.id, transaction);
    const postCount = await listeningPosts.removeAllOwnedBy(user.id, transaction);
    await audit.forgetOwnLog(user.id, transaction);
    // Kept after the account is gone (owner and actor become empty): that account #id was deleted, and what went with it.
    await audit.record(
      {
        actor: user,
        ownerId: user.id,
        action: 'account.delete',
        entityType: 'user',
        entityId: user.id,
        summary: `Deleted the account with ${stationCount} station(s), ${unitCount} unit(s), ${postCount} listening post(s)`,
      },
      transaction,
    );
    await users.endSessionsOf(user.id, undefined, transaction);
    await users.remove(user.id, transaction);
    return { photos, email: locked.email, displayName: locked.displayName };
  });
}
