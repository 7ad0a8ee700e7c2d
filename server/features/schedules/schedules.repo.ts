import { stationChangedAfter } from '../../lib/change-feed';
import type { Transaction } from 'sequelize';
import { scheduleInput, type Schedule, type ScheduleValues } from '@/shared/schemas/schedule';
import { ScheduleModel } from '../../db/models/schedule.model';

function toSchedule(row: ScheduleModel): Schedule {
  return {
    ...scheduleInput.parse(JSON.parse(row.spec)),
    id: row.id,
    stationId: row.stationId,
    createdAt: row.createdAt.toISOString(),
    updatedAt: row.updatedAt.toISOString(),
  };
}

export async function findByStation(stationId: number, transaction?: Transaction) {
  const row = await ScheduleModel.findOne({ where: { stationId }, transaction });
  return row ? toSchedule(row) : null;
}

export async function findByStations(stationIds: number[]) {
  if (stationIds.length === 0) return new Map<number, Schedule>();
  const rows = await ScheduleModel.findAll({ where: { stationId: stationIds } });
  return new Map(rows.map((row) => [row.stationId, toSchedule(row)]));
}

export async function insert(stationId: number, values: ScheduleValues, transaction?: Transaction) {
  const row = await ScheduleModel.create({ stationId, spec: JSON.stringify(values) }, { transaction });
  stationChangedAfter(transaction, stationId);
  return toSchedule(row);
}

export async function update(stationId: number, values: ScheduleValues, transaction?: Transaction) {
  await ScheduleModel.update({ spec: JSON.stringify(values) }, { where: { stationId }, transaction });
  stationChangedAfter(transaction, stationId);
  return (await findByStation(stationId, transaction))!;
}

export async function remove(stationId: number, transaction?: Transaction) {
  await ScheduleModel.destroy({ where: { stationId }, transaction });
  stationChangedAfter(transaction, stationId);
}
