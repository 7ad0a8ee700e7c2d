/**
 * Benchmarks of the computation core: WSPR encodings per second and slot-plan
 * (timing) expansion speed. Each benchmark is an exported function returning
 * its figures, so more (a fleet stagger benchmark, say) can be added beside them.
 * Run: npm run bench:core
 */
import { encodeMessage, slotsInRange } from '../../shared/domain';

export type BenchResult = { name: string; operations: number; seconds: number; perSecond: number; unit: string };

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

export const BENCHMARKS: Record<string, (minSeconds?: number) => BenchResult> = {
  encoder: benchEncoder,
  slots: benchSlotExpansion,
};

export function main(names: string[] = Object.keys(BENCHMARKS)): BenchResult[] {
  console.log(`Faintline core benchmarks, Node ${process.version}, ${process.platform}/${process.arch}`);
  const results = names.map((name) => {
    const bench = BENCHMARKS[name];
    if (!bench) throw new Error(`Unknown benchmark '${name}': use ${Object.keys(BENCHMARKS).join(', ')}`);
    const r = bench();
    console.log(`  ${r.name}: ${Math.round(r.perSecond).toLocaleString('en-US')} ${r.unit} (${r.operations} in ${r.seconds.toFixed(2)} s)`);
    return r;
  });
  return results;
}

if (require.main === module) main(process.argv.slice(2).length ? process.argv.slice(2) : undefined);
