import { Op, type Transaction } from 'sequelize';
import { ClubModel } from '../../db/models/club.model';
import { MembershipModel, type MembershipRole } from '../../db/models/membership.model';

export type { MembershipRole };
import { UserModel } from '../../db/models/user.model';

export const findClub = (clubId: number, transaction?: Transaction) => ClubModel.findByPk(clubId, { transaction });

export async function insertClub(values: { name: string; maxPowerDbm: number }, transaction: Transaction) {
  return ClubModel.create(values, { transaction });
}

export async function updateClub(clubId: number, patch: { name?: string; maxPowerDbm?: number }, transaction: Transaction) {
  await ClubModel.update(patch, { where: { id: clubId }, transaction });
}

export async function membershipOf(userId: number, clubId: number, transaction?: Transaction) {
  return MembershipModel.findOne({ where: { userId, clubId }, transaction });
}

/** The membership, locked for the rest of the transaction. */
export async function membershipForUpdate(userId: number, clubId: number, transaction: Transaction) {
  return MembershipModel.findOne({ where: { clubId, userId }, transaction, lock: transaction.LOCK.UPDATE });
}

export async function insertMembership(values: { clubId: number; userId: number; role: MembershipRole }, transaction: Transaction) {
  await MembershipModel.create(values, { transaction });
}

export async function setRole(userId: number, clubId: number, role: MembershipRole, transaction: Transaction) {
  await MembershipModel.update({ role }, { where: { clubId, userId }, transaction });
}

export async function removeMembership(userId: number, clubId: number, transaction: Transaction) {
  await MembershipModel.destroy({ where: { clubId, userId }, transaction });
}

export async function adminCount(clubId: number, transaction: Transaction) {
  return MembershipModel.count({ where: { clubId, role: 'admin' }, transaction });
}

export async function memberIdsOf(clubId: number): Promise<number[]> {
  const rows = await MembershipModel.findAll({ where: { clubId }, attributes: ['userId'] });
  return rows.map((row) => row.userId);
}

/** The club's members with their accounts, in joining order. */
export async function membersOf(clubId: number) {
  const rows = await MembershipModel.findAll({ where: { clubId }, include: [{ model: UserModel, as: 'user' }], order: [['id', 'ASC']] });
  return rows.map((m) => ({ membership: m, user: (m as MembershipModel & { user: UserModel }).user }));
}

/** True when `adminId` administers a club that `ownerId` belongs to. */
export async function adminSharesClubWith(adminId: number, adminOfClubIds: number[], ownerId: number) {
  if (adminOfClubIds.length === 0) return false;
  const shared = await MembershipModel.count({ where: { userId: ownerId, clubId: { [Op.in]: adminOfClubIds } } });
  return shared > 0 || adminId === ownerId;
}

/** Every membership of the clubs the user belongs to (theirs and the others'), with club names, locked for the transaction. */
export async function membershipsAroundForUpdate(userId: number, transaction?: Transaction) {
  const own = await MembershipModel.findAll({ where: { userId }, attributes: ['clubId'], transaction });
  if (own.length === 0) return [];
  const rows = await MembershipModel.findAll({
    where: { clubId: { [Op.in]: own.map((m) => m.clubId) } },
    include: [{ model: ClubModel, as: 'club', attributes: ['id', 'name'] }],
    transaction,
    lock: transaction ? transaction.LOCK.UPDATE : undefined,
  });
  return rows.map((m) => ({
    clubId: m.clubId,
    clubName: (m as MembershipModel & { club: ClubModel }).club.name,
    userId: m.userId,
    role: m.role,
  }));
}

/** Deletes a club; its memberships, invitations and proposals go with it, its log entries lose the club. */
export async function removeClub(clubId: number, transaction: Transaction) {
  await ClubModel.destroy({ where: { id: clubId }, transaction });
}
