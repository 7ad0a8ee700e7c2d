import { BAND_TABLE, type BandId } from '@/shared/domain/bands';
import { generatorKindLabels, type Unit } from '@/shared/schemas';

/** Bands some filter of the unit is fitted for, lowest first. */
export function filterBands(unit: Pick<Unit, 'filters'>): BandId[] {
  const fitted = new Set(unit.filters.flatMap((filter) => filter.bands));
  return BAND_TABLE.map((band) => band.id).filter((id) => fitted.has(id));
}

export function bandName(id: BandId): string {
  return BAND_TABLE.find((band) => band.id === id)?.name ?? id;
}

/** `Fractional-N PLL · 25 MHz` */
export function generatorSummary(unit: Pick<Unit, 'generatorKind' | 'referenceHz'>): string {
  return `${generatorKindLabels[unit.generatorKind]} · ${Number((unit.referenceHz / 1e6).toPrecision(9))} MHz`;
}

export type UnitSort = 'name' | 'band';

/** Units whose name, label or filter bands contain the words typed, sorted by name or by their lowest band. */
export function filterAndSortUnits(units: readonly Unit[], query: string, sort: UnitSort): Unit[] {
  const words = query.trim().toLowerCase().split(/\s+/).filter(Boolean);
  const order = (unit: Unit) => {
    const bands = filterBands(unit);
    return bands.length ? BAND_TABLE.findIndex((band) => band.id === bands[0]) : BAND_TABLE.length;
  };
  const haystack = (unit: Unit) =>
    [unit.name, unit.serialLabel, ...filterBands(unit).flatMap((id) => [id, bandName(id)])].join(' ').toLowerCase();
  return units
    .filter((unit) => {
      const text = haystack(unit);
      const compact = text.replace(/\s+/g, '');
      return words.every((word) => text.includes(word) || compact.includes(word));
    })
    .sort((a, b) => (sort === 'band' ? order(a) - order(b) : 0) || a.name.localeCompare(b.name));
}

/** unit id → the names of the stations that run on it. */
export function stationsByUnit(stations: readonly { unitId: number | null; name: string }[]): Map<number, string[]> {
  const byUnit = new Map<number, string[]>();
  for (const station of stations)
    if (station.unitId !== null) byUnit.set(station.unitId, [...(byUnit.get(station.unitId) ?? []), station.name]);
  return byUnit;
}
