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
