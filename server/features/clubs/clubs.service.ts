import type { SessionUser } from '@/shared/api/contracts';
import type { ClubDetail } from '@/shared/schemas';
import type { MembershipRole } from './clubs.repo';
import type { TransactionRunner } from '../../db/transaction';
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
