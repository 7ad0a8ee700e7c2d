/**
 * The conflicts of a fleet found the slow, obvious way: every two stations, slot by
 * slot. For tests and the benchmark only; findFleetConflicts gives the same answer.
 */
import { BAND_IDS } from '../bands';
import { SLOT_MS } from '../timing';
import { bandIndex, DEFAULT_GUARD_HZ, GUARD_TOLERANCE_HZ, type FleetConflict, type FleetOptions, type FleetStation } from './stagger';

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
          let jStop = j;
          while (jStop < tb.length && tb[jStop].slot === slot) jStop++;
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
