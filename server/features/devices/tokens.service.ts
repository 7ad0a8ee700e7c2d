import { stationChangedAfter } from '../../lib/change-feed';
import { createHash, randomBytes } from 'node:crypto';
import { QueryTypes, type Sequelize } from 'sequelize';
import type { SessionUser } from '@/shared/api/contracts';
import { DeviceTokenModel } from '../../db/models/device.model';
import { inTransaction } from '../../db/transaction';
import * as audit from '../audit/audit.service';
import { getOwnedBy } from '../stations/stations.service';

export const hashToken = (token: string) => createHash('sha256').update(token).digest('hex');
export const newToken = () => `fld_${randomBytes(24).toString('base64url')}`;

/** Creates or replaces the station's device token; the old one stops working at once. */
export async function rotate(user: SessionUser, stationId: number) {
  const station = await getOwnedBy(user, stationId);
  const token = newToken();
  await inTransaction(async (transaction) => {
    const existing = await DeviceTokenModel.findOne({ where: { stationId }, transaction, lock: transaction.LOCK.UPDATE });
    if (existing) await existing.update({ tokenHash: hashToken(token) }, { transaction });
    else await DeviceTokenModel.create({ stationId, tokenHash: hashToken(token) }, { transaction });
    stationChangedAfter(transaction, stationId);
    await audit.record(
      {
        actor: user,
        ownerId: user.id,
        action: existing ? 'device.rotate' : 'device.create',
        entityType: 'station',
        entityId: stationId,
        summary: `${existing ? 'Rotated' : 'Created'} the device token of ${station.name}`,
      },
      transaction,
    );
  });
  return token;
}

export async function revoke(user: SessionUser, stationId: number) {
  const station = await getOwnedBy(user, stationId);
  await inTransaction(async (transaction) => {
    await DeviceTokenModel.destroy({ where: { stationId }, transaction });
    stationChangedAfter(transaction, stationId);
    await audit.record(
      {
        actor: user,
        ownerId: user.id,
        action: 'device.revoke',
        entityType: 'station',
        entityId: stationId,
        summary: `Revoked the device token of ${station.name}`,
      },
      transaction,
    );
  });
}

export async function hasToken(stationId: number) {
  return (await DeviceTokenModel.count({ where: { stationId } })) > 0;
}

export type DeviceIdentity = {
  stationId: number;
  tokenHash: string;
  /** changes whenever anything in the device's configuration changes */
  version: string;
};

/** One query: which station a token belongs to, and the change stamps its configuration depends on. */
export async function identify(sequelize: Sequelize, token: string): Promise<DeviceIdentity | null> {
  const tokenHash = hashToken(token);
  const rows = await sequelize.query<{ stationId: number; s: Date; sc: Date | null; u: Date | null; b: Date | null; susp: Date | null }>(
    `SELECT t.stationId AS stationId, s.updatedAt AS s, sc.updatedAt AS sc, u.updatedAt AS u, s.suspendedAt AS susp,
            (SELECT MAX(sb.updatedAt) FROM station_bands sb WHERE sb.stationId = s.id) AS b
       FROM device_tokens t
       JOIN stations s ON s.id = t.stationId
       LEFT JOIN schedules sc ON sc.stationId = s.id
       LEFT JOIN units u ON u.id = s.unitId
      WHERE t.tokenHash = ?`,
    { replacements: [tokenHash], type: QueryTypes.SELECT },
  );
  const row = rows[0];
  if (!row) return null;
  const stamp = (d: Date | null) => (d ? new Date(d).getTime() : 0);
  return {
    stationId: row.stationId,
    tokenHash,
    version: [row.stationId, stamp(row.s), stamp(row.sc), stamp(row.u), stamp(row.b), stamp(row.susp)].join('.'),
  };
}
