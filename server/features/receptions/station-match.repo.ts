/** Which of our stations could have sent a decode (same callsign, the band enabled, on the air by then), and their plans' inputs. */
import { QueryTypes, type Sequelize } from 'sequelize';
import type { BandId, LicenceRegion } from '@/shared/domain/bands';
import type { PlanInput } from '@/shared/domain/schedule';
import { scheduleInput, unitInput } from '@/shared/schemas';

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

/** What the shared plan needs for a station, plus whether it is meant to be on the air. */
export type StationPlanSource = {
  stationId: number;
  ownerId: number;
  name: string;
  callsign: string;
  locator: string;
  transmitEnabled: boolean;
  /** null when the station has no schedule */
  input: PlanInput | null;
};

type StationRow = {
  id: number;
  ownerId: number;
  name: string;
  callsign: string;
  locator: string;
  region: string;
  audioOffsetHz: number;
  transmitEnabled: number | boolean;
  suspendedAt: Date | null;
  unitSpec: string | null;
  unitName: string | null;
  scheduleSpec: string | null;
};

/** Stations with their bands, unit and schedule in three queries, ready for compilePlan. */
export async function planSourcesFor(sequelize: Sequelize, stationIds: number[]): Promise<Map<number, StationPlanSource>> {
  const out = new Map<number, StationPlanSource>();
  if (stationIds.length === 0) return out;
  const [stations, bands] = await Promise.all([
    sequelize.query<StationRow>(
      `SELECT s.id, s.ownerId, s.name, s.callsign, s.locator, s.region, s.audioOffsetHz, s.transmitEnabled, s.suspendedAt,
              u.spec AS unitSpec, u.name AS unitName, sc.spec AS scheduleSpec
         FROM stations s LEFT JOIN units u ON u.id = s.unitId LEFT JOIN schedules sc ON sc.stationId = s.id
        WHERE s.id IN (?)`,
      { replacements: [stationIds], type: QueryTypes.SELECT },
    ),
    sequelize.query<{ stationId: number; bandId: string; enabled: number | boolean; calibrationOffsetHz: number | null }>(
      'SELECT stationId, bandId, enabled, calibrationOffsetHz FROM station_bands WHERE stationId IN (?)',
      { replacements: [stationIds], type: QueryTypes.SELECT },
    ),
  ]);
  for (const s of stations) {
    const stationBands = bands
      .filter((b) => b.stationId === s.id)
      .map((b) => ({ bandId: b.bandId as BandId, enabled: Boolean(b.enabled), calibrationOffsetHz: b.calibrationOffsetHz }));
    let input: PlanInput | null = null;
    if (s.scheduleSpec) {
      const schedule = scheduleInput.safeParse(JSON.parse(s.scheduleSpec));
      const unit = s.unitSpec ? unitInput.safeParse({ ...JSON.parse(s.unitSpec), name: s.unitName }) : null;
      if (schedule.success) {
        input = {
          schedule: { ...schedule.data, stationId: s.id },
          station: {
            callsign: s.callsign,
            locator: s.locator,
            region: s.region as LicenceRegion,
            audioOffsetHz: s.audioOffsetHz,
            bands: stationBands,
          },
          unit: unit?.success ? unit.data : null,
          suspended: s.suspendedAt !== null,
        };
      }
    }
    out.set(s.id, {
      stationId: s.id,
      ownerId: s.ownerId,
      name: s.name,
      callsign: s.callsign,
      locator: s.locator,
      transmitEnabled: Boolean(s.transmitEnabled),
      input,
    });
  }
  return out;
}
