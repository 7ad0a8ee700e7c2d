import { Op, type Transaction } from 'sequelize';
import { DeviceTransmissionModel } from '../../db/models/device.model';

export type TransmissionValues = {
  stationId: number;
  startedAt: Date;
  bandId: string;
  frequencyHz: number;
  messageText: string;
  receivedAt: Date;
};

export async function insertMany(rows: TransmissionValues[], transaction: Transaction) {
  await DeviceTransmissionModel.bulkCreate(rows, { transaction });
}

/** How many transmissions the device reported as started between the two times. */
export const countBetween = (stationId: number, from: Date, to: Date) =>
  DeviceTransmissionModel.count({ where: { stationId, startedAt: { [Op.gte]: from, [Op.lte]: to } } });

/** The newest reported transmissions since `since`. */
export const findRecent = (stationId: number, since: Date, limit: number) =>
  DeviceTransmissionModel.findAll({ where: { stationId, startedAt: { [Op.gte]: since } }, order: [['startedAt', 'DESC']], limit });
