/**
 * Benchmarks of the computation core: WSPR encodings per second and slot-plan
 * (timing) expansion speed. Each benchmark is an exported function returning
 * its figures, so more (a fleet stagger benchmark, say) can be added beside them.
 * Run: npm run bench:core
 */
import { cpus, loadavg } from 'node:os';
import { bandFor, encodeMessage, slotsInRange, type BandId } from '../../shared/domain';
import {
  compilePlan,
  expandCompiled,
  findFleetConflicts,
  findFleetConflictsPairwise,
  fleetStationFromPlan,
  proposeFleetOffsets,
  seededRandom,
  type FleetStation,
  type RotationStep,
} from '../../shared/domain/schedule';
import { stationMessages, type StationSettings, type UnitHardware } from '../../shared/domain/workshop';

export type BenchResult = { name: string; operations: number; seconds: number; perSecond: number; unit: string; notes?: string[] };

function measure(name: string, unit: string, minSeconds: number, batch: () => number): BenchResult {
  batch(); // warm-up
  let operations = 0;
  const start = process.hrtime.bigint();
  let seconds = 0;
  while (seconds < minSeconds) {
    operations += batch();
    seconds = Number(process.hrtime.bigint() - start) / 1e9;
  }
  return { name, operations, seconds, perSecond: operations / seconds, unit };
}

const MESSAGES = ['K1ABC FN42 37', 'PJ4/K1ABC 37', '<PJ4/K1ABC> FK52UD 37', 'K1ABC/P 23', '<K1ABC> FN42AB 10', 'Q1IMW IO91 23'];

/** Full encodings: text → parse → pack → 162 symbols. */
export function benchEncoder(minSeconds = 1): BenchResult {
  return measure('WSPR encoder (text → 162 symbols)', 'encodings/s', minSeconds, () => {
    let n = 0;
    for (let i = 0; i < 2000; i++) {
      const r = encodeMessage(MESSAGES[i % MESSAGES.length]);
      if (!r.ok) throw new Error(r.reason);
      n++;
    }
    return n;
  });
}

/** Expanding one UTC day of two-minute slots (720 slot starts) from a range. */
export function benchSlotExpansion(minSeconds = 1): BenchResult {
  const from = Date.UTC(2026, 0, 1);
  const to = from + 86_400_000;
  return measure('slot plan expansion (one day, 720 slots)', 'slots/s', minSeconds, () => {
    let n = 0;
    for (let i = 0; i < 200; i++) n += slotsInRange(from + i * 1000, to + i * 1000).length;
    return n;
  });
}

const HF_BANDS: readonly BandId[] = ['160m', '80m', '60m', '40m', '30m', '20m', '17m', '15m', '12m', '10m'];
const DAY_MS = 86_400_000;
const BENCH_DAY_MS = Date.UTC(2026, 11, 2);

/** A unit with a covering filter on every HF band, so no step is skipped. */
const benchUnit: UnitHardware = {
  generatorKind: 'pll',
  referenceHz: 25e6,
  tolerancePpm: 0,
  tempCoPpmPerC: null,
  disciplined: true,
  generatorLevelDbm: 23.5,
  attenuatorDb: 0,
  amplifier: null,
  filters: HF_BANDS.map((bandId) => {
    const b = bandFor(bandId, 'itu1');
    if (!b.ok) throw new Error(b.reason);
    return { bands: [bandId], type: 'butterworth', order: 5, cutoffHz: b.band.windowHighHz * 1.1 };
  }),
  dutyCycle: 0.5,
};
const benchStation = (audioOffsetHz: number, locator = 'IO91'): StationSettings => ({
  callsign: 'Q1IMW',
  locator,
  region: 'itu1',
  audioOffsetHz,
  bands: HF_BANDS.map((bandId) => ({ bandId, enabled: true, calibrationOffsetHz: 1.5 })),
});

/** Expanding a week of a three-band rotation with Type 1/3 pairs, one slot in five, staggered. */
export function benchScheduleExpansion(minSeconds = 1): BenchResult {
  const schedule = {
    stationId: 42,
    steps: [
      { bandId: '40m' as const, slots: 2, activeHoursUtc: { fromHour: 18, toHour: 7 } },
      { bandId: '30m' as const, slots: 2, activeHoursUtc: null },
      { bandId: '20m' as const, slots: 2, activeHoursUtc: { fromHour: 6, toHour: 20 } },
    ],
    cadence: { kind: 'duty' as const, dutyPercent: 20 },
    stagger: { stepHz: 3, spanHz: 30 },
    startDate: '2026-12-01',
    endDate: null,
    paused: false,
  };
  const input = { schedule, station: benchStation(1500, 'IO91wm'), unit: benchUnit };
  return measure('schedule expansion (one week, 20 % share, pairs)', 'transmissions/s', minSeconds, () => {
    let n = 0;
    for (let i = 0; i < 20; i++) {
      // the whole expansion, checks included, as a route would call it
      n += expandCompiled(compilePlan(input), BENCH_DAY_MS + i * 60_000, BENCH_DAY_MS + i * 60_000 + 7 * DAY_MS).transmissions.length;
    }
    return n;
  });
}

/**
 * A reproducible fleet, each station planned over one UTC day. `mixed`: 1–3 HF bands, a
 * share of 5–20 %, half of the stations on part-day hours; `dense`: every station all day
 * at 20 %, the worst case (about four times what the 200 Hz windows hold at 10 000 stations).
 */
export function benchFleet(count: number, kind: 'mixed' | 'dense', seed = 5): FleetStation[] {
  const random = seededRandom(seed);
  const pick = <T>(items: readonly T[]): T => items[Math.floor(random() * items.length)];
  const messages = stationMessages(benchStation(1500), benchUnit);
  if (!messages.ok) throw new Error(messages.reason);
  const fleet: FleetStation[] = [];
  for (let i = 0; i < count; i++) {
    const partDay = kind === 'mixed' && random() < 0.5;
    const from = Math.floor(random() * 24);
    const steps: RotationStep[] = Array.from({ length: 1 + Math.floor(random() * 3) }, () => ({
      bandId: pick(HF_BANDS),
      slots: 1 + Math.floor(random() * 3),
      activeHoursUtc: partDay ? { fromHour: from, toHour: (from + 6 + Math.floor(random() * 10)) % 24 } : null,
    }));
    const offsetHz = Math.round((1410 + random() * 175) * 10) / 10;
    const plan = compilePlan({
      schedule: {
        stationId: i,
        steps,
        cadence: { kind: 'duty', dutyPercent: kind === 'dense' ? 20 : 5 + Math.floor(random() * 16) },
        stagger: { stepHz: Math.floor(random() * 4), spanHz: 20 },
        startDate: '2026-12-01',
        endDate: null,
        paused: false,
      },
      station: benchStation(offsetHz),
      unit: benchUnit,
      messages: messages.messages,
    });
    fleet.push(fleetStationFromPlan(i, offsetHz, expandCompiled(plan, BENCH_DAY_MS, BENCH_DAY_MS + DAY_MS).transmissions));
  }
  return fleet;
}

const seconds = (run: () => void): number => {
  const start = process.hrtime.bigint();
  run();
  return Number(process.hrtime.bigint() - start) / 1e9;
};

/** Pairwise time for the whole fleet: timed outright when quick, else on a subset and scaled by the number of pairs. */
function pairwiseSeconds(fleet: FleetStation[], limitSeconds = 60, subsetSize = 2000): { seconds: number; note: string } {
  const probe = fleet.slice(0, Math.min(fleet.length, 500));
  const probeSeconds = seconds(() => findFleetConflictsPairwise(probe));
  const pairs = (n: number) => (n * (n - 1)) / 2;
  const estimate = probeSeconds * (pairs(fleet.length) / pairs(probe.length));
  if (estimate <= limitSeconds) return { seconds: seconds(() => findFleetConflictsPairwise(fleet)), note: 'timed in full' };
  const subset = fleet.slice(0, subsetSize);
  const subsetSeconds = seconds(() => findFleetConflictsPairwise(subset));
  return {
    seconds: subsetSeconds * (pairs(fleet.length) / pairs(subset.length)),
    note: `extrapolated: ${subset.length} stations took ${subsetSeconds.toFixed(1)} s, scaled by the number of station pairs (×${(pairs(fleet.length) / pairs(subset.length)).toFixed(1)})`,
  };
}

/** Fleet stagger: conflicts by the (slot, band) sweep vs every pair of stations, and the offset proposal. */
export function benchFleetStagger(count: number, kind: 'mixed' | 'dense' = 'mixed'): BenchResult {
  const fleet = benchFleet(count, kind);
  const transmissions = fleet.reduce((n, s) => n + s.transmissions.length, 0);
  findFleetConflicts(fleet.slice(0, 200)); // warm-up
  let conflicts = 0;
  // median of three: the sweep is short enough that other load on the machine shows
  const fastRuns = [0, 1, 2].map(() =>
    seconds(() => {
      conflicts = findFleetConflicts(fleet).length;
    }),
  );
  const fastSeconds = fastRuns.sort((a, b) => a - b)[1];
  let moved = 0;
  let remaining = 0;
  const proposeSeconds = seconds(() => {
    const r = proposeFleetOffsets(fleet);
    moved = r.movedCount;
    remaining = r.remaining.length;
  });
  const pairwise = pairwiseSeconds(fleet);
  return {
    name: `fleet stagger, ${count.toLocaleString('en-US')} stations over 24 h (${kind})`,
    operations: transmissions,
    seconds: fastSeconds,
    perSecond: transmissions / fastSeconds,
    unit: 'transmissions/s checked by the sweep',
    notes: [
      `${transmissions.toLocaleString('en-US')} transmissions, ${conflicts.toLocaleString('en-US')} conflicting pairs (guard 6 Hz)`,
      `sweep (fast method): ${fastSeconds.toFixed(2)} s (median of ${fastRuns.map((r) => r.toFixed(2)).join(', ')} s)`,
      `pairwise method: ${pairwise.seconds.toFixed(1)} s (${pairwise.note})`,
      `ratio pairwise / sweep: ${(pairwise.seconds / fastSeconds).toFixed(0)}×`,
      `offset proposal: ${proposeSeconds.toFixed(2)} s, ${moved.toLocaleString('en-US')} stations moved, ${remaining.toLocaleString('en-US')} pairs still meeting`,
    ],
  };
}

export const BENCHMARKS: Record<string, (minSeconds?: number) => BenchResult> = {
  encoder: benchEncoder,
  slots: benchSlotExpansion,
  schedule: benchScheduleExpansion,
  'stagger-1000': () => benchFleetStagger(1_000),
  'stagger-10000': () => benchFleetStagger(10_000),
  'stagger-10000-dense': () => benchFleetStagger(10_000, 'dense'),
};

export function main(names: string[] = Object.keys(BENCHMARKS)): BenchResult[] {
  const load = loadavg()[0].toFixed(1);
  console.log(
    `Faintline core benchmarks, Node ${process.version}, ${process.platform}/${process.arch}, ${cpus().length} CPUs, load average ${load}`,
  );
  const results = names.map((name) => {
    const bench = BENCHMARKS[name];
    if (!bench) throw new Error(`Unknown benchmark '${name}': use ${Object.keys(BENCHMARKS).join(', ')}`);
    const r = bench();
    console.log(`  ${r.name}: ${Math.round(r.perSecond).toLocaleString('en-US')} ${r.unit} (${r.operations} in ${r.seconds.toFixed(2)} s)`);
    for (const note of r.notes ?? []) console.log(`    ${note}`);
    return r;
  });
  return results;
}

if (require.main === module) main(process.argv.slice(2).length ? process.argv.slice(2) : undefined);
