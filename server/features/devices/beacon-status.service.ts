import type { SessionUser } from '@/shared/api/contracts';
import { bandFor } from '@/shared/domain/bands';
import { thermalDriftHz } from '@/shared/domain/calibration';
import type { Alert, AlertSettings, Station, StationHealth, Unit } from '@/shared/schemas';
import { memberIdsOf, requireAdmin } from '../clubs/access';
import { planFor } from '../schedules/plan';
import { planInputsOf } from '../schedules/schedules.service';
import { getFor as getStation, stationsOfOwners } from '../stations/stations.service';
import * as alerts from './alerts.repo';
import * as heartbeats from './heartbeats.repo';
import { hasToken } from './tokens.service';
import * as transmissions from './transmissions.repo';

/** How a status is read: a device counts as online while its last heartbeat is at most `offlineAfterS` old. */
export type StatusOptions = { offlineAfterS: number; nowMs?: number };
/** The temperature a calibration is assumed to be made at (common practice, no source). */
export const REFERENCE_TEMP_C = 20;
export const DEFAULT_SETTINGS: AlertSettings = { silentMinutes: 30, clockOffsetMs: 1000 };

export async function settingsOf(stationId: number): Promise<AlertSettings> {
  const row = await alerts.findSettings(stationId);
  return row ? { silentMinutes: row.silentMinutes, clockOffsetMs: row.clockOffsetMs } : DEFAULT_SETTINGS;
}

export const toAlert = (row: alerts.AlertRow): Alert => ({
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

async function statusOf(station: Station, { offlineAfterS, nowMs = Date.now() }: StatusOptions): Promise<StationHealth> {
  const since = new Date(nowMs - 86_400_000);
  const [beats, sent, recentAlerts, settings, device, { unit, schedule }] = await Promise.all([
    heartbeats.findSince(station.id, since),
    transmissions.findRecent(station.id, since, 20),
    alerts.findRecent(station.id, since),
    settingsOf(station.id),
    hasToken(station.id),
    planInputsOf(station),
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
    online: age !== null && age <= offlineAfterS * 1000,
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
    alerts: recentAlerts.map(toAlert),
    settings,
  };
}

export async function forStation(user: SessionUser, stationId: number, options: StatusOptions) {
  return statusOf(await getStation(user, stationId), options);
}

async function forOwners(ownerIds: number[], options: StatusOptions) {
  const stations = await stationsOfOwners(ownerIds);
  const sameMoment = { ...options, nowMs: options.nowMs ?? Date.now() };
  return Promise.all(stations.map((s) => statusOf(s, sameMoment)));
}

export async function forClub(user: SessionUser, clubId: number, options: StatusOptions) {
  await requireAdmin(user, clubId);
  return forOwners(await memberIdsOf(clubId), options);
}

export const forOwner = (user: SessionUser, options: StatusOptions) => forOwners([user.id], options);

export const saveSettings = alerts.saveSettings;
