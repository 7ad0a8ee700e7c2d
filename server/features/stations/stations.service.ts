import type { CalibrationProposal, StationConfig } from '@/shared/api/answers';
import type { SessionUser } from '@/shared/api/contracts';
import { bandFor, type BandId } from '@/shared/domain/bands';
import { predictOffsets } from '@/shared/domain/calibration';
import { buildStationConfig, filterCoverage } from '@/shared/domain/workshop';
import type { CalibrationInput, MeasurementInput, Station, StationBandInput, StationInput, StationPatch, Unit } from '@/shared/schemas';
import type { Transaction, TransactionRunner } from '../../db/transaction';
import { AppError } from '../../lib/app-error';
import * as audit from '../audit/audit.service';
import { adminSharesClubWith } from '../clubs/access';
import { unitById } from '../units/units.service';
import { forgetStation as forgetReceptionAggregates } from '../receptions/receptions.service';
import * as repo from './stations.repo';

const notFound = (id: number) => new AppError('not-found', `Station ${id} does not exist`);

export const listFor = (user: SessionUser) => repo.findByOwner(user.id);

// For other features, which decide themselves who may see what they read.
export const stationById = (id: number, transaction?: Transaction) => repo.findById(id, transaction);
export const stationsOfOwners = (ownerIds: number[]) => repo.findByOwners(ownerIds);
export const setSuspension = repo.setSuspension;
export const setAudioOffset = (id: number, audioOffsetHz: number, transaction: Transaction) =>
  repo.update(id, { audioOffsetHz }, transaction);

/** Owners read their stations; a club admin reads the stations of the club's members. */
export async function getFor(user: SessionUser, id: number): Promise<Station> {
  const station = await repo.findById(id);
  if (!station) throw notFound(id);
  if (station.ownerId !== user.id && !(await adminSharesClubWith(user.id, user.adminOfClubIds, station.ownerId))) {
    throw notFound(id); // do not reveal that it exists
  }
  return station;
}

/** Only the owner changes a station; an admin who can read it is told why not. */
export async function getOwnedBy(user: SessionUser, id: number) {
  const station = await getFor(user, id);
  if (station.ownerId !== user.id) {
    throw new AppError('forbidden', `Station ${id} belongs to ${station.ownerName}; only its owner can change it`);
  }
  return station;
}

async function ownUnit(user: SessionUser, unitId: number | null | undefined): Promise<Unit | null> {
  if (unitId === null || unitId === undefined) return null;
  const unit = await unitById(unitId);
  if (!unit || unit.ownerId !== user.id) {
    throw new AppError('bad-request', `Unit ${unitId} is not one of your units`, { unitId: 'Choose one of your own units' });
  }
  return unit;
}

const settingsOf = (s: Station) => ({
  name: s.name,
  callsign: s.callsign,
  locator: s.locator,
  unitId: s.unitId,
  region: s.region,
  audioOffsetHz: s.audioOffsetHz,
  transmitEnabled: s.transmitEnabled,
  notes: s.notes,
});

export async function create(db: TransactionRunner, user: SessionUser, input: Required<StationInput>) {
  await ownUnit(user, input.unitId);
  return audit.ownChange(
    db,
    user,
    (transaction) => repo.insert(user.id, input as repo.StationValues, transaction),
    (station) => ({
      action: 'station.create',
      entityType: 'station',
      entityId: station.id,
      summary: `Created station ${station.name} (${station.callsign})`,
      after: settingsOf(station),
    }),
  );
}

export async function update(db: TransactionRunner, user: SessionUser, id: number, patch: StationPatch) {
  const before = await getOwnedBy(user, id);
  if (patch.unitId !== undefined) await ownUnit(user, patch.unitId);
  return audit.ownChange(
    db,
    user,
    (transaction) => repo.update(id, patch, transaction),
    (after) => ({
      action: 'station.update',
      entityType: 'station',
      entityId: id,
      summary: `Changed ${Object.keys(patch).join(', ')} of ${after.name}`,
      before: settingsOf(before),
      after: settingsOf(after),
    }),
  );
}

export async function remove(db: TransactionRunner, user: SessionUser, id: number) {
  const before = await getOwnedBy(user, id);
  await audit.ownChange(
    db,
    user,
    async (transaction) => {
      await repo.remove(id, transaction);
      await forgetReceptionAggregates(id, transaction);
    },
    () => ({
      action: 'station.delete',
      entityType: 'station',
      entityId: id,
      summary: `Deleted station ${before.name}`,
      before: settingsOf(before),
    }),
  );
}

/**
 * Deletes every station of an owner with what goes with a station (schedule, bands, calibration, device token,
 * heartbeats, alerts, reception aggregates); devices' caches drop them on commit. For account deletion.
 */
export async function removeAllOwnedBy(ownerId: number, transaction: Transaction) {
  const ids = await repo.idsOfOwnerForUpdate(ownerId, transaction);
  for (const id of ids) {
    await repo.remove(id, transaction);
    await forgetReceptionAggregates(id, transaction);
  }
  return ids.length;
}

function bandOrRefuse(bandId: BandId, station: Station) {
  const found = bandFor(bandId, station.region);
  if (!found.ok) throw new AppError('bad-request', found.reason, { bandId: found.reason });
  return found.band;
}

/** Enables or disables a band; a band no installed filter covers cannot be enabled. */
export async function setBand(db: TransactionRunner, user: SessionUser, id: number, bandId: BandId, input: StationBandInput) {
  const station = await getOwnedBy(user, id);
  const band = bandOrRefuse(bandId, station);
  if (input.enabled) {
    const unit = await unitById(station.unitId);
    if (!unit) {
      throw new AppError('bad-request', `Assign a unit to this station before enabling ${band.name}`, {
        enabled: 'Assign a unit first: its filters decide which bands may transmit',
      });
    }
    const coverage = filterCoverage(unit.filters, band);
    if (!coverage.covered) throw new AppError('bad-request', coverage.reason, { enabled: coverage.reason });
  }
  const beforeBand = station.bands.find((b) => b.bandId === bandId) ?? null;
  await db.transaction(async (transaction) => {
    const values: Parameters<typeof repo.upsertBand>[2] = { enabled: input.enabled };
    if (input.calibrationOffsetHz !== undefined) {
      values.calibrationOffsetHz = input.calibrationOffsetHz;
      values.calibrationSource = input.calibrationOffsetHz === null ? null : 'typed';
      values.calibratedAt = input.calibrationOffsetHz === null ? null : new Date();
    }
    await repo.upsertBand(id, bandId, values, transaction);
    await audit.record(
      {
        actor: user,
        ownerId: user.id,
        action: 'band.update',
        entityType: 'band',
        entityId: id,
        summary: `${input.enabled ? 'Enabled' : 'Disabled'} ${band.name} on ${station.name}`,
        before: beforeBand,
        after: { bandId, ...values },
      },
      transaction,
    );
  });
  return (await repo.findById(id))!;
}

/** Saves typed offsets, or the accepted proposals of a guided measurement, in one transaction. */
export async function saveCalibration(db: TransactionRunner, user: SessionUser, id: number, input: CalibrationInput) {
  const station = await getOwnedBy(user, id);
  for (const offset of input.offsets) bandOrRefuse(offset.bandId, station);
  const now = new Date();
  await db.transaction(async (transaction) => {
    for (const offset of input.offsets) {
      await repo.upsertBand(
        id,
        offset.bandId,
        { calibrationOffsetHz: offset.calibrationOffsetHz, calibrationSource: input.source, calibratedAt: now },
        transaction,
      );
    }
    if (input.source === 'measured' && input.referenceErrorPpm !== undefined) {
      await repo.setReferenceError(id, input.referenceErrorPpm, transaction);
    }
    await audit.record(
      {
        actor: user,
        ownerId: user.id,
        action: 'calibration.save',
        entityType: 'calibration',
        entityId: id,
        summary: `Saved ${input.source === 'reports' ? 'from-reports' : input.source} calibration for ${input.offsets.map((o) => o.bandId).join(', ')} on ${station.name}`,
        before: station.bands.map((b) => ({ bandId: b.bandId, calibrationOffsetHz: b.calibrationOffsetHz })),
        after: { referenceErrorPpm: input.referenceErrorPpm ?? null, offsets: input.offsets },
      },
      transaction,
    );
  });
  return (await repo.findById(id))!;
}

/** From one measurement, the reference error and a proposed offset for every enabled band (nothing is saved). */
export async function proposeCalibration(user: SessionUser, id: number, input: MeasurementInput): Promise<CalibrationProposal> {
  const station = await getOwnedBy(user, id);
  bandOrRefuse(input.bandId, station);
  const targets = station.bands
    .filter((b) => b.enabled || b.bandId === input.bandId)
    .map((b) => bandOrRefuse(b.bandId, station))
    .map((band) => ({ id: band.id, frequencyHz: band.dialHz + station.audioOffsetHz }));
  if (!targets.some((t) => t.id === input.bandId)) {
    const band = bandOrRefuse(input.bandId, station);
    targets.push({ id: band.id, frequencyHz: band.dialHz + station.audioOffsetHz });
  }
  const result = predictOffsets({ commandedHz: input.commandedHz, observedHz: input.observedHz }, targets);
  if (!result.ok) throw new AppError('bad-request', result.reason, { observedHz: result.reason });
  if (Math.abs(result.referenceErrorPpm) > 1000) {
    const reason = 'The two frequencies differ by more than 1000 ppm: check that both are in Hz and on the same band';
    throw new AppError('bad-request', reason, { observedHz: reason });
  }
  return {
    referenceErrorPpm: result.referenceErrorPpm,
    errorHz: input.observedHz - input.commandedHz,
    offsets: result.offsets.map((o) => ({
      bandId: o.id as BandId,
      frequencyHz: o.frequencyHz,
      calibrationOffsetHz: Number(o.offsetHz.toFixed(2)),
    })),
  };
}

export async function configFor(user: SessionUser, id: number, now = new Date()): Promise<StationConfig> {
  const station = await getFor(user, id);
  return buildStationConfig({ ...station, suspended: station.suspension !== null }, await unitById(station.unitId), now);
}
