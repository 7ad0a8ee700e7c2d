import { bandsFor, type BandId } from '@/shared/domain';
import { checkStep } from '@/shared/domain/schedule';
import type { Station, Unit } from '@/shared/schemas';

export type BandChoice = { bandId: BandId; name: string; usable: boolean; reason?: string };

/** Every band of the station's region, and whether a rotation step may use it (enabled and filtered), and why not. */
export function bandChoices(station: Station, unit: Unit | null): BandChoice[] {
  return bandsFor(station.region).map((band) => {
    const check = checkStep({ bandId: band.id, slots: 1, activeHoursUtc: null }, station, unit);
    return check.ok
      ? { bandId: band.id, name: band.name, usable: true }
      : { bandId: band.id, name: band.name, usable: false, reason: check.reason };
  });
}
