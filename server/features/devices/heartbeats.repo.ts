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

/** Heartbeat temperatures of a station in [from, to), oldest first (stability from reports). */
export async function temperaturesBetween(stationId: number, from: Date, to: Date) {
  const rows = await HeartbeatModel.findAll({
    attributes: ['receivedAt', 'temperatureC'],
    where: { stationId, receivedAt: { [Op.gte]: from, [Op.lt]: to }, temperatureC: { [Op.ne]: null } },
    order: [['receivedAt', 'ASC']],
  });
  return rows.map((r) => ({ atMs: r.receivedAt.getTime(), temperatureC: Number(r.temperatureC) }));
}
