import type { Sequelize, Transaction } from 'sequelize';
import type { SessionUser } from '@/shared/api/contracts';
import type { ClubDetail } from '@/shared/schemas';
import { ClubModel } from '../../db/models/club.model';
import { MembershipModel, type MembershipRole } from '../../db/models/membership.model';
import { UserModel } from '../../db/models/user.model';
import { AppError } from '../../lib/app-error';
import * as audit from '../audit/audit.service';
import { requireAdmin, requireMember } from './access';

export async function createClub(sequelize: Sequelize, user: SessionUser, input: { name: string; maxPowerDbm: number }) {
  return sequelize.transaction(async (transaction) => {
    const club = await ClubModel.create(input, { transaction });
    await MembershipModel.create({ clubId: club.id, userId: user.id, role: 'admin' }, { transaction });
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
  const rows = await MembershipModel.findAll({ where: { clubId }, include: [{ model: UserModel, as: 'user' }], order: [['id', 'ASC']] });
  return {
    id: club.id,
    name: club.name,
    maxPowerDbm: club.maxPowerDbm,
    myRole: membership.role,
    members: rows.map((m) => {
      const u = (m as MembershipModel & { user: UserModel }).user;
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

export async function update(sequelize: Sequelize, user: SessionUser, clubId: number, patch: { name?: string; maxPowerDbm?: number }) {
  const { club } = await requireAdmin(user, clubId);
  const before = { name: club.name, maxPowerDbm: club.maxPowerDbm };
  await sequelize.transaction(async (transaction) => {
    await club.update(patch, { transaction });
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

async function adminCount(clubId: number, transaction: Transaction) {
  return MembershipModel.count({ where: { clubId, role: 'admin' }, transaction });
}

/** Removes a member (admins), or the member themself (leaving); the last admin must hand over first. */
export async function removeMember(sequelize: Sequelize, user: SessionUser, clubId: number, memberId: number) {
  const self = memberId === user.id;
  if (self) await requireMember(user, clubId);
  else await requireAdmin(user, clubId);
  await sequelize.transaction(async (transaction) => {
    const target = await MembershipModel.findOne({ where: { clubId, userId: memberId }, transaction, lock: transaction.LOCK.UPDATE });
    if (!target) throw new AppError('not-found', `User ${memberId} is not a member of this club`);
    if (target.role === 'admin' && (await adminCount(clubId, transaction)) <= 1) {
      throw new AppError('conflict', 'The last admin cannot leave: make another member an admin first');
    }
    await target.destroy({ transaction });
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

export async function setRole(sequelize: Sequelize, user: SessionUser, clubId: number, memberId: number, role: MembershipRole) {
  await requireAdmin(user, clubId);
  await sequelize.transaction(async (transaction) => {
    const target = await MembershipModel.findOne({ where: { clubId, userId: memberId }, transaction, lock: transaction.LOCK.UPDATE });
    if (!target) throw new AppError('not-found', `User ${memberId} is not a member of this club`);
    if (target.role === 'admin' && role === 'member' && (await adminCount(clubId, transaction)) <= 1) {
      throw new AppError('conflict', 'The club needs at least one admin: promote someone else first');
    }
    const before = { role: target.role };
    await target.update({ role }, { transaction });
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
