import { Op, QueryTypes, type Sequelize, type Transaction } from 'sequelize';
import type { AlertSettings } from '@/shared/schemas';
import { AlertModel, AlertSettingsModel } from '../../db/models/device.model';

export type AlertRow = AlertModel;

export const findSettings = (stationId: number) => AlertSettingsModel.findByPk(stationId);

export async function saveSettings(stationId: number, settings: AlertSettings) {
  await AlertSettingsModel.upsert({ stationId, ...settings });
}

export const findOpen = (stationId: number, transaction: Transaction) =>
  AlertModel.findAll({ where: { stationId, resolvedAt: null }, transaction });

/** Open alerts and those resolved since `since`, newest first. */
export const findRecent = (stationId: number, since: Date) =>
  AlertModel.findAll({
    where: { stationId, [Op.or]: [{ resolvedAt: null }, { resolvedAt: { [Op.gte]: since } }] },
    order: [['openedAt', 'DESC']],
  });

export async function open(values: { stationId: number; rule: string; message: string }, at: Date, transaction: Transaction) {
  await AlertModel.create(
    { ...values, openedAt: at, lastSeenAt: at, resolvedAt: null, mailedAt: null, openKey: `${values.stationId}:${values.rule}` },
    { transaction },
  );
}

export async function stillSeen(alert: AlertRow, message: string, at: Date, transaction: Transaction) {
  await alert.update({ lastSeenAt: at, message }, { transaction });
}

export async function resolve(alert: AlertRow, at: Date, transaction: Transaction) {
  await alert.update({ resolvedAt: at, openKey: null }, { transaction });
}

export const findUnmailed = (transaction: Transaction) => AlertModel.findAll({ where: { mailedAt: null, resolvedAt: null }, transaction });

export async function markMailed(alert: AlertRow, at: Date, transaction: Transaction) {
  await alert.update({ mailedAt: at }, { transaction });
}

/**
 * Claims a job's lock row for the transaction (FOR UPDATE SKIP LOCKED): true for the one process
 * that wins, false for the others.
 */
export async function claimJob(sequelize: Sequelize, name: string, transaction: Transaction) {
  const locked = await sequelize.query('SELECT name FROM job_locks WHERE name = ? FOR UPDATE SKIP LOCKED', {
    replacements: [name],
    transaction,
    type: QueryTypes.SELECT,
  });
  return locked.length > 0;
}

/** Makes sure the job's lock row exists (outside any transaction, so every process can then lock it). */
export async function ensureJobRow(sequelize: Sequelize, name: string) {
  await sequelize.query('INSERT IGNORE INTO job_locks (name, lastRunAt) VALUES (?, NULL)', { replacements: [name] });
}

export async function stampJob(sequelize: Sequelize, name: string, at: Date, transaction: Transaction) {
  await sequelize.query('UPDATE job_locks SET lastRunAt = ? WHERE name = ?', { replacements: [at, name], transaction });
}
