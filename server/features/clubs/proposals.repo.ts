import type { Transaction } from 'sequelize';
import { OffsetProposalModel, type ProposalStatus } from '../../db/models/club-extras.model';

export type ProposalRow = OffsetProposalModel;

/** A new proposal replaces any pending one for the same station. */
export async function withdrawPending(stationId: number, at: Date, transaction: Transaction) {
  await OffsetProposalModel.update({ status: 'withdrawn', decidedAt: at }, { where: { stationId, status: 'pending' }, transaction });
}

export async function insert(
  values: { clubId: number; stationId: number; proposedById: number; currentOffsetHz: number; proposedOffsetHz: number; reason: string },
  transaction: Transaction,
) {
  return OffsetProposalModel.create({ ...values, decidedAt: null }, { transaction });
}

export const findForStations = (stationIds: number[]) =>
  OffsetProposalModel.findAll({ where: { stationId: stationIds }, order: [['id', 'DESC']], limit: 100 });

/** The proposal, locked for the rest of the transaction. */
export const findForUpdate = (id: number, transaction: Transaction) =>
  OffsetProposalModel.findByPk(id, { transaction, lock: transaction.LOCK.UPDATE });

export async function decide(row: ProposalRow, status: Exclude<ProposalStatus, 'pending'>, at: Date, transaction: Transaction) {
  await row.update({ status, decidedAt: at }, { transaction });
}
