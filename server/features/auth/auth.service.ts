import bcrypt from 'bcryptjs';
import { createHash, randomBytes } from 'node:crypto';
import { UniqueConstraintError, type Transaction } from 'sequelize';
import type { SessionUser } from '@/shared/api/contracts';
import type { ProfileInput, RegisterInput, ResetConfirmInput } from '@/shared/schemas';
import type { TransactionRunner } from '../../db/transaction';
import { AppError } from '../../lib/app-error';
import * as audit from '../audit/audit.service';
import * as resets from './password-resets.repo';
import * as users from './users.repo';

export const RESET_TOKEN_LIFETIME_MIN = 30;

/** The one spelling of an e-mail used for look-ups and rate-limit keys: trimmed, lower case. */
export const normaliseEmail = (email: unknown) =>
  String(email ?? '')
    .trim()
    .toLowerCase();

const sha256 = (value: string) => createHash('sha256').update(value).digest('hex');

// Compared against when the e-mail is unknown, so both paths cost one bcrypt of the same work factor
// (an unknown address takes as long to refuse as a wrong password).
const noUserHashes = new Map<number, string>();
const noUserHash = (cost: number) => {
  if (!noUserHashes.has(cost)) noUserHashes.set(cost, bcrypt.hashSync('no user has this password', cost));
  return noUserHashes.get(cost)!;
};

export async function register(input: RegisterInput, bcryptCost: number): Promise<number> {
  const passwordHash = await bcrypt.hash(input.password, bcryptCost);
  try {
    return await users.insert({
      email: input.email,
      displayName: input.displayName,
      callsign: input.callsign ? input.callsign : null,
      passwordHash,
    });
  } catch (error) {
    if (error instanceof UniqueConstraintError) {
      throw new AppError('conflict', 'An account with this e-mail already exists', {
        email: 'An account with this e-mail already exists. Sign in or reset the password.',
      });
    }
    throw error;
  }
}

/** The user's id when e-mail and password match, otherwise null. */
export async function verifyCredentials(email: string, password: string, bcryptCost: number): Promise<number | null> {
  const user = await users.findByEmail(normaliseEmail(email));
  const matches = await bcrypt.compare(password, user?.passwordHash ?? noUserHash(bcryptCost));
  return user && matches ? user.id : null;
}

/** Creates a single-use token and returns it (to be mailed), or null for an unknown e-mail. */
export async function createPasswordReset(email: string, now = new Date()) {
  const user = await users.findByEmail(email);
  if (!user) return null;
  const token = randomBytes(32).toString('base64url');
  await resets.insert({
    userId: user.id,
    tokenHash: sha256(token),
    expiresAt: new Date(now.getTime() + RESET_TOKEN_LIFETIME_MIN * 60_000),
  });
  return { token, email: user.email, displayName: user.displayName };
}

export async function confirmPasswordReset(db: TransactionRunner, input: ResetConfirmInput, bcryptCost: number, now = new Date()) {
  const passwordHash = await bcrypt.hash(input.password, bcryptCost);
  await db.transaction(async (transaction) => {
    const reset = await resets.findUsableForUpdate(sha256(input.token), now, transaction);
    if (!reset) {
      throw new AppError('bad-request', 'This reset link is invalid, already used or expired. Ask for a new one.', {
        token: 'This reset link is invalid, already used or expired. Ask for a new one.',
      });
    }
    await users.update(reset.userId, { passwordHash }, transaction);
    // This link and any other outstanding ones for the account stop working.
    await resets.useAllOf(reset.userId, now, transaction);
    // Whoever knew the old password is signed out everywhere.
    await users.endSessionsOf(reset.userId, undefined, transaction);
  });
}

/** Name and personal callsign; recorded in the person's own log. */
export async function updateProfile(db: TransactionRunner, user: SessionUser, input: ProfileInput) {
  const callsign = input.callsign ? input.callsign : null;
  await db.transaction(async (transaction) => {
    await users.update(user.id, { displayName: input.displayName, callsign }, transaction);
    const before = { displayName: user.displayName, callsign: user.callsign };
    await audit.record(
      {
        actor: { id: user.id, displayName: input.displayName },
        ownerId: user.id,
        action: 'profile.update',
        entityType: 'user',
        entityId: user.id,
        summary: 'Changed the name or callsign of the account',
        before,
        after: { displayName: input.displayName, callsign },
      },
      transaction,
    );
  });
}

/** The signed-in user with club memberships, read afresh. */
export const sessionUserOf = (id: number) => users.findSessionUser(id);

/** Where to mail a person, for other features (owners of stations, members of clubs). */
export async function contactOf(userId: number, transaction?: Transaction) {
  const user = await users.findById(userId, transaction);
  return user && { id: user.id, email: user.email, displayName: user.displayName };
}

/** Ends every session of the user but the given one; recorded in the person's own log. */
export async function endOtherSessions(db: TransactionRunner, user: SessionUser, keepSid: string) {
  return db.transaction(async (transaction) => {
    const ended = await users.endSessionsOf(user.id, keepSid, transaction);
    await audit.record(
      {
        actor: user,
        ownerId: user.id,
        action: 'sessions.end-others',
        entityType: 'user',
        entityId: user.id,
        summary: `Signed out everywhere else (${ended} other session${ended === 1 ? '' : 's'})`,
      },
      transaction,
    );
    return ended;
  });
}
