import { Op, type Transaction } from 'sequelize';
import { InvitationModel } from '../../db/models/club-extras.model';

export type InvitationRow = InvitationModel;

export async function insert(
  values: { clubId: number; email: string; tokenHash: string; invitedById: number; expiresAt: Date },
  transaction: Transaction,
) {
  return InvitationModel.create({ ...values, acceptedAt: null, acceptedById: null }, { transaction });
}

/** Not yet accepted and not expired, newest first. */
export const findPending = (clubId: number, now: Date) =>
  InvitationModel.findAll({ where: { clubId, acceptedAt: null, expiresAt: { [Op.gt]: now } }, order: [['id', 'DESC']] });

/** The invitation with this token hash, locked for the rest of the transaction. */
export const findByTokenForUpdate = (tokenHash: string, transaction: Transaction) =>
  InvitationModel.findOne({ where: { tokenHash }, transaction, lock: transaction.LOCK.UPDATE });

export async function markAccepted(id: number, acceptedById: number, at: Date, transaction: Transaction) {
  await InvitationModel.update({ acceptedAt: at, acceptedById }, { where: { id }, transaction });
}

/** One pending invitation of this club, locked for the rest of the transaction; null when it is gone, used or expired. */
export const findPendingForUpdate = (clubId: number, id: number, now: Date, transaction: Transaction) =>
  InvitationModel.findOne({
    where: { id, clubId, acceptedAt: null, expiresAt: { [Op.gt]: now } },
    transaction,
    lock: transaction.LOCK.UPDATE,
  });

export async function remove(id: number, transaction: Transaction) {
  await InvitationModel.destroy({ where: { id }, transaction });
}

/** A fresh link for the same invitation: the old token stops working. */
export async function renew(id: number, tokenHash: string, expiresAt: Date, transaction: Transaction) {
  await InvitationModel.update({ tokenHash, expiresAt }, { where: { id }, transaction });
}
