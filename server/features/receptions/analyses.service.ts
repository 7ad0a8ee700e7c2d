/** The analyses of reception reports: side-by-side comparisons and a club's reach, with the same visibility rules as the results. */
import type { Sequelize } from 'sequelize';
import type { ClubReach, Comparison } from '@/shared/api/analyses';
import type { SessionUser } from '@/shared/api/contracts';
import type { ReachReceiver } from '@/shared/api/receptions';
import type { BandId } from '@/shared/domain/bands';
import { locatorToLatLon } from '@/shared/domain/locator';
import { compareCells } from '@/shared/domain/reception/comparison';
import { MAX_COMPARISON_DAYS, type ClubReachQuery, type ComparisonQuery } from '@/shared/schemas/comparison';
import { AppError } from '../../lib/app-error';
import { memberIdsOf, requireAdmin } from '../clubs/access';
import * as repo from './analyses.repo';
import * as readings from './readings.repo';
import { periodOf, readableStation } from './receptions.service';

const DAY_MS = 86_400_000;
/** How many one-side receivers a comparison lists (the rest are counted). */
const ONE_SIDE_LIST = 100;

type Span = { fromMs: number; toMs: number };

/** One side's span: given in full, or ending now / lasting 7 days; at most MAX_COMPARISON_DAYS. */
function spanOf(fromText: string | undefined, toText: string | undefined, nowMs: number, fromField: string): Span {
  const toMs = toText ? Date.parse(toText) : nowMs;
  const fromMs = fromText ? Date.parse(fromText) : toMs - 7 * DAY_MS;
  if (!(fromMs < toMs))
    throw new AppError('bad-request', 'The start must come before the end', { [fromField]: 'Choose a start before the end' });
  if (toMs - fromMs > MAX_COMPARISON_DAYS * DAY_MS) {
    throw new AppError('bad-request', `A comparison covers at most ${MAX_COMPARISON_DAYS} days`, {
      [fromField]: `Choose a period of at most ${MAX_COMPARISON_DAYS} days`,
    });
  }
  return { fromMs, toMs };
}

const iso = (ms: number) => new Date(ms).toISOString();

/** Compares B with A on common ground (same receiver, same UTC hour or hour of day, SNR per watt). Both must be readable, else 404. */
export async function compare(sequelize: Sequelize, user: SessionUser, query: ComparisonQuery, nowMs: number): Promise<Comparison> {
  const twoPeriods = query.aFrom !== undefined;
  const spanA = twoPeriods ? spanOf(query.aFrom, query.aTo, nowMs, 'aFrom') : spanOf(query.from, query.to, nowMs, 'from');
  const spanB = twoPeriods ? spanOf(query.bFrom, query.bTo, nowMs, 'bFrom') : spanA;
  const stationA = await readableStation(sequelize, user, query.a);
  const stationB = await readableStation(sequelize, user, query.b);
  const keying = twoPeriods ? 'hour-of-day' : 'same-time';
  const [sideA, sideB] = await Promise.all([
    repo.comparisonCells(sequelize, query.a, { ...spanA, bandId: query.band }, keying),
    repo.comparisonCells(sequelize, query.b, { ...spanB, bandId: query.band }, keying),
  ]);
  const figures = compareCells(sideA.cells, sideB.cells);
  const side = (stationId: number, station: typeof stationA, span: Span) => ({
    stationId,
    name: station.name,
    callsign: station.callsign,
    locator: station.locator,
    from: iso(span.fromMs),
    to: iso(span.toMs),
  });
  return {
    ...figures,
    onlyA: figures.onlyA.slice(0, ONE_SIDE_LIST),
    onlyB: figures.onlyB.slice(0, ONE_SIDE_LIST),
    onlyAMore: Math.max(0, figures.onlyA.length - ONE_SIDE_LIST),
    onlyBMore: Math.max(0, figures.onlyB.length - ONE_SIDE_LIST),
    mode: twoPeriods ? 'two-periods' : 'same-time',
    bandId: query.band,
    a: side(query.a, stationA, spanA),
    b: side(query.b, stationB, spanB),
    withoutPower: sideA.withoutPower + sideB.withoutPower,
  };
}

const latLonOf = (locator: string) => {
  const found = locatorToLatLon(locator);
  return found.ok ? { lat: found.lat, lon: found.lon } : null;
};

/** Receivers of all the club's stations on one map: each at its furthest distance from any member station. */
function mergeReceivers(perStation: readings.ReceiverBandFigures[][]): ReachReceiver[] {
  const byCallsign = new Map<string, ReachReceiver>();
  for (const r of perStation.flat()) {
    const seen = byCallsign.get(r.rxCallsign);
    const lastHeardUtc = iso(r.lastSlotMs);
    if (!seen) {
      const at = latLonOf(r.rxLocator);
      byCallsign.set(r.rxCallsign, {
        callsign: r.rxCallsign,
        locator: r.rxLocator,
        lat: at?.lat ?? 0,
        lon: at?.lon ?? 0,
        distanceKm: r.distanceKm ?? 0,
        bearingDeg: r.bearingDeg ?? 0,
        reports: r.reports,
        bestSnrDb: r.bestSnrDb,
        bands: [r.bandId],
        lastHeardUtc,
      });
      continue;
    }
    seen.reports += r.reports;
    seen.bestSnrDb = Math.max(seen.bestSnrDb, r.bestSnrDb);
    if (!seen.bands.includes(r.bandId)) seen.bands.push(r.bandId);
    if (lastHeardUtc > seen.lastHeardUtc) seen.lastHeardUtc = lastHeardUtc;
    if (r.distanceKm !== null && r.distanceKm > seen.distanceKm) {
      seen.distanceKm = r.distanceKm;
      seen.bearingDeg = r.bearingDeg ?? seen.bearingDeg;
    }
  }
  return [...byCallsign.values()].sort((x, y) => y.distanceKm - x.distanceKm);
}

const maxOrNull = (values: (number | null)[]) => {
  const present = values.filter((v): v is number => v !== null);
  return present.length ? Math.max(...present) : null;
};

/** For a club's admins: what the members' stations reached, what their listening posts heard, and which bands were open by UTC hour. */
export async function clubReach(
  sequelize: Sequelize,
  user: SessionUser,
  clubId: number,
  query: ClubReachQuery,
  nowMs: number,
): Promise<ClubReach> {
  const { club } = await requireAdmin(user, clubId);
  const toMs = query.to ? Date.parse(query.to) : nowMs;
  const period = periodOf({ from: query.from ?? iso(toMs - 7 * DAY_MS), to: iso(toMs), band: undefined }, nowMs);
  const memberIds = await memberIdsOf(clubId);
  const [stations, posts] = await Promise.all([
    repo.ownedBy(sequelize, 'stations', memberIds),
    repo.ownedBy(sequelize, 'listening_posts', memberIds),
  ]);
  const [receivers, slots, heard] = await Promise.all([
    Promise.all(stations.map((s) => readings.receiverFigures(sequelize, s.id, period))),
    Promise.all(stations.map((s) => readings.slotFigures(sequelize, s.id, period))),
    repo.heardByPosts(sequelize, posts, period),
  ]);
  const hourBand = new Map<string, { hour: number; bandId: BandId; reports: number }>();
  for (const h of slots.flatMap((s) => s.hourBand)) {
    const key = `${h.hour}|${h.bandId}`;
    const seen = hourBand.get(key);
    if (seen) seen.reports += h.reports;
    else hourBand.set(key, { hour: h.hour, bandId: h.bandId, reports: h.reports });
  }
  const stationRows = stations.map((s, i) => ({
    stationId: s.id,
    name: s.name,
    callsign: s.callsign,
    locator: s.locator,
    ownerName: s.ownerName,
    reports: slots[i].hourBand.reduce((sum, h) => sum + h.reports, 0),
    receivers: new Set(receivers[i].map((r) => r.rxCallsign)).size,
    furthestKm: maxOrNull(receivers[i].map((r) => r.distanceKm)),
  }));
  const centreStation = stations.find((s) => latLonOf(s.locator) !== null);
  const mapReceivers = mergeReceivers(receivers);
  return {
    clubId,
    clubName: club.name,
    from: iso(period.fromMs),
    to: iso(period.toMs),
    centre: centreStation
      ? { callsign: centreStation.callsign, locator: centreStation.locator, ...latLonOf(centreStation.locator)! }
      : null,
    reports: stationRows.reduce((sum, s) => sum + s.reports, 0),
    receivers: mapReceivers.length,
    furthestKm: maxOrNull(stationRows.map((s) => s.furthestKm)),
    mapReceivers,
    stations: stationRows,
    posts: posts.map((p) => {
      const found = heard.get(p.id);
      return {
        postId: p.id,
        name: p.name,
        callsign: p.callsign,
        locator: p.locator,
        ownerName: p.ownerName,
        reports: found?.reports ?? 0,
        transmitters: found?.transmitters ?? 0,
        furthestKm: found?.furthestKm ?? null,
        bands: found?.bands ?? [],
      };
    }),
    hourBand: [...hourBand.values()].sort((x, y) => x.hour - y.hour || x.bandId.localeCompare(y.bandId)),
  };
}
