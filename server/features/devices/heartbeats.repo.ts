import { Op, type InferCreationAttributes, type Transaction } from 'sequelize';
import { HeartbeatModel } from '../../db/models/device.model';

export type HeartbeatValues = Omit<InferCreationAttributes<HeartbeatModel>, 'id'>;

/** Many heartbeats in one INSERT (the group writer hands them in). */
export async function insertMany(rows: HeartbeatValues[], transaction: Transaction) {
  await HeartbeatModel.bulkCreate(rows, { validate: false, transaction });
}

/** The newest heartbeat received at or before `at`. */
export const lastAtOrBefore = (stationId: number, at: Date) =>
  HeartbeatModel.findOne({ where: { stationId, receivedAt: { [Op.lte]: at } }, order: [['receivedAt', 'DESC']] });

/** Heartbeats received since `since`, oldest first. */
export const findSince = (stationId: number, since: Date) =>
  HeartbeatModel.findAll({ where: { stationId, receivedAt: { [Op.gte]: since } }, order: [['receivedAt', 'ASC']] });
