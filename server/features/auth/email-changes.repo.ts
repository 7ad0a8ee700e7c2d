import { Op, type Transaction } from 'sequelize';
import { EmailChangeModel } from '../../db/models/email-change.model';

export async function insert(values: { userId: number; newEmail: string; tokenHash: string; expiresAt: Date }, transaction: Transaction) {
  await EmailChangeModel.create({ ...values, usedAt: null }, { transaction });
}

/** The newest unused, unexpired request of the user. */
export const findPending = (userId: number, now: Date) =>
  EmailChangeModel.findOne({ where: { userId, usedAt: null, expiresAt: { [Op.gt]: now } }, order: [['id', 'DESC']] });

/** The unused request with this token hash (expired or not), locked for the rest of the transaction. */
export const findUnusedForUpdate = (tokenHash: string, transaction: Transaction) =>
  EmailChangeModel.findOne({ where: { tokenHash, usedAt: null }, transaction, lock: transaction.LOCK.UPDATE });

/** Uses up every outstanding request of the user (a new one replaces them; a confirmed one ends them). */
export async function useAllOf(userId: number, now: Date, transaction: Transaction) {
  await EmailChangeModel.update({ usedAt: now }, { where: { userId, usedAt: null }, transaction });
}
