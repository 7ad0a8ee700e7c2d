import { stationChangedAfter } from '../../lib/change-feed';
import type { Transaction } from 'sequelize';
import { unitInput, type Unit, type UnitPhoto, type UnitValues } from '@/shared/schemas';
import { UnitPhotoModel } from '../../db/models/unit-photo.model';
import { UnitModel } from '../../db/models/unit.model';
import { UserModel } from '../../db/models/user.model';

type Row = UnitModel & { owner?: UserModel; photos?: UnitPhotoModel[] };

export function toPhoto(row: UnitPhotoModel): UnitPhoto {
  const base = `/api/units/${row.unitId}/photos/${row.id}`;
  return {
    id: row.id,
    url: base,
    thumbUrl: `${base}/thumb`,
    contentType: row.contentType,
    bytes: row.bytes,
    createdAt: row.createdAt.toISOString(),
  };
}

function toUnit(row: Row): Unit {
  // Parsing fills defaults for fields added after the row was written.
  const spec = unitInput.parse({ ...JSON.parse(row.spec), name: row.name, filterSelection: row.filterSelection });
  const fitted = row.fittedFilterIndex;
  return {
    ...spec,
    fittedFilter:
      spec.filterSelection === 'hand' && fitted !== null && fitted !== undefined && fitted < spec.filters.length && row.fittedAt
        ? { index: fitted, atUtc: row.fittedAt.toISOString() }
        : null,
    id: row.id,
    ownerId: row.ownerId,
    ownerName: row.owner?.displayName ?? '',
    photos: (row.photos ?? []).sort((a, b) => a.id - b.id).map(toPhoto),
    createdAt: row.createdAt.toISOString(),
    updatedAt: row.updatedAt.toISOString(),
  };
}

const include = [
  { model: UserModel, as: 'owner', attributes: ['id', 'displayName'] },
  { model: UnitPhotoModel, as: 'photos' },
];

export async function findByOwner(ownerId: number) {
  const rows = await UnitModel.findAll({
    where: { ownerId },
    include,
    order: [
      ['name', 'ASC'],
      ['id', 'ASC'],
    ],
  });
  return rows.map((row) => toUnit(row as Row));
}

export async function findById(id: number, transaction?: Transaction) {
  const row = await UnitModel.findByPk(id, { include, transaction });
  return row ? toUnit(row as Row) : null;
}

const specOf = ({ name: _name, filterSelection: _selection, ...spec }: UnitValues) => JSON.stringify(spec);

export async function insert(ownerId: number, values: UnitValues, transaction?: Transaction) {
  const row = await UnitModel.create(
    { ownerId, name: values.name, spec: specOf(values), filterSelection: values.filterSelection },
    { transaction },
  );
  return (await findById(row.id, transaction))!;
}

export async function update(id: number, values: UnitValues, transaction?: Transaction) {
  await UnitModel.update(
    { name: values.name, spec: specOf(values), filterSelection: values.filterSelection },
    { where: { id }, transaction },
  );
  stationChangedAfter(transaction, 'all');
  return (await findById(id, transaction))!;
}

/** Records which hand-swapped filter is fitted now; devices see the change (their ETag moves with updatedAt). */
export async function setFittedFilter(id: number, filterIndex: number, at: Date, transaction?: Transaction) {
  await UnitModel.update({ fittedFilterIndex: filterIndex, fittedAt: at }, { where: { id }, transaction });
  stationChangedAfter(transaction, 'all');
  return (await findById(id, transaction))!;
}

export async function remove(id: number, transaction?: Transaction) {
  await UnitModel.destroy({ where: { id }, transaction });
  stationChangedAfter(transaction, 'all');
}

export async function insertPhoto(
  values: { unitId: number; storageKey: string; thumbKey: string; contentType: string; bytes: number },
  transaction?: Transaction,
) {
  return toPhoto(await UnitPhotoModel.create(values, { transaction }));
}

export const findPhoto = (unitId: number, photoId: number) => UnitPhotoModel.findOne({ where: { id: photoId, unitId } });
/** Deletes every unit of an owner (their photo rows go with them) and returns the photos' stored files. */
export async function removeAllOfOwner(ownerId: number, transaction: Transaction) {
  const units = await UnitModel.findAll({ where: { ownerId }, attributes: ['id'], transaction, lock: transaction.LOCK.UPDATE });
  const photos = await UnitPhotoModel.findAll({ where: { unitId: units.map((u) => u.id) }, transaction });
  await UnitModel.destroy({ where: { ownerId }, transaction });
  return { count: units.length, photos: photos.map((p) => ({ storageKey: p.storageKey, thumbKey: p.thumbKey })) };
}

export const photosOf = (unitId: number) => UnitPhotoModel.findAll({ where: { unitId } });
export async function removePhoto(id: number, transaction?: Transaction) {
  await UnitPhotoModel.destroy({ where: { id }, transaction });
}
