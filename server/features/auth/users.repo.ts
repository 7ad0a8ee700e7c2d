import type { SessionUser } from '@/shared/api/contracts';
import { ClubModel } from '../../db/models/club.model';
import { MembershipModel } from '../../db/models/membership.model';
import { Op, type Transaction } from 'sequelize';
import { UserModel } from '../../db/models/user.model';

export async function findByEmail(email: string) {
  return UserModel.findOne({ where: { email } });
}

/** The signed-in user with club memberships, in one query. */
export async function findSessionUser(id: number): Promise<SessionUser | null> {
  const user = await UserModel.findByPk(id, {
    include: [{ model: MembershipModel, as: 'memberships', include: [{ model: ClubModel, as: 'club' }] }],
  });
  if (!user) return null;
  const memberships = (user as unknown as { memberships: (MembershipModel & { club: ClubModel })[] }).memberships;
  const clubs = memberships
    .map((m) => ({ clubId: m.clubId, clubName: m.club.name, role: m.role }))
    .sort((a, b) => a.clubName.localeCompare(b.clubName));
  return {
    id: user.id,
    email: user.email,
    displayName: user.displayName,
    callsign: user.callsign,
    clubs,
    adminOfClubIds: clubs.filter((c) => c.role === 'admin').map((c) => c.clubId),
  };
}

export const findById = (id: number, transaction?: Transaction) => UserModel.findByPk(id, { transaction });

/** The account row, locked for the rest of the transaction. */
export const findByIdForUpdate = (id: number, transaction: Transaction) =>
  UserModel.findByPk(id, { transaction, lock: transaction.LOCK.UPDATE });

export const emailTaken = async (email: string, transaction?: Transaction) =>
  (await UserModel.count({ where: { email }, transaction })) > 0;

/** Deletes the account row; the database removes what hangs off it (memberships, notifications, resets, imports). */
export async function remove(id: number, transaction: Transaction) {
  await UserModel.destroy({ where: { id }, transaction });
}

/** Creates an account; a taken e-mail fails with Sequelize's UniqueConstraintError. */
export async function insert(values: { email: string; displayName: string; callsign: string | null; passwordHash: string }) {
  return (await UserModel.create(values)).id;
}

export async function update(
  id: number,
  values: { displayName?: string; callsign?: string | null; passwordHash?: string; email?: string },
  transaction?: Transaction,
) {
  await UserModel.update(values, { where: { id }, transaction });
}

/**
 * Ends every stored session of a user (the session store keeps `{"passport":{"user":<id>}}` in its
 * data column), except `keepSid` when given. Returns how many ended.
 */
export async function endSessionsOf(userId: number, keepSid?: string, transaction?: Transaction): Promise<number> {
  const sequelize = UserModel.sequelize!;
  const sessions = sequelize.models.Session;
  if (!sessions) return 0;
  return sessions.destroy({
    where: {
      data: { [Op.like]: `%"passport":{"user":${Math.trunc(userId)}}%` },
      ...(keepSid ? { sid: { [Op.ne]: keepSid } } : {}),
    },
    transaction,
  });
}
