/**
 * Compiled plans per station, kept between batches (compiling encodes the station's messages). Any change in
 * this process drops the station's entry at once (change feed); other processes see it within PLAN_CACHE_MS.
 */
import { LRUCache } from 'lru-cache';
import type { Sequelize } from 'sequelize';
import { compilePlan, type CompiledPlan } from '@/shared/domain/schedule';
import { onStationChanged } from '../../lib/change-feed';
import { planSourcesFor, type StationPlanSource } from './station-match.repo';

export const PLAN_CACHE_MS = 30_000;

export type StationPlan = { source: StationPlanSource; plan: CompiledPlan | null };

const cache = new LRUCache<number, { entry: StationPlan; atMs: number }>({ max: 20_000 });
onStationChanged((stationId) => {
  if (stationId === 'all') cache.clear();
  else cache.delete(stationId);
});

/** The stations' sources and compiled plans; unknown ids are left out of the answer. */
export async function stationPlans(sequelize: Sequelize, stationIds: number[], nowMs = Date.now()): Promise<Map<number, StationPlan>> {
  const out = new Map<number, StationPlan>();
  const missing: number[] = [];
  for (const id of new Set(stationIds)) {
    const hit = cache.get(id);
    if (hit && nowMs - hit.atMs < PLAN_CACHE_MS) out.set(id, hit.entry);
    else missing.push(id);
  }
  if (missing.length === 0) return out;
  const sources = await planSourcesFor(sequelize, missing);
  for (const [id, source] of sources) {
    const entry = { source, plan: source.input ? compilePlan(source.input) : null };
    cache.set(id, { entry, atMs: nowMs });
    out.set(id, entry);
  }
  return out;
}

/** Forgets a station at once (deleted, or changed outside the change feed). */
export const forgetPlan = (stationId: number) => cache.delete(stationId);
