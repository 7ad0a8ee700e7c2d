import type { StationPlan } from '@/shared/api/answers';
import type { SessionUser } from '@/shared/api/contracts';
import { validateSchedule } from '@/shared/domain/schedule';
import { applySchedulePatch, type ScheduleValues } from '@/shared/schemas/schedule';
import type { Station } from '@/shared/schemas';
import type { TransactionRunner } from '../../db/transaction';
import { AppError } from '../../lib/app-error';
import * as audit from '../audit/audit.service';
import { getFor as getStation, getOwnedBy as getOwnStation } from '../stations/stations.service';
import { unitById } from '../units/units.service';
import { planFor } from './plan';
import * as repo from './schedules.repo';

export const MAX_PLAN_RANGE_MS = 8 * 86_400_000;

// For other features: what a station's plan depends on besides the station itself.
export const scheduleOf = (stationId: number) => repo.findByStation(stationId);
export const schedulesOf = (stationIds: number[]) => repo.findByStations(stationIds);
export async function planInputsOf(station: Station) {
  const [unit, schedule] = await Promise.all([unitById(station.unitId), repo.findByStation(station.id)]);
  return { unit, schedule };
}

/** Blocking problems (an unfiltered band, tones outside the window, duty above 50 %) stop a save. */
async function refuseBlocked(stationId: number, values: ScheduleValues, user: SessionUser) {
  const station = await getOwnStation(user, stationId);
  const issues = validateSchedule({ schedule: { ...values, stationId }, station, unit: await unitById(station.unitId) });
  const blocking = issues.filter((i) => i.level === 'block');
  if (blocking.length) {
    const fields: Record<string, string> = {};
    for (const issue of blocking) fields[issue.stepIndex === undefined ? 'schedule' : `steps.${issue.stepIndex}`] ??= issue.message;
    throw new AppError('bad-request', blocking[0].message, fields);
  }
  return issues;
}

export async function getFor(user: SessionUser, stationId: number) {
  await getStation(user, stationId);
  const schedule = await repo.findByStation(stationId);
  if (!schedule) throw new AppError('not-found', `Station ${stationId} has no schedule yet`);
  return schedule;
}

export async function create(db: TransactionRunner, user: SessionUser, stationId: number, values: ScheduleValues) {
  await refuseBlocked(stationId, values, user);
  return db.transaction(async (transaction) => {
    if (await repo.findByStation(stationId, transaction)) {
      throw new AppError('conflict', `Station ${stationId} already has a schedule: change it instead`);
    }
    const created = await repo.insert(stationId, values, transaction);
    await audit.record(
      {
        actor: user,
        ownerId: user.id,
        action: 'schedule.create',
        entityType: 'schedule',
        entityId: stationId,
        summary: `Created the schedule ${values.name}`,
        after: values,
      },
      transaction,
    );
    return created;
  });
}

export async function update(db: TransactionRunner, user: SessionUser, stationId: number, patch: Partial<ScheduleValues>) {
  await getOwnStation(user, stationId);
  const current = await getFor(user, stationId);
  const merged = applySchedulePatch(current, patch);
  if (!merged.success) throw merged.error;
  const { id: _id, stationId: _s, createdAt: _c, updatedAt: _u, ...values } = merged.data;
  // Pausing never needs the checks; anything else that would transmit must pass them.
  if (!(Object.keys(patch).length === 1 && 'paused' in patch)) await refuseBlocked(stationId, values, user);
  const { id: _i, stationId: _st, createdAt: _cr, updatedAt: _up, ...before } = current;
  const summary =
    Object.keys(patch).length === 1 && 'paused' in patch
      ? patch.paused
        ? 'Paused the schedule'
        : 'Resumed the schedule'
      : `Changed ${Object.keys(patch).join(', ')} of the schedule`;
  return audit.ownChange(
    db,
    user,
    (transaction) => repo.update(stationId, values, transaction),
    () => ({ action: 'schedule.update', entityType: 'schedule', entityId: stationId, summary, before, after: values }),
  );
}

export async function remove(db: TransactionRunner, user: SessionUser, stationId: number) {
  await getOwnStation(user, stationId);
  const before = await getFor(user, stationId);
  await audit.ownChange(
    db,
    user,
    (transaction) => repo.remove(stationId, transaction),
    () => ({
      action: 'schedule.delete',
      entityType: 'schedule',
      entityId: stationId,
      summary: `Deleted the schedule ${before.name}`,
      before,
    }),
  );
}

export async function planRange(user: SessionUser, stationId: number, fromMs: number, toMs: number): Promise<StationPlan> {
  const station = await getStation(user, stationId);
  const schedule = await repo.findByStation(stationId);
  if (!schedule) throw new AppError('not-found', `Station ${stationId} has no schedule yet`);
  const unit = await unitById(station.unitId);
  const result = planFor(station, unit, schedule, fromMs, toMs);
  return {
    stationId,
    fromUtc: new Date(fromMs).toISOString(),
    toUtc: new Date(toMs).toISOString(),
    suspended: station.suspension !== null,
    ...result,
    issues: validateSchedule({ schedule, station, unit }),
  };
}
