/**
 * Fleet-aware stagger: finds stations whose transmissions meet in the same slot
 * on the same band with carriers closer than a guard (a WSPR signal is about
 * 6 Hz wide), and proposes audio offsets that pull them apart.
 *
 * Fast method: bucket every transmission by (slot, band) with a counting sort,
 * sort each bucket by carrier, and sweep: only neighbours closer than the guard
 * are compared, so the work is about O(n log n). The pairwise method compares
 * every two stations and exists for tests and the benchmark.
 */
import { BAND_IDS, type BandId } from '../bands';
import { SLOT_MS } from '../timing';
import { allowedOffsetRange, type OffsetRange } from './offsets';
import type { PlannedTransmission } from './expand';

export const DEFAULT_GUARD_HZ = 6;
/** Carriers closer than guardHz meet; differences within a micro-hertz of the guard count as clear (float noise). */
export const GUARD_TOLERANCE_HZ = 1e-6;

export type FleetTransmission = { startMs: number; bandId: BandId; dialHz: number; carrierHz: number };
export type FleetStation = {
  stationId: number | string;
  /** the station's base audio offset, which a proposal replaces */
  currentOffsetHz: number;
  transmissions: readonly FleetTransmission[];
};
/** Two stations that meet: `a` comes before `b` in the input order. */
export type FleetConflict = { a: number | string; b: number | string; bandId: BandId; slotCount: number; firstSlotUtc: string };
export type OffsetProposal = { stationId: number | string; currentOffsetHz: number; proposedOffsetHz: number };
export type FleetOptions = { guardHz?: number; range?: OffsetRange };

const BAND_COUNT = BAND_IDS.length;
const bandIndex = new Map<BandId, number>(BAND_IDS.map((id, i) => [id, i]));

export function fleetStationFromPlan(stationId: number | string, currentOffsetHz: number, transmissions: readonly PlannedTransmission[]): FleetStation {
  return {
    stationId,
    currentOffsetHz,
    transmissions: transmissions.map((t) => ({ startMs: t.startMs, bandId: t.bandId, dialHz: t.dialHz, carrierHz: t.carrierHz })),
  };
}

/** Every transmission of the fleet in flat arrays, grouped by (slot, band) and sorted by carrier inside a group. */
type Flat = {
  n: number;
  station: Int32Array;
  slot: Float64Array;
  band: Uint8Array;
  carrier: Float64Array;
  audio: Float64Array;
  bucket: Int32Array;
  /** transmissions of station s are stationStart[s] … stationStart[s + 1] − 1 */
  stationStart: Int32Array;
  /** transmission indices by bucket; bucket k is order[bucketStart[k] … bucketStart[k + 1] − 1] */
  order: Int32Array;
  bucketStart: Int32Array;
};

function flatten(stations: readonly FleetStation[]): Flat {
  let n = 0;
  for (const s of stations) n += s.transmissions.length;
  const flat = {
    n,
    station: new Int32Array(n),
    slot: new Float64Array(n),
    band: new Uint8Array(n),
    carrier: new Float64Array(n),
    audio: new Float64Array(n),
    bucket: new Int32Array(n),
    stationStart: new Int32Array(stations.length + 1),
  };
  let i = 0;
  let minSlot = Infinity;
  let maxSlot = -Infinity;
  stations.forEach((s, si) => {
    flat.stationStart[si] = i;
    for (const t of s.transmissions) {
      const slot = Math.floor(t.startMs / SLOT_MS);
      flat.station[i] = si;
      flat.slot[i] = slot;
      flat.band[i] = bandIndex.get(t.bandId) ?? 0;
      flat.carrier[i] = t.carrierHz;
      flat.audio[i] = t.carrierHz - t.dialHz;
      if (slot < minSlot) minSlot = slot;
      if (slot > maxSlot) maxSlot = slot;
      i++;
    }
  });
  flat.stationStart[stations.length] = n;
  const buckets = n ? (maxSlot - minSlot + 1) * BAND_COUNT : 0;
  const bucketStart = new Int32Array(buckets + 1);
  for (let t = 0; t < n; t++) {
    const k = (flat.slot[t] - minSlot) * BAND_COUNT + flat.band[t];
    flat.bucket[t] = k;
    bucketStart[k + 1]++;
  }
  for (let k = 0; k < buckets; k++) bucketStart[k + 1] += bucketStart[k];
  const fill = bucketStart.slice(0, buckets);
  const order = new Int32Array(n);
  for (let t = 0; t < n; t++) order[fill[flat.bucket[t]]++] = t;
  const carrier = flat.carrier;
  for (let k = 0; k < buckets; k++) sortByCarrier(order, bucketStart[k], bucketStart[k + 1], carrier);
  return { ...flat, order, bucketStart };
}

function sortByCarrier(order: Int32Array, from: number, to: number, carrier: Float64Array): void {
  if (to - from < 2) return;
  if (to - from <= 32) {
    for (let i = from + 1; i < to; i++) {
      const t = order[i];
      const c = carrier[t];
      let j = i - 1;
      while (j >= from && carrier[order[j]] > c) {
        order[j + 1] = order[j];
        j--;
      }
      order[j + 1] = t;
    }
    return;
  }
  const part = Array.from(order.subarray(from, to)).sort((x, y) => carrier[x] - carrier[y] || x - y);
  order.set(part, from);
}

/** Conflict instances folded into pairs; keyed by (a, b, band) so the output order is fixed. */
type PairTally = { add: (a: number, b: number, band: number, slot: number) => void; result: (stations: readonly FleetStation[]) => FleetConflict[] };

function pairTally(stationCount: number): PairTally {
  const index = new Map<number, number>();
  const keys: number[] = [];
  const counts: number[] = [];
  const firsts: number[] = [];
  return {
    add(a, b, band, slot) {
      const key = (Math.min(a, b) * stationCount + Math.max(a, b)) * BAND_COUNT + band;
      const at = index.get(key);
      if (at === undefined) {
        index.set(key, keys.length);
        keys.push(key);
        counts.push(1);
        firsts.push(slot);
      } else {
        counts[at]++;
        if (slot < firsts[at]) firsts[at] = slot;
      }
    },
    result(stations) {
      const sorted = Array.from(keys.keys()).sort((x, y) => keys[x] - keys[y]);
      return sorted.map((i) => {
        const band = keys[i] % BAND_COUNT;
        const pair = (keys[i] - band) / BAND_COUNT;
        const a = Math.floor(pair / stationCount);
        return {
          a: stations[a].stationId,
          b: stations[pair - a * stationCount].stationId,
          bandId: BAND_IDS[band],
          slotCount: counts[i],
          firstSlotUtc: new Date(firsts[i] * SLOT_MS).toISOString(),
        };
      });
    },
  };
}

function sweep(flat: Flat, current: Float64Array, guard: number, tally: PairTally | null, degree: Float64Array | null): number {
  let instances = 0;
  const guardHz = guard - GUARD_TOLERANCE_HZ;
  const { order, bucketStart, station } = flat;
  for (let k = 0; k + 1 < bucketStart.length; k++) {
    const end = bucketStart[k + 1];
    for (let i = bucketStart[k]; i < end; i++) {
      const t = order[i];
      const c = current[t];
      for (let j = i + 1; j < end; j++) {
        const u = order[j];
        if (current[u] - c >= guardHz) break;
        if (station[u] === station[t]) continue;
        instances++;
        if (tally) tally.add(station[t], station[u], flat.band[t], flat.slot[t]);
        if (degree) {
          degree[station[t]]++;
          degree[station[u]]++;
        }
      }
    }
  }
  return instances;
}

/** Pairs of stations that meet in a slot on a band with carriers less than guardHz apart (fast method). */
export function findFleetConflicts(stations: readonly FleetStation[], options: FleetOptions = {}): FleetConflict[] {
  const flat = flatten(stations);
  const tally = pairTally(stations.length);
  sweep(flat, flat.carrier, options.guardHz ?? DEFAULT_GUARD_HZ, tally, null);
  return tally.result(stations);
}

/** The same answer by comparing every two stations slot by slot (O(stations² · transmissions)). */
export function findFleetConflictsPairwise(stations: readonly FleetStation[], options: FleetOptions = {}): FleetConflict[] {
  const guardHz = (options.guardHz ?? DEFAULT_GUARD_HZ) - GUARD_TOLERANCE_HZ;
  const bySlot = stations.map((s) =>
    s.transmissions
      .map((t) => ({ slot: Math.floor(t.startMs / SLOT_MS), band: bandIndex.get(t.bandId) ?? 0, carrierHz: t.carrierHz }))
      .sort((x, y) => x.slot - y.slot),
  );
  const out: FleetConflict[] = [];
  for (let a = 0; a < stations.length; a++) {
    for (let b = a + 1; b < stations.length; b++) {
      const ta = bySlot[a];
      const tb = bySlot[b];
      const perBand = new Map<number, { count: number; first: number }>();
      let i = 0;
      let j = 0;
      while (i < ta.length && j < tb.length) {
        if (ta[i].slot < tb[j].slot) i++;
        else if (ta[i].slot > tb[j].slot) j++;
        else {
          const slot = ta[i].slot;
          const jEnd = tb.findIndex((t, k) => k >= j && t.slot !== slot);
          const jStop = jEnd === -1 ? tb.length : jEnd;
          for (; i < ta.length && ta[i].slot === slot; i++) {
            for (let k = j; k < jStop; k++) {
              if (ta[i].band === tb[k].band && Math.abs(ta[i].carrierHz - tb[k].carrierHz) < guardHz) {
                const seen = perBand.get(ta[i].band);
                if (seen) {
                  seen.count++;
                  seen.first = Math.min(seen.first, slot);
                } else perBand.set(ta[i].band, { count: 1, first: slot });
              }
            }
          }
          j = jStop;
        }
      }
      for (const [band, seen] of [...perBand].sort((x, y) => x[0] - y[0])) {
        out.push({
          a: stations[a].stationId,
          b: stations[b].stationId,
          bandId: BAND_IDS[band],
          slotCount: seen.count,
          firstSlotUtc: new Date(seen.first * SLOT_MS).toISOString(),
        });
      }
    }
  }
  return out;
}

export type FleetProposal = {
  proposals: OffsetProposal[];
  /** conflicts as planned now */
  conflicts: FleetConflict[];
  /** conflicts left after the proposed offsets (too many stations for the window, say) */
  remaining: FleetConflict[];
  movedCount: number;
  /** stations that had a conflict but found no free offset */
  unresolved: (number | string)[];
};

/**
 * Greedy separation: stations with the most conflicts go first; a station that
 * still meets someone moves by the smallest shift (on a 0.01 Hz grid) that clears
 * every other station's carrier, as they stand, in all its slots, while keeping all
 * of its tones inside the window. Stations already clear are not moved.
 */
export function proposeFleetOffsets(stations: readonly FleetStation[], options: FleetOptions = {}): FleetProposal {
  const guardHz = options.guardHz ?? DEFAULT_GUARD_HZ;
  const range = options.range ?? allowedOffsetRange();
  const flat = flatten(stations);
  const degree = new Float64Array(stations.length);
  const before = pairTally(stations.length);
  sweep(flat, flat.carrier, guardHz, before, degree);
  const current = Float64Array.from(flat.carrier);
  const delta = new Float64Array(stations.length);
  const candidates = Array.from(degree.keys())
    .filter((s) => degree[s] > 0)
    .sort((x, y) => degree[y] - degree[x] || x - y);
  const { order, bucketStart, station, bucket, stationStart, audio } = flat;
  const unresolved: (number | string)[] = [];
  let movedCount = 0;

  for (const s of candidates) {
    const from = stationStart[s];
    const to = stationStart[s + 1];
    let meets = false;
    for (let t = from; t < to && !meets; t++) {
      for (let i = bucketStart[bucket[t]]; i < bucketStart[bucket[t] + 1]; i++) {
        const u = order[i];
        if (station[u] !== s && Math.abs(current[u] - current[t]) < guardHz - GUARD_TOLERANCE_HZ) {
          meets = true;
          break;
        }
      }
    }
    if (!meets) continue;
    let lowest = Infinity;
    let highest = -Infinity;
    for (let t = from; t < to; t++) {
      lowest = Math.min(lowest, audio[t]);
      highest = Math.max(highest, audio[t]);
    }
    // shifts keeping every transmission inside the window, then minus the forbidden ones
    let free: number[] = [range.lowHz - lowest, range.highHz - highest];
    for (let t = from; t < to && free.length; t++) {
      for (let i = bucketStart[bucket[t]]; i < bucketStart[bucket[t] + 1] && free.length; i++) {
        const u = order[i];
        if (station[u] === s) continue;
        const v = current[u] - current[t];
        free = subtract(free, v - guardHz, v + guardHz);
      }
    }
    const shift = nearestShift(free, stations[s].currentOffsetHz);
    if (shift === null) {
      unresolved.push(stations[s].stationId);
      continue;
    }
    delta[s] = shift;
    for (let t = from; t < to; t++) current[t] = flat.carrier[t] + shift;
    movedCount++;
  }

  for (let k = 0; k + 1 < bucketStart.length; k++) sortByCarrier(order, bucketStart[k], bucketStart[k + 1], current);
  const after = pairTally(stations.length);
  sweep(flat, current, guardHz, after, null);
  return {
    proposals: stations.map((st, s) => ({
      stationId: st.stationId,
      currentOffsetHz: st.currentOffsetHz,
      proposedOffsetHz: delta[s] === 0 ? st.currentOffsetHz : st.currentOffsetHz + delta[s],
    })),
    conflicts: before.result(stations),
    remaining: after.result(stations),
    movedCount,
    unresolved,
  };
}

/** Removes the open interval (a, b) from closed segments stored flat as [lo0, hi0, lo1, hi1, …]. */
function subtract(segments: number[], a: number, b: number): number[] {
  const out: number[] = [];
  for (let i = 0; i < segments.length; i += 2) {
    const lo = segments[i];
    const hi = segments[i + 1];
    if (b <= lo || a >= hi) {
      out.push(lo, hi);
      continue;
    }
    if (lo <= a) out.push(lo, a);
    if (b <= hi) out.push(b, hi);
  }
  return out;
}

/**
 * The shift in the segments nearest to 0 that lands the base offset on a 0.01 Hz grid
 * (so a proposed offset reads as 1496.25, not 1496.2487…); null when none does.
 */
function nearestShift(segments: number[], baseHz: number): number | null {
  let best: number | null = null;
  for (let i = 0; i < segments.length; i += 2) {
    const lo = segments[i];
    const hi = segments[i + 1];
    if (lo > hi) continue;
    let x: number;
    if (lo <= 0 && hi >= 0) x = 0;
    else if (lo > 0) x = Math.ceil((baseHz + lo) * 100) / 100 - baseHz;
    else x = Math.floor((baseHz + hi) * 100) / 100 - baseHz;
    // float noise of the grid step stays far inside the guard tolerance
    if (x < lo - GUARD_TOLERANCE_HZ / 10 || x > hi + GUARD_TOLERANCE_HZ / 10) continue; // segment narrower than the grid
    if (best === null || Math.abs(x) < Math.abs(best)) best = x;
  }
  return best;
}
