/** Reads for the analyses of what was heard (calibration from reports). */
import { QueryTypes, type Sequelize } from 'sequelize';

const sqlTime = (ms: number) => new Date(ms).toISOString().slice(0, 23).replace('T', ' ');
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
