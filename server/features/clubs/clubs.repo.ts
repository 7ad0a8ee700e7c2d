import { Op } from 'sequelize';
import { MembershipModel } from '../../db/models/membership.model';

export async function membershipOf(userId: number, clubId: number) {
  return MembershipModel.findOne({ where: { userId, clubId } });
}

export async function memberIdsOf(clubId: number): Promise<number[]> {
  const rows = await MembershipModel.findAll({ where: { clubId }, attributes: ['userId'] });
  return rows.map((row) => row.userId);
}

/** True when `adminId` administers a club that `ownerId` belongs to. */
export async function adminSharesClubWith(adminId: number, adminOfClubIds: number[], ownerId: number) {
  if (adminOfClubIds.length === 0) return false;
  const shared = await MembershipModel.count({ where: { userId: ownerId, clubId: { [Op.in]: adminOfClubIds } } });
  return shared > 0 || adminId === ownerId;
}
