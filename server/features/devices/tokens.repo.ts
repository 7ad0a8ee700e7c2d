import { QueryTypes, type Sequelize, type Transaction } from 'sequelize';
import { DeviceTokenModel } from '../../db/models/device.model';

/** Creates the station's token or replaces its hash; true when one existed before. */
export async function upsertHash(stationId: number, tokenHash: string, transaction: Transaction) {
  const existing = await DeviceTokenModel.findOne({ where: { stationId }, transaction, lock: transaction.LOCK.UPDATE });
  if (existing) await existing.update({ tokenHash }, { transaction });
  else await DeviceTokenModel.create({ stationId, tokenHash }, { transaction });
  return existing !== null;
}

export async function remove(stationId: number, transaction: Transaction) {
  await DeviceTokenModel.destroy({ where: { stationId }, transaction });
}

export const countFor = (stationId: number) => DeviceTokenModel.count({ where: { stationId } });

/** Every issued token's station and when it was last issued. */
export const findAllIssued = (transaction: Transaction) =>
  DeviceTokenModel.findAll({ attributes: ['stationId', 'updatedAt'], transaction });

export type TokenStamps = { stationId: number; s: Date; sc: Date | null; u: Date | null; b: Date | null; susp: Date | null };

/** One query: the token's station and the change stamps of everything its configuration depends on. */
export async function findStampsByHash(sequelize: Sequelize, tokenHash: string): Promise<TokenStamps | null> {
  const rows = await sequelize.query<TokenStamps>(
    `SELECT t.stationId AS stationId, s.updatedAt AS s, sc.updatedAt AS sc, u.updatedAt AS u, s.suspendedAt AS susp,
            (SELECT MAX(sb.updatedAt) FROM station_bands sb WHERE sb.stationId = s.id) AS b
       FROM device_tokens t
       JOIN stations s ON s.id = t.stationId
       LEFT JOIN schedules sc ON sc.stationId = s.id
       LEFT JOIN units u ON u.id = s.unitId
      WHERE t.tokenHash = ?`,
    { replacements: [tokenHash], type: QueryTypes.SELECT },
  );
  return rows[0] ?? null;
}
