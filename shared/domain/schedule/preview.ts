/** Figures for the schedule preview: time on the air per band and UTC day, and the duty actually reached. */
import type { BandId } from '../bands';
import { TX_DURATION_MS } from '../timing';
import { dateOfDay, dayOfMs } from './dates';
import type { PlannedTransmission, PlanResult } from './expand';

export type DayBandAirtime = { dateUtc: string; bandId: BandId; transmissions: number; minutesOnAir: number };

/** Per UTC day and band: how many transmissions and how many minutes of signal (162 symbols each). */
export function airtimeByDay(transmissions: readonly PlannedTransmission[]): DayBandAirtime[] {
  const rows = new Map<string, DayBandAirtime>();
  for (const t of transmissions) {
    const dateUtc = dateOfDay(dayOfMs(t.startMs));
    const key = `${dateUtc} ${t.bandId}`;
    const row = rows.get(key) ?? { dateUtc, bandId: t.bandId, transmissions: 0, minutesOnAir: 0 };
    row.transmissions++;
    row.minutesOnAir = (row.transmissions * TX_DURATION_MS) / 60_000;
    rows.set(key, row);
  }
  return [...rows.values()].sort((a, b) => (a.dateUtc === b.dateUtc ? a.bandId.localeCompare(b.bandId) : a.dateUtc < b.dateUtc ? -1 : 1));
}

export type EffectiveDuty = {
  /** transmitted slots / slots on days the schedule runs, 0–1 */
  ofAllSlots: number;
  /** transmitted slots / slots at hours some step may use, 0–1 (what the cadence aims at) */
  ofUsableSlots: number;
};

export function effectiveDuty(result: PlanResult): EffectiveDuty {
  const n = result.transmissions.length;
  return {
    ofAllSlots: result.slotsInSchedule ? n / result.slotsInSchedule : 0,
    ofUsableSlots: result.usableSlots ? n / result.usableSlots : 0,
  };
}
