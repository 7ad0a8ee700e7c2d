import { Op } from 'sequelize';
import type { SessionUser } from '@/shared/api/contracts';
import { bandFor } from '@/shared/domain/bands';
import { thermalDriftHz } from '@/shared/domain/calibration';
import type { Alert, AlertSettings, Station, StationHealth, Unit } from '@/shared/schemas';
import { AlertModel, AlertSettingsModel, DeviceTransmissionModel, HeartbeatModel } from '../../db/models/device.model';
import { requireAdmin } from '../clubs/access';
import { memberIdsOf } from '../clubs/clubs.repo';
import { planFor } from '../schedules/plan';
import * as schedulesRepo from '../schedules/schedules.repo';
import { findByOwners } from '../stations/stations.repo';
import { getFor as getStation } from '../stations/stations.service';
import * as unitsRepo from '../units/units.repo';
import { hasToken } from './tokens.service';

/** A device counts as online while its last heartbeat is this recent (DEVICE_OFFLINE_AFTER_S). */
let onlineWithinMs = 5 * 60_000;
export function setOfflineAfter(seconds: number) {
  onlineWithinMs = seconds * 1000;
}
/** The temperature a calibration is assumed to be made at (common practice, no source). */
export const REFERENCE_TEMP_C = 20;
export const DEFAULT_SETTINGS: AlertSettings = { silentMinutes: 30, clockOffsetMs: 1000 };

export async function settingsOf(stationId: number): Promise<AlertSettings> {
  const row = await AlertSettingsModel.findByPk(stationId);
  return row ? { silentMinutes: row.silentMinutes, clockOffsetMs: row.clockOffsetMs } : DEFAULT_SETTINGS;
}

export const toAlert = (row: AlertModel): Alert => ({
  id: row.id,
  stationId: row.stationId,
  rule: row.rule as Alert['rule'],
  message: row.message,
  openedAt: row.openedAt.toISOString(),
  lastSeenAt: row.lastSeenAt.toISOString(),
  resolvedAt: row.resolvedAt?.toISOString() ?? null,
});

/** Largest frequency change the temperature implies on the station's enabled bands. */
export function driftFor(station: Station, unit: Unit | null, temperatureC: number | null): number | null {
  if (!unit || temperatureC === null) return null;
  if (unit.disciplined) return 0;
  if (unit.tempCoPpmPerC === null) return null;
  const carriers = station.bands
    .filter((b) => b.enabled)
    .map((b) => bandFor(b.bandId, station.region))
    .flatMap((r) => (r.ok ? [r.band.dialHz + station.audioOffsetHz] : []));
  if (carriers.length === 0) return null;
  return Math.max(...carriers.map((f) => Math.abs(thermalDriftHz(f, unit.tempCoPpmPerC!, temperatureC - REFERENCE_TEMP_C))));
}

async function healthOf(station: Station, nowMs: number): Promise<StationHealth> {
  const since = new Date(nowMs - 86_400_000);
  const [beats, sent, alerts, settings, device, unit, schedule] = await Promise.all([
    HeartbeatModel.findAll({ where: { stationId: station.id, receivedAt: { [Op.gte]: since } }, order: [['receivedAt', 'ASC']] }),
    DeviceTransmissionModel.findAll({
      where: { stationId: station.id, startedAt: { [Op.gte]: since } },
      order: [['startedAt', 'DESC']],
      limit: 20,
    }),
    AlertModel.findAll({
      where: { stationId: station.id, [Op.or]: [{ resolvedAt: null }, { resolvedAt: { [Op.gte]: since } }] },
      order: [['openedAt', 'DESC']],
    }),
    settingsOf(station.id),
    hasToken(station.id),
    station.unitId === null ? null : unitsRepo.findById(station.unitId),
    schedulesRepo.findByStation(station.id),
  ]);
  const last = beats.at(-1) ?? null;
  const report = last ? (JSON.parse(last.report) as { supplyV?: number | null; firmwareVersion?: string }) : null;
  const plannedStarts = new Set(
    schedule ? planFor(station, unit, schedule, nowMs - 86_400_000, nowMs).transmissions.map((t) => `${t.startMs}|${t.bandId}`) : [],
  );
  // At most one point every 5 minutes keeps the 24-hour series small.
  const series: StationHealth['series'] = [];
  let lastPoint = -Infinity;
  for (const beat of beats) {
    const t = beat.receivedAt.getTime();
    if (t - lastPoint < 5 * 60_000 && beat !== last) continue;
    lastPoint = t;
    series.push({ at: beat.receivedAt.toISOString(), clockOffsetMs: beat.clockOffsetMs, temperatureC: beat.temperatureC });
  }
  const age = last ? nowMs - last.receivedAt.getTime() : null;
  return {
    stationId: station.id,
    stationName: station.name,
    callsign: station.callsign,
    hasDevice: device,
    online: age !== null && age <= onlineWithinMs,
    lastHeartbeatAt: last?.receivedAt.toISOString() ?? null,
    heartbeatAgeS: age === null ? null : Math.round(age / 1000),
    clockOffsetMs: last?.clockOffsetMs ?? null,
    temperatureC: last?.temperatureC ?? null,
    supplyV: report?.supplyV ?? null,
    firmwareVersion: report?.firmwareVersion ?? null,
    driftHz: driftFor(station, unit, last?.temperatureC ?? null),
    series,
    recent: sent.map((t) => ({
      startUtc: t.startedAt.toISOString(),
      bandId: t.bandId,
      planned: plannedStarts.has(`${Math.floor(t.startedAt.getTime() / 1000) * 1000}|${t.bandId}`),
    })),
    alerts: alerts.map(toAlert),
    settings,
  };
}

export async function forStation(user: SessionUser, stationId: number, nowMs = Date.now()) {
  return healthOf(await getStation(user, stationId), nowMs);
}

export async function forClub(user: SessionUser, clubId: number, nowMs = Date.now()) {
  await requireAdmin(user, clubId);
  const stations = await findByOwners(await memberIdsOf(clubId));
  return Promise.all(stations.map((s) => healthOf(s, nowMs)));
}

export async function forOwner(user: SessionUser, nowMs = Date.now()) {
  const stations = await findByOwners([user.id]);
  return Promise.all(stations.map((s) => healthOf(s, nowMs)));
}

export async function saveSettings(stationId: number, settings: AlertSettings) {
  await AlertSettingsModel.upsert({ stationId, ...settings });
}
