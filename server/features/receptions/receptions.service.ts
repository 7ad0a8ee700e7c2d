/** Reading reception data: who may see what, the period rules, reach figures and the overview line per station. */
import type { Sequelize, Transaction } from 'sequelize';
import type { SessionUser } from '@/shared/api/contracts';
import type { Reach, ReachReceiver, ReceptionPage, StationAtAGlance } from '@/shared/api/receptions';
import type { BandId } from '@/shared/domain/bands';
import { locatorToLatLon } from '@/shared/domain/locator';
import type { ReceptionQuery } from '@/shared/schemas';
import { AppError } from '../../lib/app-error';
import { ownerInClubs, stationIdsOf, stationOwner } from './access.repo';
import { forgetPlan, stationPlans } from './plan-cache';
import * as analyses from './analyses.repo';
import * as readings from './readings.repo';

const HOUR_MS = 3_600_000;
const DAY_MS = 24 * HOUR_MS;
/** The longest period one request may ask for. */
export const MAX_PERIOD_MS = 366 * DAY_MS;

/** ?from=&to=&band=: the last 24 hours unless told otherwise; at most a year; all UTC. */
export function periodOf(query: Pick<ReceptionQuery, 'from' | 'to' | 'band'>, nowMs: number): readings.Period {
  const toMs = query.to ? Date.parse(query.to) : nowMs;
  const fromMs = query.from ? Date.parse(query.from) : toMs - DAY_MS;
  if (!(fromMs < toMs)) throw new AppError('bad-request', 'from must come before to', { from: 'Choose a start before the end' });
  if (toMs - fromMs > MAX_PERIOD_MS) {
    throw new AppError('bad-request', 'A period can be at most a year (366 days)', { from: 'Choose a period of at most 366 days' });
  }
  return { fromMs, toMs, bandId: (query.band as BandId | undefined) ?? null };
}

/** A station's reports are read by its owner and the admins of the owner's clubs; anyone else gets a 404. */
export async function readableStation(sequelize: Sequelize, user: SessionUser, stationId: number) {
  const station = await stationOwner(sequelize, stationId);
  if (!station || (station.ownerId !== user.id && !(await ownerInClubs(sequelize, user.adminOfClubIds, station.ownerId)))) {
    throw new AppError('not-found', `Station ${stationId} does not exist`);
  }
  return station;
}

export async function stationReports(sequelize: Sequelize, user: SessionUser, stationId: number, query: ReceptionQuery, nowMs: number) {
  await readableStation(sequelize, user, stationId);
  return pageOf(sequelize, { stationId }, periodOf(query, nowMs), query);
}

async function pageOf(sequelize: Sequelize, scope: readings.Scope, period: readings.Period, query: ReceptionQuery): Promise<ReceptionPage> {
  const [total, reports] = await Promise.all([
    readings.countReports(sequelize, scope, period),
    readings.pageOfReports(sequelize, scope, period, query),
  ]);
  return { reports, total, page: query.page, pageSize: query.pageSize };
}

/** Whose imports the caller may read: their own, or (for a club admin) a member's. */
async function importerScope(sequelize: Sequelize, user: SessionUser, importerId: number | undefined): Promise<readings.Scope> {
  if (importerId === undefined || importerId === user.id) return { importerIds: [user.id] };
  if (!(await ownerInClubs(sequelize, user.adminOfClubIds, importerId))) {
    throw new AppError('not-found', `There are no reports brought in by person ${importerId} that you may read`);
  }
  return { importerIds: [importerId] };
}

/** Everything a person brought in (their listening posts and imports), whichever transmitter it was. */
export async function importedReports(
  sequelize: Sequelize,
  user: SessionUser,
  importerId: number | undefined,
  query: ReceptionQuery,
  nowMs: number,
) {
  return pageOf(sequelize, await importerScope(sequelize, user, importerId), periodOf(query, nowMs), query);
}

/** The whole period for a CSV export, after the same visibility checks as the JSON. */
export async function exportScope(
  sequelize: Sequelize,
  user: SessionUser,
  target: { stationId: number } | { importerId: number | undefined },
  query: ReceptionQuery,
  nowMs: number,
) {
  const period = periodOf(query, nowMs);
  if ('stationId' in target) {
    const station = await readableStation(sequelize, user, target.stationId);
    return { scope: { stationId: target.stationId }, period, label: station.callsign };
  }
  return { scope: await importerScope(sequelize, user, target.importerId), period, label: 'brought-in' };
}

export const reportChunks = (sequelize: Sequelize, scope: readings.Scope, period: readings.Period) =>
  readings.allReports(sequelize, scope, period);

function weightedMedian(values: { value: number; weight: number }[]): number | null {
  if (values.length === 0) return null;
  const sorted = [...values].sort((a, b) => a.value - b.value);
  const total = sorted.reduce((sum, v) => sum + v.weight, 0);
  let seen = 0;
  for (const v of sorted) {
    seen += v.weight;
    if (seen * 2 >= total) return v.value;
  }
  return sorted[sorted.length - 1].value;
}

/** The results screen's figures, from the aggregates and the station's plan only. */
export async function reach(
  sequelize: Sequelize,
  user: SessionUser,
  stationId: number,
  query: ReceptionQuery,
  nowMs: number,
): Promise<Reach> {
  const station = await readableStation(sequelize, user, stationId);
  const period = periodOf(query, nowMs);
  const [slots, receiverBands, plans] = await Promise.all([
    readings.slotFigures(sequelize, stationId, period),
    readings.receiverFigures(sequelize, stationId, period),
    stationPlans(sequelize, [stationId], nowMs),
  ]);
  const stationLatLon = locatorToLatLon(station.locator);
  const planned = plans.get(stationId)?.memo.plannedCount(period.fromMs, period.toMs, period.bandId) ?? 0;
  const heardSlots = slots.hourBand.reduce((sum, h) => sum + h.slots, 0);
  const reports = slots.hourBand.reduce((sum, h) => sum + h.reports, 0);

  const byReceiver = new Map<string, ReachReceiver & { kmPerWatt: number | null; snrPerWattDb: number | null }>();
  for (const r of receiverBands) {
    const at = locatorToLatLon(r.rxLocator);
    let entry = byReceiver.get(r.rxCallsign);
    if (!entry) {
      entry = {
        callsign: r.rxCallsign,
        locator: r.rxLocator,
        lat: at.ok ? at.lat : 0,
        lon: at.ok ? at.lon : 0,
        distanceKm: r.distanceKm ?? 0,
        bearingDeg: r.bearingDeg ?? 0,
        reports: 0,
        bestSnrDb: r.bestSnrDb,
        bands: [],
        lastHeardUtc: new Date(r.lastSlotMs).toISOString(),
        kmPerWatt: null,
        snrPerWattDb: null,
      };
      byReceiver.set(r.rxCallsign, entry);
    }
    entry.reports += r.reports;
    entry.bestSnrDb = Math.max(entry.bestSnrDb, r.bestSnrDb);
    if (!entry.bands.includes(r.bandId)) entry.bands.push(r.bandId);
    if (r.lastSlotMs > Date.parse(entry.lastHeardUtc)) entry.lastHeardUtc = new Date(r.lastSlotMs).toISOString();
    if (r.distanceKm !== null && r.distanceKm > entry.distanceKm) {
      entry.distanceKm = r.distanceKm;
      entry.bearingDeg = r.bearingDeg ?? entry.bearingDeg;
    }
    if (r.bestKmPerWatt !== null) entry.kmPerWatt = Math.max(entry.kmPerWatt ?? -Infinity, r.bestKmPerWatt);
    if (r.bestSnrPerWattDb !== null) entry.snrPerWattDb = Math.max(entry.snrPerWattDb ?? -Infinity, r.bestSnrPerWattDb);
  }
  const receivers = [...byReceiver.values()].sort((a, b) => b.distanceKm - a.distanceKm);
  const withDistance = receiverBands.filter((r) => r.distanceKm !== null);
  const maxOf = (values: (number | null)[]) => {
    const present = values.filter((v): v is number => v !== null);
    return present.length ? Math.max(...present) : null;
  };
  const hourBand = new Map<string, { hour: number; bandId: BandId; reports: number }>();
  for (const h of slots.hourBand) hourBand.set(`${h.hour}|${h.bandId}`, { hour: h.hour, bandId: h.bandId, reports: h.reports });

  return {
    stationId,
    from: new Date(period.fromMs).toISOString(),
    to: new Date(period.toMs).toISOString(),
    bandId: period.bandId,
    station: {
      callsign: station.callsign,
      locator: station.locator,
      lat: stationLatLon.ok ? stationLatLon.lat : 0,
      lon: stationLatLon.ok ? stationLatLon.lon : 0,
    },
    reports,
    receivers: byReceiver.size,
    furthestKm: maxOf(withDistance.map((r) => r.distanceKm)),
    medianKm: weightedMedian(withDistance.map((r) => ({ value: r.distanceKm!, weight: r.reports }))),
    heardShare: planned > 0 ? Math.min(1, heardSlots / planned) : null,
    plannedTransmissions: planned,
    heardTransmissions: Math.min(heardSlots, planned > 0 ? planned : heardSlots),
    bestSnrDb: maxOf(slots.hourBand.map((h) => h.bestSnrDb)),
    bestSnrPerWattDb: maxOf(receivers.map((r) => r.snrPerWattDb)),
    kmPerWatt: maxOf(receivers.map((r) => r.kmPerWatt)),
    mapReceivers: receivers.map(({ kmPerWatt: _k, snrPerWattDb: _s, ...r }) => r),
    hourBand: [...hourBand.values()].sort((a, b) => a.hour - b.hour || a.bandId.localeCompare(b.bandId)),
    snrByDistance: withDistance.map((r) => ({ distanceKm: r.distanceKm!, snrDb: r.bestSnrDb, bandId: r.bandId })),
  };
}

/** The overview line for each of the caller's stations: on the air, next transmission, last heard, last 24 hours. */
export async function atAGlance(sequelize: Sequelize, user: SessionUser, nowMs: number): Promise<StationAtAGlance[]> {
  const ids = await stationIdsOf(sequelize, user.id);
  if (ids.length === 0) return [];
  const [plans, recent, heard] = await Promise.all([
    stationPlans(sequelize, ids, nowMs),
    readings.recentFigures(sequelize, ids, nowMs - DAY_MS),
    readings.lastHeard(sequelize, ids),
  ]);
  return ids.map((stationId) => {
    const plan = plans.get(stationId);
    const next = plan?.memo.next(nowMs);
    const figures = recent.get(stationId)!;
    return {
      stationId,
      transmitting: Boolean(plan?.source.transmitEnabled && plan.plan && plan.plan.blocked.length === 0 && plan.plan.steps.length > 0),
      nextTransmission: next ? { startUtc: new Date(next.startMs).toISOString(), bandId: next.bandId as BandId } : null,
      lastHeard: heard.get(stationId) ?? null,
      last24h: { reports: figures.reports, receivers: figures.receivers, furthestKm: figures.furthestKm },
    };
  });
}

/** Called when a station is deleted, inside its transaction: its aggregates go; its reports stay with their importers. */
export async function forgetStation(stationId: number, transaction?: Transaction) {
  await readings.forgetStationAggregates(stationId, transaction);
  if (transaction) transaction.afterCommit(() => void forgetPlan(stationId));
  else forgetPlan(stationId);
}

/** A station's heard-frequency errors in a period, for the calibration analysis (the caller decides who may see them). */
export const heardErrors = (sequelize: Sequelize, stationId: number, fromMs: number, toMs: number) =>
  analyses.heardErrors(sequelize, stationId, fromMs, toMs);

/** For the report alerts: this station's reports in a period, and whether others on these bands are still being heard. */
export const reportsOfStation = (sequelize: Sequelize, stationId: number, fromMs: number, toMs: number) =>
  analyses.reportsOfStation(sequelize, stationId, fromMs, toMs);
export const othersHeardOn = (sequelize: Sequelize, stationId: number, bandIds: string[], fromMs: number, toMs: number) =>
  analyses.othersHeardOn(sequelize, stationId, bandIds, fromMs, toMs);
export const heardSamples = (sequelize: Sequelize, stationId: number, bandId: string, fromMs: number, toMs: number) =>
  analyses.heardSamples(sequelize, stationId, bandId, fromMs, toMs);
