/** Calibration from reports: what receivers heard, per band, against what the plan meant (read-only; applying goes through saveCalibration). */
import type { Sequelize } from 'sequelize';
import type { CalibrationFromReports } from '@/shared/api/answers';
import type { SessionUser } from '@/shared/api/contracts';
import { bandFor, bandsFor } from '@/shared/domain/bands';
import { calibrationFromReports } from '@/shared/domain/reception';
import { AppError } from '../../lib/app-error';
import { heardErrors } from '../receptions/receptions.service';
import { getFor } from './stations.service';

const DAY_MS = 86_400_000;
/** The default period, and the longest one asked for (a year of a busy station is about a million reports). */
export const DEFAULT_PERIOD_MS = 7 * DAY_MS;
export const MAX_PERIOD_MS = 92 * DAY_MS;

function periodOf(query: { from?: string; to?: string }, nowMs: number) {
  const toMs = query.to ? Date.parse(query.to) : nowMs;
  const fromMs = query.from ? Date.parse(query.from) : toMs - DEFAULT_PERIOD_MS;
  if (!(fromMs < toMs)) throw new AppError('bad-request', 'from must come before to', { from: 'Choose a start before the end' });
  if (toMs - fromMs > MAX_PERIOD_MS) {
    throw new AppError('bad-request', 'A period can be at most 92 days', { from: 'Choose a period of at most 92 days' });
  }
  return { fromMs, toMs };
}

/** The owner and the admins of the owner's clubs see it; anyone else gets a 404 (from getFor). */
export async function fromReportsFor(
  sequelize: Sequelize,
  user: SessionUser,
  stationId: number,
  query: { from?: string; to?: string },
  nowMs: number,
): Promise<CalibrationFromReports> {
  const station = await getFor(user, stationId);
  const { fromMs, toMs } = periodOf(query, nowMs);
  const rows = await heardErrors(sequelize, stationId, fromMs, toMs);
  const order = bandsFor(station.region).map((b) => b.id as string);
  const bandIds = new Set([...station.bands.filter((b) => b.enabled).map((b) => b.bandId as string), ...rows.map((r) => r.bandId)]);
  const bands = [...bandIds]
    .sort((a, b) => order.indexOf(a) - order.indexOf(b))
    .flatMap((bandId) => {
      const found = bandFor(bandId as never, station.region);
      if (!found.ok) return [];
      const setting = station.bands.find((b) => b.bandId === bandId);
      // a report heard before the band's last calibration measured the old correction
      const calibratedMs = setting?.calibratedAt ? Date.parse(setting.calibratedAt) : 0;
      const sinceMs = Math.max(fromMs, calibratedMs);
      const heard = rows.filter((r) => r.bandId === bandId && sinceMs <= r.slotStartMs);
      return [
        {
          ...calibrationFromReports(bandId, setting?.calibrationOffsetHz ?? null, heard),
          sinceUtc: new Date(sinceMs).toISOString(),
          dialHz: found.band.dialHz,
          plannedCarrierHz: found.band.dialHz + station.audioOffsetHz,
        },
      ];
    });
  return { fromUtc: new Date(fromMs).toISOString(), toUtc: new Date(toMs).toISOString(), bands };
}
