import { Op, type WhereOptions } from 'sequelize';
import type { Station, StationInput, StationPatch } from '@/shared/schemas';
import { StationModel } from '../../db/models/station.model';
import { UserModel } from '../../db/models/user.model';

type Row = StationModel & { owner?: UserModel };

function toStation(row: Row): Station {
  return {
    id: row.id,
    ownerId: row.ownerId,
    ownerName: row.owner?.displayName ?? '',
    name: row.name,
    callsign: row.callsign,
    locator: row.locator,
    notes: row.notes,
    createdAt: row.createdAt.toISOString(),
    updatedAt: row.updatedAt.toISOString(),
  };
}

const withOwner = { include: [{ model: UserModel, as: 'owner', attributes: ['id', 'displayName'] }] };

async function findAllWhere(where: WhereOptions<StationModel>) {
  const rows = await StationModel.findAll({ where, ...withOwner, order: [['name', 'ASC'], ['id', 'ASC']] });
  return rows.map((row) => toStation(row as Row));
}

export const findByOwner = (ownerId: number) => findAllWhere({ ownerId });
export const findByOwners = (ownerIds: number[]) => findAllWhere({ ownerId: { [Op.in]: ownerIds } });

export async function findById(id: number) {
  const row = await StationModel.findByPk(id, withOwner);
  return row ? toStation(row as Row) : null;
}

export async function insert(ownerId: number, input: Required<StationInput>) {
  const row = await StationModel.create({ ...input, ownerId });
  return (await findById(row.id))!;
}

export async function update(id: number, patch: StationPatch) {
  await StationModel.update(patch, { where: { id } });
  return (await findById(id))!;
}

export async function remove(id: number) {
  await StationModel.destroy({ where: { id } });
}
