import { createHash, randomBytes } from 'node:crypto';
import type { Sequelize } from 'sequelize';
import type { SessionUser } from '@/shared/api/contracts';
import type { TransactionRunner } from '../../db/transaction';
import { stationChangedAfter } from '../../lib/change-feed';
import * as audit from '../audit/audit.service';
import { getOwnedBy } from '../stations/stations.service';
import * as repo from './tokens.repo';

export const hashToken = (token: string) => createHash('sha256').update(token).digest('hex');
export const newToken = () => `fld_${randomBytes(24).toString('base64url')}`;

/** Creates or replaces the station's device token; the old one stops working at once. */
export async function rotate(db: TransactionRunner, user: SessionUser, stationId: number) {
  const station = await getOwnedBy(user, stationId);
  const token = newToken();
  await db.transaction(async (transaction) => {
    const existing = await repo.upsertHash(stationId, hashToken(token), transaction);
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

export async function revoke(db: TransactionRunner, user: SessionUser, stationId: number) {
  const station = await getOwnedBy(user, stationId);
  await db.transaction(async (transaction) => {
    await repo.remove(stationId, transaction);
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
  return (await repo.countFor(stationId)) > 0;
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
  const row = await repo.findStampsByHash(sequelize, tokenHash);
  if (!row) return null;
  const stamp = (d: Date | null) => (d ? new Date(d).getTime() : 0);
  return {
    stationId: row.stationId,
    tokenHash,
    version: [row.stationId, stamp(row.s), stamp(row.sc), stamp(row.u), stamp(row.b), stamp(row.susp)].join('.'),
  };
}
