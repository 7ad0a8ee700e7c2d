import { stationChangedAfter } from '../../lib/change-feed';
import { Op, type Transaction, type WhereOptions } from 'sequelize';
import type { BandId, LicenceRegion } from '@/shared/domain/bands';
import type { Station, StationBand, StationPatch } from '@/shared/schemas';
import { StationBandModel } from '../../db/models/station-band.model';
import { StationModel } from '../../db/models/station.model';
import { UserModel } from '../../db/models/user.model';

type Row = StationModel & { owner?: UserModel; bands?: StationBandModel[] };

function toBand(row: StationBandModel): StationBand {
  return {
    bandId: row.bandId as BandId,
    enabled: row.enabled,
    calibrationOffsetHz: row.calibrationOffsetHz,
    calibrationSource: row.calibrationSource,
    calibratedAt: row.calibratedAt ? row.calibratedAt.toISOString() : null,
  };
}

function toStation(row: Row): Station {
  return {
    id: row.id,
    ownerId: row.ownerId,
    ownerName: row.owner?.displayName ?? '',
    name: row.name,
    callsign: row.callsign,
    locator: row.locator,
    notes: row.notes,
    unitId: row.unitId,
    region: row.region as LicenceRegion,
    audioOffsetHz: row.audioOffsetHz,
    transmitEnabled: row.transmitEnabled,
    referenceErrorPpm: row.referenceErrorPpm,
    bands: (row.bands ?? []).map(toBand).sort((a, b) => a.bandId.localeCompare(b.bandId)),
    suspension: row.suspendedAt
      ? {
          at: row.suspendedAt.toISOString(),
          reason: row.suspendedReason ?? '',
          clubId: row.suspendedByClubId,
          clubName: row.suspendedByClubName ?? null,
          byName: row.suspendedByName ?? null,
        }
      : null,
    createdAt: row.createdAt.toISOString(),
    updatedAt: row.updatedAt.toISOString(),
  };
}

const include = [
  { model: UserModel, as: 'owner', attributes: ['id', 'displayName'] },
  { model: StationBandModel, as: 'bands' },
];

async function findAllWhere(where: WhereOptions<StationModel>) {
  const rows = await StationModel.findAll({
    where,
    include,
    order: [
      ['name', 'ASC'],
      ['id', 'ASC'],
    ],
  });
  return rows.map((row) => toStation(row as Row));
}

export const findByOwner = (ownerId: number) => findAllWhere({ ownerId });
export const findByOwners = (ownerIds: number[]) => findAllWhere({ ownerId: { [Op.in]: ownerIds } });
export const findByUnit = (unitId: number) => findAllWhere({ unitId });

/** Ids of an owner's stations, locked for the rest of the transaction. */
export async function idsOfOwnerForUpdate(ownerId: number, transaction: Transaction) {
  const rows = await StationModel.findAll({ where: { ownerId }, attributes: ['id'], transaction, lock: transaction.LOCK.UPDATE });
  return rows.map((row) => row.id);
}

export async function findById(id: number, transaction?: Transaction) {
  const row = await StationModel.findByPk(id, { include, transaction });
  return row ? toStation(row as Row) : null;
}

/** What an owner sets on a station (the rest is the server's: ids, owner, calibration, suspension, stamps). */
export type StationValues = Pick<
  Station,
  'name' | 'callsign' | 'locator' | 'notes' | 'unitId' | 'region' | 'audioOffsetHz' | 'transmitEnabled'
>;

export async function insert(ownerId: number, values: StationValues, transaction?: Transaction) {
  const row = await StationModel.create(
    { ...values, ownerId, referenceErrorPpm: null, suspendedAt: null, suspendedReason: null, suspendedByClubId: null },
    { transaction },
  );
  return (await findById(row.id, transaction))!;
}

export async function update(id: number, patch: StationPatch, transaction?: Transaction) {
  await StationModel.update(patch as Partial<StationValues>, { where: { id }, transaction });
  stationChangedAfter(transaction, id);
  return (await findById(id, transaction))!;
}

export async function remove(id: number, transaction?: Transaction) {
  await StationModel.destroy({ where: { id }, transaction });
  stationChangedAfter(transaction, id);
}

export async function upsertBand(
  stationId: number,
  bandId: BandId,
  values: Partial<Pick<StationBandModel, 'enabled' | 'calibrationOffsetHz' | 'calibrationSource' | 'calibratedAt'>>,
  transaction?: Transaction,
) {
  const existing = await StationBandModel.findOne({
    where: { stationId, bandId },
    transaction,
    lock: transaction ? transaction.LOCK.UPDATE : undefined,
  });
  if (existing) await existing.update(values, { transaction });
  else
    await StationBandModel.create(
      { stationId, bandId, enabled: false, calibrationOffsetHz: null, calibrationSource: null, calibratedAt: null, ...values },
      { transaction },
    );
  // Changing a band touches the station, so anything keyed on its updatedAt sees the change.
  await StationModel.update({ updatedAt: new Date() }, { where: { id: stationId }, transaction, silent: false });
  stationChangedAfter(transaction, stationId);
}

export async function setReferenceError(id: number, referenceErrorPpm: number | null, transaction?: Transaction) {
  await StationModel.update({ referenceErrorPpm }, { where: { id }, transaction });
  stationChangedAfter(transaction, id);
}

export type SuspensionRecord = { reason: string; clubId: number; clubName: string; byUserId: number; byName: string };

export async function setSuspension(id: number, suspension: SuspensionRecord | null, transaction?: Transaction) {
  await StationModel.update(
    suspension
      ? {
          suspendedAt: new Date(),
          suspendedReason: suspension.reason,
          suspendedByClubId: suspension.clubId,
          suspendedByClubName: suspension.clubName,
          suspendedByUserId: suspension.byUserId,
          suspendedByName: suspension.byName,
        }
      : {
          suspendedAt: null,
          suspendedReason: null,
          suspendedByClubId: null,
          suspendedByClubName: null,
          suspendedByUserId: null,
          suspendedByName: null,
        },
    { where: { id }, transaction },
  );
  stationChangedAfter(transaction, id);
}
