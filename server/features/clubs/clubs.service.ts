import type { SessionUser } from '@/shared/api/contracts';
import type { ClubOnDeletion } from '@/shared/api/answers';
import type { ClubDetail } from '@/shared/schemas';
import type { MembershipRole } from './clubs.repo';
import type { Transaction, TransactionRunner } from '../../db/transaction';
import { AppError } from '../../lib/app-error';
import * as audit from '../audit/audit.service';
import { requireAdmin, requireMember } from './access';
import * as repo from './clubs.repo';

export async function createClub(db: TransactionRunner, user: SessionUser, input: { name: string; maxPowerDbm: number }) {
  return db.transaction(async (transaction) => {
    const club = await repo.insertClub(input, transaction);
    await repo.insertMembership({ clubId: club.id, userId: user.id, role: 'admin' }, transaction);
    await audit.record(
      {
        actor: user,
        ownerId: user.id,
        clubId: club.id,
        action: 'club.create',
        entityType: 'club',
        entityId: club.id,
        summary: `Created the club ${club.name}`,
        after: input,
      },
      transaction,
    );
    return club.id;
  });
}

export async function detail(user: SessionUser, clubId: number): Promise<ClubDetail> {
  const { membership, club } = await requireMember(user, clubId);
  const rows = await repo.membersOf(clubId);
  return {
    id: club.id,
    name: club.name,
    maxPowerDbm: club.maxPowerDbm,
    myRole: membership.role,
    members: rows.map(({ membership: m, user: u }) => {
      // Members see each other's names; e-mail addresses only the admins.
      return {
        userId: m.userId,
        displayName: u.displayName,
        callsign: u.callsign,
        email: membership.role === 'admin' ? u.email : '',
        role: m.role,
        joinedAt: m.createdAt.toISOString(),
      };
    }),
  };
}

export async function update(db: TransactionRunner, user: SessionUser, clubId: number, patch: { name?: string; maxPowerDbm?: number }) {
  const { club } = await requireAdmin(user, clubId);
  const before = { name: club.name, maxPowerDbm: club.maxPowerDbm };
  await db.transaction(async (transaction) => {
    await repo.updateClub(clubId, patch, transaction);
    await audit.record(
      {
        actor: user,
        ownerId: user.id,
        clubId,
        action: 'club.update',
        entityType: 'club',
        entityId: clubId,
        summary: `Changed the club's settings`,
        before,
        after: { ...before, ...patch },
      },
      transaction,
    );
  });
}

/** Removes a member (admins), or the member themself (leaving); the last admin must hand over first. */
export async function removeMember(db: TransactionRunner, user: SessionUser, clubId: number, memberId: number) {
  const self = memberId === user.id;
  if (self) await requireMember(user, clubId);
  else await requireAdmin(user, clubId);
  await db.transaction(async (transaction) => {
    const target = await repo.membershipForUpdate(memberId, clubId, transaction);
    if (!target) throw new AppError('not-found', `User ${memberId} is not a member of this club`);
    if (target.role === 'admin' && (await repo.adminCount(clubId, transaction)) <= 1) {
      throw new AppError('conflict', 'The last admin cannot leave: make another member an admin first');
    }
    await repo.removeMembership(memberId, clubId, transaction);
    await audit.record(
      {
        actor: user,
        ownerId: memberId,
        clubId,
        action: self ? 'member.leave' : 'member.remove',
        entityType: 'membership',
        entityId: memberId,
        summary: self ? 'Left the club' : 'Removed a member from the club',
        before: { role: target.role },
      },
      transaction,
    );
  });
}

export async function setRole(db: TransactionRunner, user: SessionUser, clubId: number, memberId: number, role: MembershipRole) {
  await requireAdmin(user, clubId);
  await db.transaction(async (transaction) => {
    const target = await repo.membershipForUpdate(memberId, clubId, transaction);
    if (!target) throw new AppError('not-found', `User ${memberId} is not a member of this club`);
    if (target.role === 'admin' && role === 'member' && (await repo.adminCount(clubId, transaction)) <= 1) {
      throw new AppError('conflict', 'The club needs at least one admin: promote someone else first');
    }
    const before = { role: target.role };
    await repo.setRole(memberId, clubId, role, transaction);
    await audit.record(
      {
        actor: user,
        ownerId: memberId,
        clubId,
        action: 'member.role',
        entityType: 'membership',
        entityId: memberId,
        summary: role === 'admin' ? 'Made a member an admin' : 'Made an admin a member',
        before,
        after: { role },
      },
      transaction,
    );
  });
}

/** What deleting the user's account does to each of their clubs (read inside the deletion's transaction, rows locked). */
export async function clubsOnDeletion(userId: number, transaction?: Transaction): Promise<ClubOnDeletion[]> {
  const rows = await repo.membershipsAroundForUpdate(userId, transaction);
  const mine = rows.filter((r) => r.userId === userId);
  return mine
    .map(({ clubId, clubName, role }) => {
      const others = rows.filter((r) => r.clubId === clubId && r.userId !== userId);
      const outcome: ClubOnDeletion['outcome'] =
        others.length === 0 ? 'delete-club' : role === 'admin' && !others.some((r) => r.role === 'admin') ? 'hand-over' : 'leave';
      return { clubId, clubName, outcome };
    })
    .sort((a, b) => a.clubName.localeCompare(b.clubName));
}

/** The refusal when a club would be left without an admin. */
export function handOverFirst(blocked: ClubOnDeletion[]) {
  const names = blocked.map((c) => c.clubName).join(', ');
  return new AppError(
    'conflict',
    `You are the only admin of ${names}. Make another member an admin there (Club → Members) or remove the other members, then delete your account.`,
  );
}

/**
 * An account being deleted leaves its clubs: each club's log records it; a club with no other member is deleted.
 * Refused while the person is the only admin of a club with other members.
 */
export async function leaveAllOnDeletion(user: SessionUser, stationCount: number, transaction: Transaction) {
  const outcomes = await clubsOnDeletion(user.id, transaction);
  const blocked = outcomes.filter((c) => c.outcome === 'hand-over');
  if (blocked.length) throw handOverFirst(blocked);
  const stations =
    stationCount === 0
      ? 'they had no stations'
      : stationCount === 1
        ? 'their station was deleted'
        : `their ${stationCount} stations were deleted`;
  for (const { clubId, clubName, outcome } of outcomes) {
    await audit.record(
      {
        actor: user,
        ownerId: user.id,
        clubId,
        action: outcome === 'delete-club' ? 'club.delete' : 'member.account-deleted',
        entityType: outcome === 'delete-club' ? 'club' : 'membership',
        entityId: outcome === 'delete-club' ? clubId : user.id,
        summary:
          outcome === 'delete-club'
            ? `Deleted their account; the club ${clubName} had no other member and was deleted`
            : `${user.displayName} deleted their account and left the club; ${stations}`,
      },
      transaction,
    );
    if (outcome === 'delete-club') await repo.removeClub(clubId, transaction);
    else await repo.removeMembership(user.id, clubId, transaction);
  }
  return outcomes;
}
