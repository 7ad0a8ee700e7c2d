import { expandPlan } from '@/shared/domain/schedule';
import type { Schedule, Station, Unit } from '@/shared/schemas';

/** The one place the server turns a station's schedule into transmissions (screens, devices, the club). */
export function planFor(station: Station, unit: Unit | null, schedule: Schedule, fromMs: number, toMs: number) {
  return expandPlan({ schedule, station, unit, suspended: station.suspension !== null, fromMs, toMs });
}
