import { Op, type Transaction } from 'sequelize';
import { NotificationModel } from '../../db/models/club-extras.model';

export async function insert(values: { userId: number; kind: string; message: string; link: string | null }, transaction?: Transaction) {
  await NotificationModel.create({ ...values, readAt: null }, { transaction });
}

export const findFor = (userId: number) => NotificationModel.findAll({ where: { userId }, order: [['id', 'DESC']], limit: 100 });

/** Marks one unread notice read; false when there was no unread notice with that id. */
export async function markRead(userId: number, id: number, at: Date) {
  const [count] = await NotificationModel.update({ readAt: at }, { where: { id, userId, readAt: { [Op.is]: null } } });
  return count > 0;
}

/** Marks every unread notice of this person read; returns how many. */
export async function markAllRead(userId: number, at: Date) {
  const [count] = await NotificationModel.update({ readAt: at }, { where: { userId, readAt: { [Op.is]: null } } });
  return count;
}

export const exists = async (userId: number, id: number) => (await NotificationModel.count({ where: { id, userId } })) > 0;
