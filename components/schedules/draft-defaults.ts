import { presetsFor } from '@/shared/domain/schedule';
import type { Schedule, ScheduleValues, Station, Unit } from '@/shared/schemas';

import { bandChoices } from './band-choices';
import { utcDate } from '../ui/format';

/** What the editor opens with: the saved schedule, a chosen preset, or one step on the first usable band. */
export function draftDefaults(input: {
  station: Station;
  schedule: Schedule | null;
  unit: Unit | null;
  presetId?: string;
  nowMs: number;
}): { values: ScheduleValues; presets: ReturnType<typeof presetsFor> } {
  const today = utcDate(input.nowMs);
  const usable = bandChoices(input.station, input.unit).filter((c) => c.usable);
  const presets = presetsFor({ enabledBands: usable.map((c) => c.bandId), locator: input.station.locator, startDate: today });
  if (input.schedule) {
    const { id: _id, stationId: _s, createdAt: _c, updatedAt: _u, ...values } = input.schedule;
    return { values, presets };
  }
  const preset = presets.find((p) => p.preset.id === input.presetId);
  if (preset) return { values: { ...preset.schedule }, presets };
  return {
    values: {
      name: 'Band rotation',
      steps: usable.length ? [{ bandId: usable[0].bandId, slots: 1, activeHoursUtc: null }] : [],
      cadence: { kind: 'duty', dutyPercent: 20 },
      stagger: { stepHz: 0, spanHz: 0 },
      startDate: today,
      endDate: null,
      paused: false,
    },
    presets,
  };
}
