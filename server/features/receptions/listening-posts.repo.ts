import { QueryTypes, type Sequelize, type Transaction } from 'sequelize';
import type { ListeningPost } from '@/shared/api/receptions';
import { ListeningPostModel } from '../../db/models/listening-post.model';

type Stats = { reports: number; lastReportAt: Date | null };

function toPost(row: ListeningPostModel, stats: Stats | undefined): ListeningPost {
  return {
    id: row.id,
    ownerId: row.ownerId,
    name: row.name,
    callsign: row.callsign,
    locator: row.locator,
    hasToken: row.tokenHash !== null,
    tokenIssuedAt: row.tokenIssuedAt ? row.tokenIssuedAt.toISOString() : null,
    lastReportAt: stats?.lastReportAt ? new Date(stats.lastReportAt).toISOString() : null,
    reports: Number(stats?.reports ?? 0),
    createdAt: row.createdAt.toISOString(),
  };
}

/** Reports each post sent (new ones, not repeats) and when it last posted, from its batches. */
async function statsOf(sequelize: Sequelize, ids: number[]) {
  const out = new Map<number, Stats>();
  if (ids.length === 0) return out;
  const rows = await sequelize.query<{ id: number; reports: number; lastReportAt: Date | null }>(
    `SELECT listeningPostId AS id, SUM(accepted) AS reports, MAX(receivedAt) AS lastReportAt
       FROM reception_batches WHERE listeningPostId IN (?) GROUP BY listeningPostId`,
    { replacements: [ids], type: QueryTypes.SELECT },
  );
  for (const r of rows) out.set(r.id, { reports: Number(r.reports), lastReportAt: r.lastReportAt });
  return out;
}

export async function findByOwners(sequelize: Sequelize, ownerIds: number[]) {
  if (ownerIds.length === 0) return [];
  const rows = await ListeningPostModel.findAll({
    where: { ownerId: ownerIds },
    order: [
      ['name', 'ASC'],
      ['id', 'ASC'],
    ],
  });
  const stats = await statsOf(
    sequelize,
    rows.map((r) => r.id),
  );
  return rows.map((row) => toPost(row, stats.get(row.id)));
}

export async function findById(sequelize: Sequelize, id: number) {
  const row = await ListeningPostModel.findByPk(id);
  if (!row) return null;
  const stats = await statsOf(sequelize, [id]);
  return toPost(row, stats.get(id));
}

export async function insert(values: { ownerId: number; name: string; callsign: string; locator: string }, transaction: Transaction) {
  const row = await ListeningPostModel.create({ ...values, tokenHash: null, tokenIssuedAt: null }, { transaction });
  return toPost(row, undefined);
}

export async function setToken(id: number, tokenHash: string, issuedAt: Date, transaction: Transaction) {
  await ListeningPostModel.update({ tokenHash, tokenIssuedAt: issuedAt }, { where: { id }, transaction });
}

export async function remove(id: number, transaction: Transaction) {
  await ListeningPostModel.destroy({ where: { id }, transaction });
}

/** Deletes every post of an owner and returns their ids. */
export async function removeAllOfOwner(ownerId: number, transaction: Transaction) {
  const rows = await ListeningPostModel.findAll({ where: { ownerId }, attributes: ['id'], transaction, lock: transaction.LOCK.UPDATE });
  await ListeningPostModel.destroy({ where: { ownerId }, transaction });
  return rows.map((row) => row.id);
}

export type PostIdentity = { postId: number; ownerId: number; callsign: string; locator: string; tokenHash: string };

/** The post a token belongs to (one indexed lookup on the token's hash). */
export async function findByTokenHash(tokenHash: string): Promise<PostIdentity | null> {
  const row = await ListeningPostModel.findOne({ where: { tokenHash }, attributes: ['id', 'ownerId', 'callsign', 'locator'] });
  return row ? { postId: row.id, ownerId: row.ownerId, callsign: row.callsign, locator: row.locator, tokenHash } : null;
}
