/**
 * Reads for the analyses: a station's reports grouped per receiver and hour (comparisons), and the club's
 * stations, listening posts and what those posts heard (the club's reach); heard errors (calibration from reports, stability).
 */
import { QueryTypes, type Sequelize } from 'sequelize';
import type { BandId } from '@/shared/domain/bands';
import type { SideCell } from '@/shared/domain/reception/comparison';

const sqlTime = (ms: number) => new Date(ms).toISOString().slice(0, 23).replace('T', ' ');

/** 'same-time': the UTC hour since 2000-01-01; 'hour-of-day': 0–23. */
export type HourKeying = 'same-time' | 'hour-of-day';
const HOUR_KEY: Record<HourKeying, string> = {
  'same-time': "TIMESTAMPDIFF(HOUR, '2000-01-01 00:00:00', r.slotStart)",
  'hour-of-day': 'HOUR(r.slotStart)',
};

/**
 * One row per receiver and hour: the count and mean SNR referred to 1 W of the station's reports on the band
 * (through reports_station_time). Reports without a power are counted apart and left out.
 */
export async function comparisonCells(
  sequelize: Sequelize,
  stationId: number,
  span: { fromMs: number; toMs: number; bandId: BandId },
  keying: HourKeying,
): Promise<{ cells: SideCell[]; withoutPower: number }> {
  const replacements = [stationId, sqlTime(span.fromMs), sqlTime(span.toMs), span.bandId];
  const where = 'r.stationId = ? AND r.slotStart >= ? AND r.slotStart < ? AND r.bandId = ?';
  const [rows, missing] = await Promise.all([
    // numbers may arrive as strings (DECIMAL averages): converted below
    sequelize.query<SideCell>(
      `SELECT r.rxCallsign, MAX(r.rxLocator) AS rxLocator, ${HOUR_KEY[keying]} AS hourKey, COUNT(*) AS reports,
              AVG(r.snrDb - (r.txPowerDbm - 30)) AS snrWattDb, MIN(r.distanceKm) AS distanceKm, MIN(r.bearingDeg) AS bearingDeg
         FROM reception_reports r
        WHERE ${where} AND r.txPowerDbm IS NOT NULL
        GROUP BY r.rxCallsign, hourKey`,
      { replacements, type: QueryTypes.SELECT },
    ),
    sequelize.query<{ n: number }>(`SELECT COUNT(*) AS n FROM reception_reports r WHERE ${where} AND r.txPowerDbm IS NULL`, {
      replacements,
      type: QueryTypes.SELECT,
    }),
  ]);
  return {
    cells: rows.map((r) => ({
      rxCallsign: r.rxCallsign,
      rxLocator: r.rxLocator,
      hourKey: Number(r.hourKey),
      reports: Number(r.reports),
      snrWattDb: Number(r.snrWattDb),
      distanceKm: r.distanceKm === null ? null : Number(r.distanceKm),
      bearingDeg: r.bearingDeg === null ? null : Number(r.bearingDeg),
    })),
    withoutPower: Number(missing[0]?.n ?? 0),
  };
}

/** A station or a listening post with its owner's name. */
export type Owned = { id: number; name: string; callsign: string; locator: string; ownerId: number; ownerName: string };

/** The stations or listening posts of some people, with the owner's name, in name order. */
export async function ownedBy(sequelize: Sequelize, table: 'stations' | 'listening_posts', ownerIds: number[]): Promise<Owned[]> {
  if (ownerIds.length === 0) return [];
  return sequelize.query<Owned>(
    `SELECT t.id, t.name, t.callsign, t.locator, t.ownerId, u.displayName AS ownerName
       FROM ${table} t JOIN users u ON u.id = t.ownerId
      WHERE t.ownerId IN (?) ORDER BY t.name, t.id`,
    { replacements: [ownerIds], type: QueryTypes.SELECT },
  );
}

export type PostHeardRow = { postId: number; reports: number; transmitters: number; furthestKm: number | null; bands: BandId[] };

/** What each post heard in the period (through reports_importer_time: a post's reports are its owner's imports). */
export async function heardByPosts(
  sequelize: Sequelize,
  posts: { id: number; ownerId: number }[],
  span: { fromMs: number; toMs: number },
): Promise<Map<number, PostHeardRow>> {
  const out = new Map<number, PostHeardRow>();
  if (posts.length === 0) return out;
  const rows = await sequelize.query<{
    postId: number;
    reports: number;
    transmitters: number;
    furthestKm: number | null;
    bands: string | null;
  }>(
    `SELECT b.listeningPostId AS postId, COUNT(*) AS reports, COUNT(DISTINCT r.txCallsign) AS transmitters,
            MAX(r.distanceKm) AS furthestKm, GROUP_CONCAT(DISTINCT r.bandId ORDER BY r.bandId) AS bands
       FROM reception_reports r JOIN reception_batches b ON b.id = r.batchId
      WHERE r.importerId IN (?) AND r.slotStart >= ? AND r.slotStart < ? AND b.listeningPostId IN (?)
      GROUP BY b.listeningPostId`,
    {
      replacements: [[...new Set(posts.map((p) => p.ownerId))], sqlTime(span.fromMs), sqlTime(span.toMs), posts.map((p) => p.id)],
      type: QueryTypes.SELECT,
    },
  );
  for (const r of rows) {
    out.set(Number(r.postId), {
      postId: Number(r.postId),
      reports: Number(r.reports),
      transmitters: Number(r.transmitters),
      furthestKm: r.furthestKm === null ? null : Number(r.furthestKm),
      bands: (r.bands ? r.bands.split(',') : []) as BandId[],
    });
  }
  return out;
}

const utcMs = (value: Date | string) => (value instanceof Date ? value.getTime() : Date.parse(`${String(value).replace(' ', 'T')}Z`));

export type HeardErrorRow = { bandId: string; rxCallsign: string; frequencyErrorHz: number; slotStartMs: number };

/** The heard-frequency errors of a station's reports in [fromMs, toMs) (index reports_station_time). */
export async function heardErrors(sequelize: Sequelize, stationId: number, fromMs: number, toMs: number): Promise<HeardErrorRow[]> {
  const rows = await sequelize.query<{ bandId: string; rxCallsign: string; frequencyErrorHz: number; slotStart: Date | string }>(
    `SELECT bandId, rxCallsign, frequencyErrorHz, slotStart FROM reception_reports
      WHERE stationId = ? AND slotStart >= ? AND slotStart < ? AND frequencyErrorHz IS NOT NULL`,
    { replacements: [stationId, sqlTime(fromMs), sqlTime(toMs)], type: QueryTypes.SELECT },
  );
  return rows.map((r) => ({
    bandId: r.bandId,
    rxCallsign: r.rxCallsign,
    frequencyErrorHz: Number(r.frequencyErrorHz),
    slotStartMs: utcMs(r.slotStart),
  }));
}

/** How many reports of a station were stored with a slot in [fromMs, toMs). */
export async function reportsOfStation(sequelize: Sequelize, stationId: number, fromMs: number, toMs: number): Promise<number> {
  const [row] = await sequelize.query<{ n: number | string }>(
    'SELECT COUNT(*) AS n FROM reception_reports WHERE stationId = ? AND slotStart >= ? AND slotStart < ?',
    { replacements: [stationId, sqlTime(fromMs), sqlTime(toMs)], type: QueryTypes.SELECT },
  );
  return Number(row.n);
}

/** Whether reports of other transmitters on these bands arrived in [fromMs, toMs) (batches by arrival, then their reports). */
export async function othersHeardOn(sequelize: Sequelize, stationId: number, bandIds: string[], fromMs: number, toMs: number) {
  if (bandIds.length === 0) return false;
  const rows = await sequelize.query(
    `SELECT 1 FROM reception_batches b JOIN reception_reports r ON r.batchId = b.id
      WHERE b.receivedAt >= ? AND b.receivedAt < ? AND r.bandId IN (?) AND (r.stationId IS NULL OR r.stationId <> ?) LIMIT 1`,
    { replacements: [sqlTime(fromMs), sqlTime(toMs), bandIds, stationId], type: QueryTypes.SELECT },
  );
  return rows.length > 0;
}

export type HeardSampleRow = { slotStartMs: number; frequencyErrorHz: number; driftHz: number };

/** Heard error and reported drift of a station's reports on one band in [fromMs, toMs), for stability. */
export async function heardSamples(sequelize: Sequelize, stationId: number, bandId: string, fromMs: number, toMs: number) {
  const rows = await sequelize.query<{ slotStart: Date | string; frequencyErrorHz: number; driftHz: number }>(
    `SELECT slotStart, frequencyErrorHz, driftHz FROM reception_reports
      WHERE stationId = ? AND slotStart >= ? AND slotStart < ? AND bandId = ? AND frequencyErrorHz IS NOT NULL`,
    { replacements: [stationId, sqlTime(fromMs), sqlTime(toMs), bandId], type: QueryTypes.SELECT },
  );
  return rows.map((r): HeardSampleRow => ({
    slotStartMs: utcMs(r.slotStart),
    frequencyErrorHz: Number(r.frequencyErrorHz),
    driftHz: Number(r.driftHz),
  }));
}
