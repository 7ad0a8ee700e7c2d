import { Op, type Transaction } from 'sequelize';
import { PasswordResetModel } from '../../db/models/password-reset.model';

export async function insert(values: { userId: number; tokenHash: string; expiresAt: Date }) {
  await PasswordResetModel.create({ ...values, usedAt: null });
}

/** The unused, unexpired reset with this token hash, locked for the rest of the transaction. */
export async function findUsableForUpdate(tokenHash: string, now: Date, transaction: Transaction) {
  return PasswordResetModel.findOne({
    where: { tokenHash, usedAt: null, expiresAt: { [Op.gt]: now } },
    transaction,
    lock: transaction.LOCK.UPDATE,
  });
}

/** Uses up every outstanding reset of the account. */
export async function useAllOf(userId: number, now: Date, transaction: Transaction) {
  await PasswordResetModel.update({ usedAt: now }, { where: { userId, usedAt: null }, transaction });
}
