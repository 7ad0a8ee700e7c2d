import type { Href } from 'expo-router';

import type { StationAtAGlance } from '@/shared/api/receptions';
import type { Station, StationHealth, Unit } from '@/shared/schemas';

export type FirstStep = { key: string; title: string; detail: string; done: boolean; href: Href };

export type FirstStepsInput = {
  units: Unit[];
  stations: Station[];
  health: StationHealth[];
  glances: StationAtAGlance[];
};

/** The beacon's life in six steps, each ticked off by what the account already has, each linking to where it is done. */
export function firstSteps({ units, stations, health, glances }: FirstStepsInput): FirstStep[] {
  const first = stations[0];
  const at = (pathname: string): Href => (first ? ({ pathname, params: { id: String(first.id) } } as Href) : ('/stations/new' as Href));
  return [
    {
      key: 'unit',
      title: 'Register a unit',
      detail: 'The beacon hardware: its reference, filters and power chain.',
      done: units.length > 0,
      href: '/units/new',
    },
    {
      key: 'station',
      title: 'Add a station',
      detail: 'Your callsign and locator, on that unit.',
      done: stations.length > 0,
      href: '/stations/new',
    },
    {
      key: 'band',
      title: 'Enable and calibrate a band',
      detail: 'Switch on a band the unit’s filters cover, then measure its offset so the tones land in the window.',
      done: stations.some((s) => s.bands.some((b) => b.enabled && b.calibrationOffsetHz !== null)),
      href: at('/stations/[id]/bands'),
    },
    {
      key: 'schedule',
      title: 'Make a schedule',
      detail: 'Which bands, which 2-minute UTC slots.',
      done: glances.some((g) => g.nextTransmission !== null),
      href: first ? ({ pathname: '/stations/[id]/schedule/edit', params: { id: String(first.id) } } as Href) : ('/stations/new' as Href),
    },
    {
      key: 'token',
      title: 'Create a device token',
      detail: 'The beacon uses it to fetch its plan and report back.',
      done: health.some((h) => h.hasDevice),
      href: at('/stations/[id]/device'),
    },
    {
      key: 'heard',
      title: 'See it heard',
      detail: 'Reception reports show who decoded your beacon, and how far away.',
      done: glances.some((g) => g.lastHeard !== null),
      href: at('/stations/[id]/results'),
    },
  ];
}
