import type { SessionUser } from '@/shared/api/contracts';
import { AppError } from '../../lib/app-error';
import * as repo from './clubs.repo';

/**
 * The clubs feature's shared access module: who belongs to a club and who may see whose things.
 * Other features ask here instead of reading memberships themselves.
 */

/** A member sees the club; anyone else is told it does not exist. */
export async function requireMember(user: SessionUser, clubId: number) {
  const membership = await repo.membershipOf(user.id, clubId);
  const club = membership ? await repo.findClub(clubId) : null;
  if (!membership || !club) throw new AppError('not-found', `Club ${clubId} does not exist`);
  return { membership, club };
}

export async function requireAdmin(user: SessionUser, clubId: number) {
  const found = await requireMember(user, clubId);
  if (found.membership.role !== 'admin') throw new AppError('forbidden', `Only the admins of ${found.club.name} can do this`);
  return found;
}

export const memberIdsOf = repo.memberIdsOf;

/** True when `adminId` administers a club that `ownerId` belongs to (or is the owner). */
export const adminSharesClubWith = repo.adminSharesClubWith;
