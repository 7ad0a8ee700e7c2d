/**
 * Reading reception data. Lists of reports read reception_reports through (stationId, slotStart) or
 * (importerId, slotStart); every figure (counts, reach, the overview) reads only the aggregate tables.
 */
import { QueryTypes, type Sequelize, type Transaction } from 'sequelize';
import type { ReceptionReport } from '@/shared/api/receptions';
import type { BandId } from '@/shared/domain/bands';
import { ListeningPostModel } from '../../db/models/listening-post.model';

export type Period = { fromMs: number; toMs: number; bandId: BandId | null };
/** Whose reports: a station's, or everything some people brought in. */
export type Scope = { stationId: number } | { importerIds: number[] };
export type SortKey = 'time' | 'distance' | 'snr' | 'band' | 'receiver';

const SORT_COLUMN: Record<SortKey, string> = {
  time: 'r.slotStart',
  distance: 'r.distanceKm',
  snr: 'r.snrDb',
  band: 'r.bandId',
  receiver: 'r.rxCallsign',
};

const sqlTime = (ms: number) => new Date(ms).toISOString().slice(0, 23).replace('T', ' ');
const sqlDay = (ms: number) => new Date(ms).toISOString().slice(0, 10);
const utcMs = (value: Date | string) => (value instanceof Date ? value.getTime() : Date.parse(`${String(value).replace(' ', 'T')}Z`));

type ReportRow = {
  id: number | string;
  slotStart: Date | string;
  bandId: string;
  txCallsign: string;
  txLocator: string | null;
  txPowerDbm: number | null;
  rxCallsign: string;
  rxLocator: string;
  snrDb: number;
  frequencyHz: number;
  driftHz: number;
  distanceKm: number | null;
  bearingDeg: number | null;
  frequencyErrorHz: number | null;
  stationId: number | null;
  ambiguous: number | boolean;
  listeningPostId: number | null;
  importId: number | null;
  postName: string | null;
};

function toReport(r: ReportRow): ReceptionReport {
  return {
    id: Number(r.id),
    slotUtc: new Date(utcMs(r.slotStart)).toISOString(),
    bandId: r.bandId as BandId,
    txCallsign: r.txCallsign,
    txLocator: r.txLocator,
    txPowerDbm: r.txPowerDbm,
    rxCallsign: r.rxCallsign,
    rxLocator: r.rxLocator,
    snrDb: r.snrDb,
    frequencyHz: r.frequencyHz,
    driftHz: r.driftHz,
    distanceKm: r.distanceKm,
    bearingDeg: r.bearingDeg,
    frequencyErrorHz: r.frequencyErrorHz,
    stationId: r.stationId,
    ambiguous: Boolean(r.ambiguous),
    source:
      r.listeningPostId !== null
        ? { kind: 'listening-post', id: r.listeningPostId, name: r.postName ?? `Listening post ${r.listeningPostId} (deleted)` }
        : { kind: 'import', id: r.importId, name: r.importId === null ? 'Brought in' : `Import ${r.importId}` },
  };
}

function whereOf(scope: Scope, period: Period) {
  const clauses: string[] = [];
  const replacements: unknown[] = [];
  if ('stationId' in scope) {
    clauses.push('r.stationId = ?');
    replacements.push(scope.stationId);
  } else {
    clauses.push('r.importerId IN (?)');
    replacements.push(scope.importerIds.length ? scope.importerIds : [0]);
  }
  clauses.push('r.slotStart >= ?', 'r.slotStart < ?');
  replacements.push(sqlTime(period.fromMs), sqlTime(period.toMs));
  if (period.bandId) {
    clauses.push('r.bandId = ?');
    replacements.push(period.bandId);
  }
  return { where: clauses.join(' AND '), replacements };
}

const SELECT_REPORTS = `SELECT r.id, r.slotStart, r.bandId, r.txCallsign, r.txLocator, r.txPowerDbm, r.rxCallsign, r.rxLocator, r.snrDb,
    r.frequencyHz, r.driftHz, r.distanceKm, r.bearingDeg, r.frequencyErrorHz, r.stationId, r.ambiguous,
    b.listeningPostId, b.importId, lp.name AS postName
  FROM reception_reports r
  JOIN reception_batches b ON b.id = r.batchId
  LEFT JOIN listening_posts lp ON lp.id = b.listeningPostId`;

/** How many reports a scope has in the period: a station's from the per-slot aggregate, an importer's by index range. */
export async function countReports(sequelize: Sequelize, scope: Scope, period: Period): Promise<number> {
  if ('stationId' in scope) {
    const figures = await slotFigures(sequelize, scope.stationId, period);
    return figures.hourBand.reduce((sum, h) => sum + h.reports, 0);
  }
  const { where, replacements } = whereOf(scope, period);
  const rows = await sequelize.query<{ n: number }>(`SELECT COUNT(*) AS n FROM reception_reports r WHERE ${where}`, {
    replacements,
    type: QueryTypes.SELECT,
  });
  return Number(rows[0]?.n ?? 0);
}

export async function pageOfReports(
  sequelize: Sequelize,
  scope: Scope,
  period: Period,
  page: { page: number; pageSize: number; sort: SortKey; order: 'asc' | 'desc' },
): Promise<ReceptionReport[]> {
  const { where, replacements } = whereOf(scope, period);
  const direction = page.order === 'asc' ? 'ASC' : 'DESC';
  const rows = await sequelize.query<ReportRow>(
    `${SELECT_REPORTS} WHERE ${where} ORDER BY ${SORT_COLUMN[page.sort]} ${direction}, r.id ${direction} LIMIT ? OFFSET ?`,
    { replacements: [...replacements, page.pageSize, (page.page - 1) * page.pageSize], type: QueryTypes.SELECT },
  );
  return rows.map(toReport);
}

/** Every report of the period, oldest first, a chunk at a time (keyset paging: memory stays flat however many). */
export async function* allReports(sequelize: Sequelize, scope: Scope, period: Period, chunk = 5000): AsyncGenerator<ReceptionReport[]> {
  const { where, replacements } = whereOf(scope, period);
  let after: { slotStart: string; id: number } | null = null;
  for (;;) {
    const keyset: string = after ? ' AND (r.slotStart > ? OR (r.slotStart = ? AND r.id > ?))' : '';
    const keyValues: unknown[] = after ? [after.slotStart, after.slotStart, after.id] : [];
    const rows: ReportRow[] = await sequelize.query<ReportRow>(
      `${SELECT_REPORTS} WHERE ${where}${keyset} ORDER BY r.slotStart ASC, r.id ASC LIMIT ?`,
      { replacements: [...replacements, ...keyValues, chunk], type: QueryTypes.SELECT },
    );
    if (rows.length === 0) return;
    const reports = rows.map(toReport);
    yield reports;
    if (rows.length < chunk) return;
    const last = reports[reports.length - 1];
    after = { slotStart: sqlTime(Date.parse(last.slotUtc)), id: last.id };
  }
}

export type SlotFigures = { hourBand: { hour: number; bandId: BandId; reports: number; slots: number; bestSnrDb: number }[] };

type HourBandRow = { hour: number; bandId: string; reports: number; slots: number; bestSnrDb: number };
const HOUR_MS = 3_600_000;

/** One aggregate's rows per UTC hour of day and band over [fromMs, toMs). */
async function hourBandRows(
  sequelize: Sequelize,
  table: 'reception_slot_counts' | 'reception_hour_counts',
  stationId: number,
  period: Period,
  fromMs: number,
  toMs: number,
) {
  if (fromMs >= toMs) return [];
  const [time, slots] = table === 'reception_slot_counts' ? ['slotStart', 'COUNT(*)'] : ['hourStart', 'SUM(slots)'];
  const band = period.bandId ? ' AND bandId = ?' : '';
  return sequelize.query<HourBandRow>(
    `SELECT HOUR(${time}) AS hour, bandId, SUM(reports) AS reports, ${slots} AS slots, MAX(bestSnrDb) AS bestSnrDb
       FROM ${table} WHERE stationId = ? AND ${time} >= ? AND ${time} < ?${band}
      GROUP BY HOUR(${time}), bandId`,
    { replacements: [stationId, sqlTime(fromMs), sqlTime(toMs), ...(period.bandId ? [period.bandId] : [])], type: QueryTypes.SELECT },
  );
}

/**
 * Reports, heard slots and best SNR per UTC hour and band. Whole hours come from the per-hour aggregate, the
 * period's partial first and last hours from the per-slot one, so a year reads about 30 times fewer rows.
 */
export async function slotFigures(sequelize: Sequelize, stationId: number, period: Period): Promise<SlotFigures> {
  const innerFrom = Math.ceil(period.fromMs / HOUR_MS) * HOUR_MS;
  const innerTo = Math.max(innerFrom, Math.floor(period.toMs / HOUR_MS) * HOUR_MS);
  const parts =
    innerFrom >= period.toMs
      ? [hourBandRows(sequelize, 'reception_slot_counts', stationId, period, period.fromMs, period.toMs)]
      : [
          hourBandRows(sequelize, 'reception_slot_counts', stationId, period, period.fromMs, innerFrom),
          hourBandRows(sequelize, 'reception_hour_counts', stationId, period, innerFrom, innerTo),
          hourBandRows(sequelize, 'reception_slot_counts', stationId, period, innerTo, period.toMs),
        ];
  const merged = new Map<string, SlotFigures['hourBand'][number]>();
  for (const row of (await Promise.all(parts)).flat()) {
    const key = `${row.hour} ${row.bandId}`;
    const seen = merged.get(key);
    merged.set(key, {
      hour: Number(row.hour),
      bandId: row.bandId as BandId,
      reports: Number(row.reports) + (seen?.reports ?? 0),
      slots: Number(row.slots) + (seen?.slots ?? 0),
      bestSnrDb: Math.max(Number(row.bestSnrDb), seen?.bestSnrDb ?? -Infinity),
    });
  }
  return { hourBand: [...merged.values()] };
}

export type ReceiverBandFigures = {
  rxCallsign: string;
  rxLocator: string;
  bandId: BandId;
  distanceKm: number | null;
  bearingDeg: number | null;
  reports: number;
  bestSnrDb: number;
  bestSnrPerWattDb: number | null;
  bestKmPerWatt: number | null;
  lastSlotMs: number;
};

/**
 * Per receiver and band over the period's UTC days, from the per-receiver-day aggregate. Receivers whose last
 * report of a day came before the period's start are left out, so "who heard it" is exact to the slot.
 */
export async function receiverFigures(sequelize: Sequelize, stationId: number, period: Period): Promise<ReceiverBandFigures[]> {
  const band = period.bandId ? ' AND bandId = ?' : '';
  const rows = await sequelize.query<{
    rxCallsign: string;
    rxLocator: string;
    bandId: string;
    distanceKm: number | null;
    bearingDeg: number | null;
    reports: number;
    bestSnrDb: number;
    bestSnrPerWattDb: number | null;
    bestKmPerWatt: number | null;
    lastSlotStart: Date | string;
  }>(
    `SELECT rxCallsign, SUBSTRING_INDEX(GROUP_CONCAT(rxLocator ORDER BY day DESC), ',', 1) AS rxLocator, bandId,
            MAX(distanceKm) AS distanceKm, MAX(bearingDeg) AS bearingDeg, SUM(reports) AS reports, MAX(bestSnrDb) AS bestSnrDb,
            MAX(bestSnrPerWattDb) AS bestSnrPerWattDb, MAX(bestKmPerWatt) AS bestKmPerWatt, MAX(lastSlotStart) AS lastSlotStart
       FROM reception_receiver_days
      WHERE stationId = ? AND day >= ? AND day <= ? AND lastSlotStart >= ?${band}
      GROUP BY rxCallsign, bandId`,
    {
      replacements: [
        stationId,
        sqlDay(period.fromMs),
        sqlDay(period.toMs - 1),
        sqlTime(period.fromMs),
        ...(period.bandId ? [period.bandId] : []),
      ],
      type: QueryTypes.SELECT,
    },
  );
  return rows.map((r) => ({
    rxCallsign: r.rxCallsign,
    rxLocator: r.rxLocator,
    bandId: r.bandId as BandId,
    distanceKm: r.distanceKm === null ? null : Number(r.distanceKm),
    bearingDeg: r.bearingDeg === null ? null : Number(r.bearingDeg),
    reports: Number(r.reports),
    bestSnrDb: Number(r.bestSnrDb),
    bestSnrPerWattDb: r.bestSnrPerWattDb === null ? null : Number(r.bestSnrPerWattDb),
    bestKmPerWatt: r.bestKmPerWatt === null ? null : Number(r.bestKmPerWatt),
    lastSlotMs: utcMs(r.lastSlotStart),
  }));
}

export type GlanceFigures = {
  stationId: number;
  reports: number;
  receivers: number;
  furthestKm: number | null;
};

/** The overview's last-24-hours line for many stations at once (two grouped reads of the aggregates). */
export async function recentFigures(sequelize: Sequelize, stationIds: number[], sinceMs: number): Promise<Map<number, GlanceFigures>> {
  const out = new Map<number, GlanceFigures>();
  if (stationIds.length === 0) return out;
  for (const id of stationIds) out.set(id, { stationId: id, reports: 0, receivers: 0, furthestKm: null });
  const [slots, receivers] = await Promise.all([
    sequelize.query<{ stationId: number; reports: number }>(
      `SELECT stationId, SUM(reports) AS reports FROM reception_slot_counts
        WHERE stationId IN (?) AND slotStart >= ? GROUP BY stationId`,
      { replacements: [stationIds, sqlTime(sinceMs)], type: QueryTypes.SELECT },
    ),
    sequelize.query<{ stationId: number; receivers: number; furthestKm: number | null }>(
      `SELECT stationId, COUNT(DISTINCT rxCallsign) AS receivers, MAX(distanceKm) AS furthestKm FROM reception_receiver_days
        WHERE stationId IN (?) AND day >= ? AND lastSlotStart >= ? GROUP BY stationId`,
      { replacements: [stationIds, sqlDay(sinceMs), sqlTime(sinceMs)], type: QueryTypes.SELECT },
    ),
  ]);
  for (const s of slots) out.get(s.stationId)!.reports = Number(s.reports);
  for (const r of receivers) {
    const figures = out.get(r.stationId)!;
    figures.receivers = Number(r.receivers);
    figures.furthestKm = r.furthestKm === null ? null : Number(r.furthestKm);
  }
  return out;
}

/** The latest receiver-day of each station: who heard it last, when and how far. */
export async function lastHeard(sequelize: Sequelize, stationIds: number[]) {
  const out = new Map<number, { slotUtc: string; rxCallsign: string; distanceKm: number | null }>();
  if (stationIds.length === 0) return out;
  const rows = await sequelize.query<{ stationId: number; rxCallsign: string; distanceKm: number | null; lastSlotStart: Date | string }>(
    `SELECT d.stationId, d.rxCallsign, d.distanceKm, d.lastSlotStart
       FROM reception_receiver_days d
       JOIN (SELECT stationId, MAX(day) AS day FROM reception_receiver_days WHERE stationId IN (?) GROUP BY stationId) latest
         ON latest.stationId = d.stationId AND latest.day = d.day
      ORDER BY d.lastSlotStart DESC`,
    { replacements: [stationIds], type: QueryTypes.SELECT },
  );
  for (const r of rows) {
    if (out.has(r.stationId)) continue;
    out.set(r.stationId, {
      slotUtc: new Date(utcMs(r.lastSlotStart)).toISOString(),
      rxCallsign: r.rxCallsign,
      distanceKm: r.distanceKm === null ? null : Number(r.distanceKm),
    });
  }
  return out;
}

/** A deleted station's aggregates go with it (its reports stay, still listed for whoever brought them in). */
export async function forgetStationAggregates(stationId: number, transaction?: Transaction) {
  const sequelize = ListeningPostModel.sequelize!;
  const options = { replacements: [stationId], transaction };
  await sequelize.query('DELETE FROM reception_slot_counts WHERE stationId = ?', options);
  await sequelize.query('DELETE FROM reception_hour_counts WHERE stationId = ?', options);
  await sequelize.query('DELETE FROM reception_receiver_days WHERE stationId = ?', options);
}
