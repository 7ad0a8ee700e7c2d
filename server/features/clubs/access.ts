import type { SessionUser } from '@/shared/api/contracts';
import { ClubModel } from '../../db/models/club.model';
import { AppError } from '../../lib/app-error';
import { membershipOf } from './clubs.repo';

/** A member sees the club; anyone else is told it does not exist. */
export async function requireMember(user: SessionUser, clubId: number) {
  const membership = await membershipOf(user.id, clubId);
  const club = membership ? await ClubModel.findByPk(clubId) : null;
  if (!membership || !club) throw new AppError('not-found', `Club ${clubId} does not exist`);
  return { membership, club };
}

export async function requireAdmin(user: SessionUser, clubId: number) {
  const found = await requireMember(user, clubId);
  if (found.membership.role !== 'admin') throw new AppError('forbidden', `Only the admins of ${found.club.name} can do this`);
  return found;
}

/** Whether a club admin shares a club with an owner (so may read the owner's stations and units). */
export { adminSharesClubWith } from './clubs.repo';
