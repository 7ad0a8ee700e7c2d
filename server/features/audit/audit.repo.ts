import { Op, type Transaction, type WhereOptions } from 'sequelize';
import { AuditEntryModel } from '../../db/models/club-extras.model';

export type AuditRow = {
  at: Date;
  actorId: number;
  actorName: string;
  ownerId: number;
  clubId: number | null;
  action: string;
  entityType: string;
  entityId: number | null;
  summary: string;
  before: string | null;
  after: string | null;
};

export async function insert(row: AuditRow, transaction?: Transaction) {
  await AuditEntryModel.create(row, { transaction });
}

const LIMIT = 500;

async function newestWhere(where: WhereOptions<AuditEntryModel>) {
  return AuditEntryModel.findAll({
    where,
    order: [
      ['at', 'DESC'],
      ['id', 'DESC'],
    ],
    limit: LIMIT,
  });
}

/** Changes to one owner's things, by anyone, newest first. */
export const findForOwner = (ownerId: number) => newestWhere({ ownerId });

/** A club's own actions and changes to its members' things, newest first. */
export const findForClub = (clubId: number, memberIds: number[]) =>
  newestWhere({ [Op.or]: [{ clubId }, { ownerId: { [Op.in]: memberIds }, clubId: null }] });

/** Deletes an owner's own log (entries about no club); club logs keep theirs. */
export async function removeOwnLog(ownerId: number, transaction: Transaction) {
  await AuditEntryModel.destroy({ where: { ownerId, clubId: null }, transaction });
}
