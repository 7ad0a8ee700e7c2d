/**
 * Fleet-aware stagger: finds stations whose transmissions meet in the same slot
 * on the same band with carriers closer than a guard (a WSPR signal is about
 * 6 Hz wide), and proposes audio offsets that pull them apart.
 *
 * Fast method: bucket every transmission by (slot, band) with a counting sort,
 * sort each bucket by carrier, and sweep: only neighbours closer than the guard
 * are compared, so the work is about O(n log n). The pairwise method
 * (stagger-pairwise.ts) compares every two stations, for tests and the benchmark.
 */
import { BAND_IDS, type BandId } from '../bands';
import { SLOT_MS } from '../timing';
import { allowedOffsetRange, type OffsetRange } from './offsets';
import { expandPlan, type PlanInput, type PlannedTransmission } from './expand';

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
export type FleetOptions = {
  guardHz?: number;
  range?: OffsetRange;
  /** proposals only: move a station only to a shift where it meets no one (default: also to fewer meetings) */
  moveOnlyWhenClear?: boolean;
};

const BAND_COUNT = BAND_IDS.length;
/** Position of each band in BAND_IDS (the bucket and sort order). */
export const bandIndex = new Map<BandId, number>(BAND_IDS.map((id, i) => [id, i]));

export function fleetStationFromPlan(
  stationId: number | string,
  currentOffsetHz: number,
  transmissions: readonly PlannedTransmission[],
): FleetStation {
  return {
    stationId,
    currentOffsetHz,
    transmissions: transmissions.map((t) => ({ startMs: t.startMs, bandId: t.bandId, dialHz: t.dialHz, carrierHz: t.carrierHz })),
  };
}

/** A fleet straight from schedules and settings: each station planned over [fromMs, toMs). */
export function fleetFromSchedules(inputs: readonly PlanInput[], fromMs: number, toMs: number): FleetStation[] {
  return inputs.map((input) =>
    fleetStationFromPlan(input.schedule.stationId, input.station.audioOffsetHz, expandPlan({ ...input, fromMs, toMs }).transmissions),
  );
}

/** Every transmission of the fleet in flat arrays, grouped by (slot, band) and sorted by carrier inside a group. */
type Flat = {
  n: number;
  station: Int32Array;
  slot: Float64Array;
  firstSlot: number;
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
  return { ...flat, firstSlot: n ? minSlot : 0, order, bucketStart };
}

/** Sorts order[from … to) by carrier, in place (insertion sort for short runs, quicksort above). */
function sortByCarrier(order: Int32Array, from: number, to: number, carrier: Float64Array): void {
  while (to - from > 24) {
    const mid = order[(from + to) >>> 1];
    const pivot = carrier[mid];
    let i = from;
    let j = to - 1;
    while (i <= j) {
      while (carrier[order[i]] < pivot) i++;
      while (carrier[order[j]] > pivot) j--;
      if (i <= j) {
        const x = order[i];
        order[i] = order[j];
        order[j] = x;
        i++;
        j--;
      }
    }
    // recurse into the smaller side, loop on the larger
    if (j + 1 - from < to - i) {
      sortByCarrier(order, from, j + 1, carrier);
      from = i;
    } else {
      sortByCarrier(order, i, to, carrier);
      to = j + 1;
    }
  }
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
}

/**
 * One pass over the sorted buckets: calls visit(t, u) for every two transmissions of
 * different stations on one band in one slot whose carriers are closer than the guard.
 */
function sweep(flat: Flat, current: Float64Array, guard: number, visit: ((t: number, u: number) => void) | null): number {
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
        if (visit) visit(t, u);
      }
    }
  }
  return instances;
}

/**
 * The conflicts as pairs, ordered by (a, b, band) in input order. Two sweeps: the first
 * counts each lower station's meetings, the second files them under it as
 * (partner, band, slot) packed in one number; sorting each station's run groups the pairs.
 */
function tallyConflicts(flat: Flat, current: Float64Array, guardHz: number, stations: readonly FleetStation[]): FleetConflict[] {
  const { station } = flat;
  const counts = new Int32Array(stations.length + 1);
  sweep(flat, current, guardHz, (t, u) => counts[(station[t] < station[u] ? station[t] : station[u]) + 1]++);
  for (let s = 0; s < stations.length; s++) counts[s + 1] += counts[s];
  const fill = counts.slice(0, stations.length);
  const packed = new Float64Array(counts[stations.length]);
  const SLOT_SPAN = 2 ** 22; // slots after the first: about 16 years
  const { band, slot, firstSlot } = flat;
  sweep(flat, current, guardHz, (t, u) => {
    const a = station[t];
    const b = station[u];
    const hi = a < b ? b : a;
    packed[fill[a < b ? a : b]++] = (hi * BAND_COUNT + band[t]) * SLOT_SPAN + (slot[t] - firstSlot);
  });
  const out: FleetConflict[] = [];
  const slotText = new Map<number, string>();
  const textOf = (slot: number) => {
    let text = slotText.get(slot);
    if (text === undefined) slotText.set(slot, (text = new Date((slot + flat.firstSlot) * SLOT_MS).toISOString()));
    return text;
  };
  for (let lo = 0; lo < stations.length; lo++) {
    const run = packed.subarray(counts[lo], counts[lo + 1]).sort();
    for (let i = 0; i < run.length;) {
      const group = Math.floor(run[i] / SLOT_SPAN);
      let j = i + 1;
      while (j < run.length && Math.floor(run[j] / SLOT_SPAN) === group) j++;
      const band = group % BAND_COUNT;
      out.push({
        a: stations[lo].stationId,
        b: stations[(group - band) / BAND_COUNT].stationId,
        bandId: BAND_IDS[band],
        slotCount: j - i,
        firstSlotUtc: textOf(run[i] - group * SLOT_SPAN),
      });
      i = j;
    }
  }
  return out;
}

/** Pairs of stations that meet in a slot on a band with carriers less than guardHz apart (fast method). */
export function findFleetConflicts(stations: readonly FleetStation[], options: FleetOptions = {}): FleetConflict[] {
  const flat = flatten(stations);
  return tallyConflicts(flat, flat.carrier, options.guardHz ?? DEFAULT_GUARD_HZ, stations);
}

export type FleetProposal = {
  proposals: OffsetProposal[];
  /** conflicts as planned now */
  conflicts: FleetConflict[];
  /** conflicts left after the proposed offsets (more stations than the window holds, say) */
  remaining: FleetConflict[];
  movedCount: number;
  /** stations that still meet someone after their turn */
  unresolved: (number | string)[];
};

/**
 * For station s: marks in `score` (a difference array over grid shifts firstShift + k·h)
 * every shift that would bring one of its transmissions within the guard of another
 * station's; returns how many of its meetings there are without a shift.
 */
function scoreShifts(
  flat: Flat,
  current: Float64Array,
  s: number,
  guardHz: number,
  firstShift: number,
  count: number,
  score: Int32Array,
): number {
  const { order, bucketStart, station, bucket, stationStart } = flat;
  const perHz = 1 / PROPOSAL_GRID_HZ;
  const reach = guardHz - firstShift; // v + reach = distance from the first grid shift to the top of u's band
  let now = 0;
  for (let t = stationStart[s]; t < stationStart[s + 1]; t++) {
    const k = bucket[t];
    const ct = current[t];
    for (let i = bucketStart[k], end = bucketStart[k + 1]; i < end; i++) {
      const u = order[i];
      if (station[u] === s) continue;
      const v = current[u] - ct;
      if (v < guardHz && v > -guardHz) now++;
      // shifts strictly inside (v − guard, v + guard) meet u
      let kFrom = Math.floor((v - guardHz - firstShift) * perHz) + 1;
      let kTo = Math.ceil((v + reach) * perHz) - 1;
      if (kTo < 0 || kFrom >= count) continue;
      if (kFrom < 0) kFrom = 0;
      if (kTo >= count) kTo = count - 1;
      score[kFrom]++;
      score[kTo + 1]--;
    }
  }
  return now;
}

/** Proposed offsets sit on this grid (Hz), so they read as 1496.3, not 1496.2487…. */
export const PROPOSAL_GRID_HZ = 0.1;

/**
 * Greedy separation. Stations with the most meetings go first. For a station that still
 * meets someone, every shift on the grid that keeps all its tones inside the window is
 * scored by how many of its transmissions would then meet another station's carrier (as
 * the others stand now); it takes the lowest score, the smallest shift among equals, and
 * moves only when that beats staying put. Each move lowers the fleet's meetings, stations
 * already clear never move, and a station that cannot get clear is reported unresolved.
 */
export function proposeFleetOffsets(stations: readonly FleetStation[], options: FleetOptions = {}): FleetProposal {
  const guard = options.guardHz ?? DEFAULT_GUARD_HZ;
  const guardHz = guard - GUARD_TOLERANCE_HZ;
  const range = options.range ?? allowedOffsetRange();
  const flat = flatten(stations);
  const { order, bucketStart, station, stationStart, audio } = flat;
  const degree = new Float64Array(stations.length);
  sweep(flat, flat.carrier, guard, (t, u) => {
    degree[station[t]]++;
    degree[station[u]]++;
  });
  const conflicts = tallyConflicts(flat, flat.carrier, guard, stations);
  const current = Float64Array.from(flat.carrier);
  const shiftOf = new Float64Array(stations.length);
  const candidates = Array.from(degree.keys())
    .filter((s) => degree[s] > 0)
    .sort((x, y) => degree[y] - degree[x] || x - y);
  const unresolved: (number | string)[] = [];
  let movedCount = 0;
  let score = new Int32Array(0);

  for (const s of candidates) {
    const from = stationStart[s];
    const to = stationStart[s + 1];
    let lowest = Infinity;
    let highest = -Infinity;
    for (let t = from; t < to; t++) {
      lowest = Math.min(lowest, audio[t]);
      highest = Math.max(highest, audio[t]);
    }
    // grid points: base + p0 + k·h for k = 0 … K−1, every one keeping the tones inside
    const base = stations[s].currentOffsetHz;
    const h = PROPOSAL_GRID_HZ;
    const firstShift = Math.ceil((base + range.lowHz - lowest) / h - 1e-9) * h - base;
    const count = Math.floor((range.highHz - highest - firstShift) / h + 1e-9) + 1;
    if (count > score.length) score = new Int32Array(count + 1);
    else score.fill(0, 0, count + 1);
    const now = scoreShifts(flat, current, s, guardHz, firstShift, count, score);
    if (now === 0) continue; // cleared by an earlier move
    let best = -1;
    let bestScore = now;
    let running = 0;
    for (let k = 0; k < count; k++) {
      running += score[k];
      const shift = firstShift + k * h;
      if (running < bestScore || (running === bestScore && best >= 0 && Math.abs(shift) < Math.abs(firstShift + best * h))) {
        best = k;
        bestScore = running;
      }
    }
    if (best >= 0 && !(options.moveOnlyWhenClear && bestScore > 0)) {
      const shift = Math.round((base + firstShift + best * h) / h) * h - base;
      shiftOf[s] = shift;
      for (let t = from; t < to; t++) current[t] = flat.carrier[t] + shift;
      movedCount++;
    }
    if (bestScore > 0) unresolved.push(stations[s].stationId);
  }

  for (let k = 0; k + 1 < bucketStart.length; k++) sortByCarrier(order, bucketStart[k], bucketStart[k + 1], current);
  const remaining = tallyConflicts(flat, current, guard, stations);
  return {
    proposals: stations.map((st, s) => ({
      stationId: st.stationId,
      currentOffsetHz: st.currentOffsetHz,
      proposedOffsetHz:
        shiftOf[s] === 0 ? st.currentOffsetHz : Math.round((st.currentOffsetHz + shiftOf[s]) / PROPOSAL_GRID_HZ) * PROPOSAL_GRID_HZ,
    })),
    conflicts,
    remaining,
    movedCount,
    unresolved,
  };
}
