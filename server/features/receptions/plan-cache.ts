/**
 * Compiled plans per station, kept between requests (compiling encodes the station's messages), with each
 * station's expanded UTC days memoised beside them (expanding a day is the costly part of matching and of
 * counting planned transmissions). Any change in this process drops the station's entry at once (change feed);
 * other processes see it within PLAN_CACHE_MS, and an entry whose inputs did not change keeps its work.
 */
import { LRUCache } from 'lru-cache';
import type { Sequelize } from 'sequelize';
import { compilePlan, expandCompiled, type CompiledPlan } from '@/shared/domain/schedule';
import { onStationChanged } from '../../lib/change-feed';
import { planSourcesFor, type StationPlanSource } from './station-match.repo';

export const PLAN_CACHE_MS = 30_000;
const DAY_MS = 86_400_000;
const SLOT_MS = 120_000;

export type PlannedSlot = { slotMs: number; startMs: number; bandId: string; carrierHz: number };

/** A station's plan with its expanded days: the last few in full, and the count per band of every day asked for. */
export class PlanMemo {
  private readonly days = new LRUCache<number, { slots: PlannedSlot[]; byKey: Map<string, number> }>({ max: 16 });
  private readonly counts = new Map<number, Map<string, number>>();
  constructor(readonly plan: CompiledPlan | null) {}

  /** The transmissions planned on one UTC day (day = ms / DAY_MS, floored). */
  day(day: number) {
    let found = this.days.get(day);
    if (!found) {
      const slots: PlannedSlot[] = this.plan
        ? expandCompiled(this.plan, day * DAY_MS, (day + 1) * DAY_MS).transmissions.map((t) => ({
            slotMs: Math.floor(t.startMs / SLOT_MS) * SLOT_MS,
            startMs: t.startMs,
            bandId: t.bandId,
            carrierHz: t.carrierHz,
          }))
        : [];
      found = { slots, byKey: new Map(slots.map((s) => [`${s.slotMs}|${s.bandId}`, s.carrierHz])) };
      this.days.set(day, found);
      const perBand = new Map<string, number>();
      for (const s of slots) perBand.set(s.bandId, (perBand.get(s.bandId) ?? 0) + 1);
      this.counts.set(day, perBand);
    }
    return found;
  }

  /** Tone 0's planned frequency in that slot on that band, or null when the plan has nothing there. */
  carrierAt(slotMs: number, bandId: string): number | null {
    if (!this.plan) return null;
    return this.day(Math.floor(slotMs / DAY_MS)).byKey.get(`${slotMs}|${bandId}`) ?? null;
  }

  /** How many transmissions start in [fromMs, toMs), on one band or all. */
  plannedCount(fromMs: number, toMs: number, bandId: string | null): number {
    if (!this.plan || !(toMs > fromMs)) return 0;
    let total = 0;
    for (let day = Math.floor(fromMs / DAY_MS); day * DAY_MS < toMs; day++) {
      const whole = day * DAY_MS >= fromMs && (day + 1) * DAY_MS <= toMs;
      if (whole) {
        if (!this.counts.has(day)) this.day(day);
        const perBand = this.counts.get(day)!;
        total += bandId ? (perBand.get(bandId) ?? 0) : [...perBand.values()].reduce((a, b) => a + b, 0);
      } else {
        total += this.day(day).slots.filter((s) => s.startMs >= fromMs && s.startMs < toMs && (!bandId || s.bandId === bandId)).length;
      }
    }
    return total;
  }

  /** The next transmission starting at or after nowMs, within a week. */
  next(nowMs: number): PlannedSlot | null {
    if (!this.plan || this.plan.blocked.length) return null;
    for (let day = Math.floor(nowMs / DAY_MS), end = day + 8; day < end; day++) {
      const found = this.day(day).slots.find((s) => s.startMs >= nowMs);
      if (found) return found;
    }
    return null;
  }
}

export type StationPlan = { source: StationPlanSource; plan: CompiledPlan | null; memo: PlanMemo };

const cache = new LRUCache<number, { entry: StationPlan; atMs: number; inputs: string }>({ max: 20_000 });
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
    const inputs = JSON.stringify(source.input);
    const old = cache.peek(id);
    let memo: PlanMemo;
    if (old && old.inputs === inputs) memo = old.entry.memo;
    else memo = new PlanMemo(source.input ? compilePlan(source.input) : null);
    const entry = { source, plan: memo.plan, memo };
    cache.set(id, { entry, atMs: nowMs, inputs });
    out.set(id, entry);
  }
  return out;
}

/** Forgets a station at once (deleted, or changed outside the change feed). */
export const forgetPlan = (stationId: number) => cache.delete(stationId);
