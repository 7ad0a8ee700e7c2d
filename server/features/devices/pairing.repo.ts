import { Op, QueryTypes, UniqueConstraintError, type Transaction } from 'sequelize';
import { DeviceTokenModel } from '../../db/models/device.model';
import { DevicePairingModel, PairingAttemptModel, type PairingStatus } from '../../db/models/pairing.model';
import { StationModel } from '../../db/models/station.model';
import { stationChangedAfter } from '../../lib/change-feed';

export type Pairing = {
  id: number;
  targetKind: string;
  targetId: number | null;
  status: PairingStatus;
  model: string | null;
  firmware: string | null;
  intervalS: number;
  lastPolledAt: Date | null;
  expiresAt: Date;
};

const toPairing = (row: DevicePairingModel): Pairing => ({
  id: row.id,
  targetKind: row.targetKind,
  targetId: row.targetId,
  status: row.status,
  model: row.model,
  firmware: row.firmware,
  intervalS: row.intervalS,
  lastPolledAt: row.lastPolledAt,
  expiresAt: row.expiresAt,
});

export type NewPairing = Pick<Pairing, 'targetKind' | 'model' | 'firmware' | 'intervalS' | 'expiresAt'> & {
  deviceCodeHash: string;
  userCodeHash: string;
};

/** Stores a new pairing; false when either code's hash is already taken (the caller draws again). */
export async function insert(values: NewPairing): Promise<boolean> {
  try {
    await DevicePairingModel.create({
      ...values,
      status: 'pending',
      targetId: null,
      lastPolledAt: null,
      decidedById: null,
      decidedAt: null,
    });
    return true;
  } catch (error) {
    if (error instanceof UniqueConstraintError) return false;
    throw error;
  }
}

/** Forgets pairings that ended long enough ago (their user codes become free again). */
export async function removeExpiredBefore(before: Date) {
  await DevicePairingModel.destroy({ where: { expiresAt: { [Op.lt]: before } } });
}

async function findOneBy(where: { deviceCodeHash: string } | { userCodeHash: string }, transaction?: Transaction) {
  const row = await DevicePairingModel.findOne({ where, transaction, lock: transaction ? transaction.LOCK.UPDATE : undefined });
  return row ? toPairing(row) : null;
}

/** The pairing a device code names, locked for the rest of the transaction. */
export const lockByDeviceCode = (deviceCodeHash: string, transaction: Transaction) => findOneBy({ deviceCodeHash }, transaction);
/** The pairing a user code names (locked when a transaction is given). */
export const findByUserCode = (userCodeHash: string, transaction?: Transaction) => findOneBy({ userCodeHash }, transaction);

export async function update(
  id: number,
  patch: Partial<Pick<DevicePairingModel, 'status' | 'targetId' | 'intervalS' | 'lastPolledAt' | 'decidedById' | 'decidedAt'>>,
  transaction?: Transaction,
) {
  await DevicePairingModel.update(patch, { where: { id }, transaction });
}

export async function stationExists(stationId: number, transaction?: Transaction) {
  return (await StationModel.count({ where: { id: stationId }, transaction })) > 0;
}

/** Which of these stations have a device token now. */
export async function stationsWithToken(stationIds: number[]): Promise<Set<number>> {
  if (stationIds.length === 0) return new Set();
  const rows = await DeviceTokenModel.findAll({ where: { stationId: { [Op.in]: stationIds } }, attributes: ['stationId'] });
  return new Set(rows.map((row) => row.stationId));
}

/** Drops the station's device token; it stops at once (the gateway's cache forgets it on commit). */
export async function removeStationToken(stationId: number, transaction: Transaction) {
  const removed = await DeviceTokenModel.destroy({ where: { stationId }, transaction });
  stationChangedAfter(transaction, stationId);
  return removed > 0;
}

/** Gives the station this token (hash only), replacing any other; the old one stops on commit. */
export async function replaceStationToken(stationId: number, tokenHash: string, transaction: Transaction) {
  const existing = await DeviceTokenModel.findOne({ where: { stationId }, transaction, lock: transaction.LOCK.UPDATE });
  if (existing) await existing.update({ tokenHash }, { transaction });
  else await DeviceTokenModel.create({ stationId, tokenHash }, { transaction });
  stationChangedAfter(transaction, stationId);
}

/**
 * Counts one attempt for the key in a fixed window, in the database, so every server process
 * shares the count. Returns the attempts in the current window, this one included.
 */
export async function countAttempt(attemptKey: string, windowMs: number, now: Date): Promise<number> {
  const sequelize = PairingAttemptModel.sequelize!;
  const windowEnded = new Date(now.getTime() - windowMs);
  // MariaDB applies these left to right: `attempts` still sees the old windowStart.
  await sequelize.query(
    `INSERT INTO pairing_attempts (attemptKey, windowStart, attempts) VALUES (?, ?, 1)
     ON DUPLICATE KEY UPDATE attempts = IF(windowStart <= ?, 1, attempts + 1),
                             windowStart = IF(windowStart <= ?, ?, windowStart)`,
    { replacements: [attemptKey, now, windowEnded, windowEnded, now], type: QueryTypes.INSERT },
  );
  const row = await PairingAttemptModel.findByPk(attemptKey);
  return row?.attempts ?? 1;
}

/** Takes back an attempt that turned out to be a right code. */
export async function forgiveAttempt(attemptKey: string) {
  await PairingAttemptModel.sequelize!.query('UPDATE pairing_attempts SET attempts = GREATEST(attempts - 1, 0) WHERE attemptKey = ?', {
    replacements: [attemptKey],
    type: QueryTypes.UPDATE,
  });
}

/** When the key's current window ends (for Retry-After). */
export async function windowEndsAt(attemptKey: string, windowMs: number) {
  const row = await PairingAttemptModel.findByPk(attemptKey);
  return row ? new Date(row.windowStart.getTime() + windowMs) : null;
}
