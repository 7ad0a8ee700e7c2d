/** Stability from reports: heard error and drift per transmission on one band, beside the unit's heartbeat temperatures. */
import type { Sequelize } from 'sequelize';
import type { StabilityAnswer } from '@/shared/api/answers';
import type { SessionUser } from '@/shared/api/contracts';
import { bandFor, type BandId } from '@/shared/domain/bands';
import { stabilitySeries, stabilityVerdict } from '@/shared/domain/reception';
import { AppError } from '../../lib/app-error';
import { heardSamples } from '../receptions/receptions.service';
import { getFor } from '../stations/stations.service';
import { unitById } from '../units/units.service';
import * as heartbeats from './heartbeats.repo';

const DAY_MS = 86_400_000;
const MAX_PERIOD_MS = 92 * DAY_MS;

/** The owner and the admins of the owner's clubs see it; anyone else gets a 404. */
export async function stabilityFor(
  sequelize: Sequelize,
  user: SessionUser,
  stationId: number,
  query: { from?: string; to?: string; band?: BandId },
  nowMs: number,
): Promise<StabilityAnswer> {
  const station = await getFor(user, stationId);
  const toMs = query.to ? Date.parse(query.to) : nowMs;
  const fromMs = query.from ? Date.parse(query.from) : toMs - 7 * DAY_MS;
  if (!(fromMs < toMs) || toMs - fromMs > MAX_PERIOD_MS) {
    throw new AppError('bad-request', 'Choose a start before the end, at most 92 days apart', {
      from: 'Choose a start before the end, at most 92 days apart',
    });
  }
  const bandId = query.band ?? station.bands.find((b) => b.enabled)?.bandId;
  if (!bandId) throw new AppError('bad-request', 'The station has no band enabled', { band: 'Enable a band first, or choose one' });
  const found = bandFor(bandId, station.region);
  if (!found.ok) throw new AppError('bad-request', found.reason, { band: found.reason });
  const [heard, temperatures, unit] = await Promise.all([
    heardSamples(sequelize, stationId, bandId, fromMs, toMs),
    heartbeats.temperaturesBetween(stationId, new Date(fromMs - 15 * 60_000), new Date(toMs + 15 * 60_000)),
    unitById(station.unitId),
  ]);
  const carrierHz = found.band.dialHz + station.audioOffsetHz;
  const points = stabilitySeries(heard, temperatures);
  return {
    bandId,
    fromUtc: new Date(fromMs).toISOString(),
    toUtc: new Date(toMs).toISOString(),
    carrierHz,
    points,
    verdict: stabilityVerdict(points, carrierHz),
    unitId: unit && unit.ownerId === station.ownerId ? unit.id : null,
    unitTempCoPpmPerC: unit ? unit.tempCoPpmPerC : null,
  };
}
