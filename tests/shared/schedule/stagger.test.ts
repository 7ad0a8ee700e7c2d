import fc from 'fast-check';
import type { BandId } from '../../../shared/domain/bands';
import {
  allowedOffsetRange,
  expandPlan,
  findFleetConflicts,
  findFleetConflictsPairwise,
  fleetFromSchedules,
  fleetStationFromPlan,
  proposeFleetOffsets,
  type FleetStation,
} from '../../../shared/domain/schedule';
import { TONE_SPACING_HZ } from '../../../shared/domain/tones';
import { DAY_MS, DEC_2_2026, rules, stationOn, unitWithFilters } from './fixtures';

const SLOT_MS = 120_000;
const DIAL_HZ: Partial<Record<BandId, number>> = { '40m': 7_038_600, '30m': 10_138_700, '20m': 14_095_600 };
const FLEET_BANDS = ['40m', '30m', '20m'] as const;

const tx = (slot: number, bandId: (typeof FLEET_BANDS)[number], audioHz: number) => ({
  startMs: DEC_2_2026 + slot * SLOT_MS + 1000,
  bandId,
  dialHz: DIAL_HZ[bandId]!,
  carrierHz: DIAL_HZ[bandId]! + audioHz,
});

/** Random fleets crowded into 30 slots, 3 bands and a narrow offset range, so conflicts are common. */
const crowdedFleetArb = (constantOffset: boolean, maxStations: number) =>
  fc
    .array(
      fc.record({
        offsetHz: fc.double({ min: 1480, max: 1520, noNaN: true }),
        txs: fc.uniqueArray(
          fc.record({
            slot: fc.integer({ min: 0, max: 29 }),
            band: fc.constantFrom(...FLEET_BANDS),
            wobbleHz: fc.double({ min: -15, max: 15, noNaN: true }),
          }),
          { selector: (t) => t.slot, maxLength: 12 },
        ),
      }),
      { minLength: 2, maxLength: maxStations },
    )
    .map((stations): FleetStation[] =>
      stations.map((s, i) => ({
        stationId: 100 + i,
        currentOffsetHz: s.offsetHz,
        transmissions: s.txs.map((t) => tx(t.slot, t.band, s.offsetHz + (constantOffset ? 0 : t.wobbleHz))),
      })),
    );

/** Straightforward check: all four tones of every transmission inside dial + 1400 … 1600 Hz (WSPR protocol description). */
function tonesInside(station: FleetStation, shiftHz: number) {
  return station.transmissions.every((t) => {
    const low = t.carrierHz + shiftHz - t.dialHz;
    return low >= 1400 && low + 3 * TONE_SPACING_HZ <= 1600;
  });
}

describe('findFleetConflicts', () => {
  it('when two stations share slots and offset and a third sits 40 Hz away, reports only the pair', () => {
    const fleet: FleetStation[] = [
      { stationId: 'Q1IMW', currentOffsetHz: 1500, transmissions: [tx(3, '20m', 1500), tx(8, '20m', 1500), tx(9, '40m', 1500)] },
      { stationId: 'Q2TRY', currentOffsetHz: 1503, transmissions: [tx(3, '20m', 1503), tx(8, '20m', 1503), tx(9, '30m', 1503)] },
      { stationId: 'QA9ZZT', currentOffsetHz: 1540, transmissions: [tx(3, '20m', 1540)] },
    ];
    const expected = [{ a: 'Q1IMW', b: 'Q2TRY', bandId: '20m', slotCount: 2, firstSlotUtc: '2026-12-02T00:06:00.000Z' }];
    expect(findFleetConflicts(fleet)).toEqual(expected);
    expect(findFleetConflictsPairwise(fleet)).toEqual(expected);
    // the guard is strict: carriers exactly 3 Hz apart do not meet under a 3 Hz guard
    expect(findFleetConflicts(fleet, { guardHz: 3 })).toEqual([]);
  });

  it('when random crowded fleets are checked, the sweep finds exactly the conflicts the pairwise method finds', () => {
    fc.assert(
      fc.property(crowdedFleetArb(false, 12), fc.double({ min: 0.5, max: 12, noNaN: true }), (fleet, guardHz) => {
        expect(findFleetConflicts(fleet, { guardHz })).toEqual(findFleetConflictsPairwise(fleet, { guardHz }));
      }),
      { numRuns: 1000 },
    );
  });
});

describe('proposeFleetOffsets', () => {
  it('when two stations meet, moves one of them by the least that clears the guard', () => {
    const fleet: FleetStation[] = [
      { stationId: 1, currentOffsetHz: 1500, transmissions: [tx(3, '20m', 1500), tx(4, '20m', 1500)] },
      { stationId: 2, currentOffsetHz: 1502, transmissions: [tx(3, '20m', 1502)] },
    ];
    const r = proposeFleetOffsets(fleet);
    expect(r.movedCount).toBe(1);
    // station 1 meets station 2 in one slot and has more transmissions, so it goes first: 1502 − 6 = 1496
    expect(r.proposals).toEqual([
      { stationId: 1, currentOffsetHz: 1500, proposedOffsetHz: 1496 },
      { stationId: 2, currentOffsetHz: 1502, proposedOffsetHz: 1502 },
    ]);
    expect(r.remaining).toEqual([]);
  });

  it('when the fleet has room (constant offsets, few stations), the proposal removes every conflict and keeps tones inside', () => {
    // at most 8 stations × 2 × 6 Hz of blocked shifts is less than the ~190 Hz a station may move
    fc.assert(
      fc.property(crowdedFleetArb(true, 8), (fleet) => {
        const r = proposeFleetOffsets(fleet);
        expect(r.remaining).toEqual([]);
        expect(r.unresolved).toEqual([]);
        expect(findFleetConflictsPairwise(shifted(fleet, r.proposals))).toEqual([]);
        fleet.forEach((s, i) => expect(tonesInside(s, r.proposals[i].proposedOffsetHz - s.currentOffsetHz)).toBe(true));
        expect(r.movedCount).toBeLessThanOrEqual(fleet.length - 1);
      }),
      { numRuns: 1000 },
    );
  });

  it('when any crowded fleet is separated, the meetings only go down, the report matches a pairwise recount, and tones stay inside', () => {
    const meetings = (list: { slotCount: number }[]) => list.reduce((sum, c) => sum + c.slotCount, 0);
    fc.assert(
      fc.property(crowdedFleetArb(false, 16), (fleet) => {
        const r = proposeFleetOffsets(fleet);
        expect(meetings(r.remaining)).toBeLessThanOrEqual(meetings(r.conflicts));
        expect(r.conflicts).toEqual(findFleetConflictsPairwise(fleet));
        expect(findFleetConflictsPairwise(shifted(fleet, r.proposals))).toEqual(r.remaining);
        // every station named in a remaining conflict is reported unresolved, or met one that is
        const unresolved = new Set(r.unresolved);
        expect(r.remaining.every((c) => unresolved.has(c.a) || unresolved.has(c.b))).toBe(true);
        fleet.forEach((s, i) => expect(tonesInside(s, r.proposals[i].proposedOffsetHz - s.currentOffsetHz)).toBe(true));
      }),
      { numRuns: 300 },
    );
  });

  it('when told to move only to clear offsets, conflicts remain only between stations it left alone', () => {
    fc.assert(
      fc.property(crowdedFleetArb(false, 16), (fleet) => {
        const r = proposeFleetOffsets(fleet, { moveOnlyWhenClear: true });
        const moved = new Set(r.proposals.filter((p) => p.proposedOffsetHz !== p.currentOffsetHz).map((p) => p.stationId));
        expect(moved.size).toBe(r.movedCount);
        expect(r.remaining.every((c) => !moved.has(c.a) && !moved.has(c.b))).toBe(true);
        expect(findFleetConflictsPairwise(shifted(fleet, r.proposals))).toEqual(r.remaining);
      }),
      { numRuns: 300 },
    );
  });

  it('when three stations on one schedule collide every slot, re-planning with the proposed offsets leaves no conflict', () => {
    const unit = unitWithFilters(['20m']);
    const schedule = rules({ cadence: { kind: 'every-nth', nth: 5 } });
    const plan = (id: number, offsetHz: number) => {
      const station = stationOn(['20m'], { audioOffsetHz: offsetHz });
      return fleetStationFromPlan(
        id,
        offsetHz,
        expandPlan({ schedule: { ...schedule, stationId: id }, station, unit, fromMs: DEC_2_2026, toMs: DEC_2_2026 + DAY_MS })
          .transmissions,
      );
    };
    const fleet = [plan(1, 1500), plan(2, 1501), plan(3, 1499)];
    const r = proposeFleetOffsets(fleet);
    expect(r.conflicts).toHaveLength(3);
    expect(r.movedCount).toBe(2);
    const replanned = r.proposals.map((p) => plan(p.stationId as number, p.proposedOffsetHz));
    expect(findFleetConflicts(replanned)).toEqual([]);
    // the same fleet built from schedules and settings
    const inputs = r.proposals.map((p) => ({
      schedule: { ...schedule, stationId: p.stationId },
      station: stationOn(['20m'], { audioOffsetHz: p.proposedOffsetHz }),
      unit,
    }));
    expect(fleetFromSchedules(inputs, DEC_2_2026, DEC_2_2026 + DAY_MS)).toEqual(replanned);
    const { lowHz, highHz } = allowedOffsetRange();
    expect(r.proposals.every((p) => p.proposedOffsetHz >= lowHz && p.proposedOffsetHz <= highHz)).toBe(true);
  });
});

function shifted(fleet: FleetStation[], proposals: { proposedOffsetHz: number; currentOffsetHz: number }[]): FleetStation[] {
  return fleet.map((s, i) => {
    const shiftHz = proposals[i].proposedOffsetHz - proposals[i].currentOffsetHz;
    return { ...s, transmissions: s.transmissions.map((t) => ({ ...t, carrierHz: t.carrierHz + shiftHz })) };
  });
}
