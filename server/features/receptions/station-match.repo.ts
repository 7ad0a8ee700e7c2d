/** Which of our stations could have sent a decode: same callsign, the band enabled, on the air by then. */
import { QueryTypes, type Sequelize } from 'sequelize';

export type MatchCandidate = { stationId: number; ownerId: number; callsign: string; bandId: string; createdAtMs: number };

export async function candidatesFor(sequelize: Sequelize, callsigns: string[]): Promise<MatchCandidate[]> {
  if (callsigns.length === 0) return [];
  const rows = await sequelize.query<{ stationId: number; ownerId: number; callsign: string; bandId: string; createdAt: Date }>(
    `SELECT s.id AS stationId, s.ownerId, s.callsign, b.bandId, s.createdAt
       FROM stations s JOIN station_bands b ON b.stationId = s.id AND b.enabled = 1
      WHERE s.callsign IN (?)`,
    { replacements: [callsigns], type: QueryTypes.SELECT },
  );
  return rows.map((r) => ({ ...r, createdAtMs: new Date(r.createdAt).getTime() }));
}
