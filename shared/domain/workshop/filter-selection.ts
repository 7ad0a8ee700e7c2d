/**
 * How a unit's low-pass filters are chosen, and the one rule the schedule editor, the club review,
 * the plan and the device configuration share:
 * - `fixed`: one filter is wired in for good (the first one listed); only its bands may go on the air.
 * - `hand`: filters are swapped by hand (headers, plug-in boards); only the bands of the filter
 *   recorded as fitted now may be planned, and the operator records each swap.
 * - `switched`: the controller switches the filters (relays), one control line or code per filter;
 *   a rotation may use every band a filter covers, and each transmission names the filter to select.
 */
import { bandFor, type Band, type BandId, type LicenceRegion } from '../bands';
import { filterCoverage, type InstalledFilter } from './coverage';

export const FILTER_SELECTIONS = ['fixed', 'hand', 'switched'] as const;
export type FilterSelection = (typeof FILTER_SELECTIONS)[number];

export const filterSelectionLabels: Record<FilterSelection, string> = {
  fixed: 'One fixed filter',
  hand: 'Swapped by hand',
  switched: 'Switched by the controller',
};

export type SelectableFilter = InstalledFilter & { controlCode?: string };

export type FilterSetup = {
  filters: readonly SelectableFilter[];
  /** absent = switched (every listed filter can be put in circuit) */
  filterSelection?: FilterSelection;
  /** for hand-swapped filters: the one fitted now, and when (UTC) it was recorded */
  fittedFilter?: { index: number; atUtc?: string } | null;
};

export type FilterToSelect = {
  mode: FilterSelection;
  /** index into the unit's filters */
  index: number;
  bands: readonly BandId[];
  /** what the controller sets to put this filter in circuit (switched filters only) */
  controlCode: string | null;
};

export type FilterChoice =
  { covered: true; filter: SelectableFilter; index: number; select: FilterToSelect } | { covered: false; reason: string };

const bandNames = (bands: readonly BandId[]) => bands.map((b) => b.replace(/m$/, ' m')).join('/');

/** The filters that can be in circuit without anyone touching the unit. */
function filtersInReach(unit: FilterSetup): { index: number; filter: SelectableFilter }[] | { reason: string } {
  const mode = unit.filterSelection ?? 'switched';
  if (mode === 'switched') return unit.filters.map((filter, index) => ({ index, filter }));
  if (mode === 'fixed') return unit.filters.length ? [{ index: 0, filter: unit.filters[0] }] : [];
  const fitted = unit.fittedFilter;
  if (!fitted || fitted.index < 0 || fitted.index >= unit.filters.length) {
    return {
      reason:
        'This unit’s filters are swapped by hand and none is recorded as fitted: record which filter is in the unit ("I fitted the … filter") first.',
    };
  }
  return [{ index: fitted.index, filter: unit.filters[fitted.index] }];
}

/** Which filter serves a band on this unit right now, and how the device selects it; or why none can. */
export function selectFilter(unit: FilterSetup, band: Band): FilterChoice {
  const mode = unit.filterSelection ?? 'switched';
  const reach = filtersInReach(unit);
  if ('reason' in reach) return { covered: false, reason: reach.reason };
  const coverage = filterCoverage(
    reach.map((r) => r.filter),
    band,
  );
  if (coverage.covered) {
    const { index, filter } = reach[coverage.index];
    const code = filter.controlCode?.trim() ?? '';
    return {
      covered: true,
      filter,
      index,
      select: { mode, index, bands: filter.bands, controlCode: mode === 'switched' && code ? code : null },
    };
  }
  if (mode === 'switched') return coverage;
  // a filter for the band exists on the bench but is not in circuit: say what to do
  const elsewhere = filterCoverage(unit.filters, band).covered;
  const inCircuit = reach[0]?.filter;
  const fittedAt =
    mode === 'hand' && unit.fittedFilter?.atUtc ? ` (recorded ${unit.fittedFilter.atUtc.slice(0, 16).replace('T', ' ')} UTC)` : '';
  if (!elsewhere || !inCircuit) return coverage;
  return {
    covered: false,
    reason:
      mode === 'hand'
        ? `The ${bandNames(inCircuit.bands)} filter is fitted${fittedAt} and this unit's filters are swapped by hand, so only ${bandNames(inCircuit.bands)} may be planned: fit the ${band.name} filter and record it, or make the controller switch the filters.`
        : `This unit has one fixed filter, for ${bandNames(inCircuit.bands)}, so ${band.name} cannot be planned: fit a filter for ${band.name} or have the controller switch filters.`,
  };
}

/**
 * A rotation over bands that no single filter in circuit covers needs controller-switched filters.
 * Returns the sentence to show, or null when the rotation is fine as far as filters go.
 */
export function rotationFilterProblem(unit: FilterSetup | null, bandIds: readonly BandId[], region: LicenceRegion): string | null {
  if (!unit || (unit.filterSelection ?? 'switched') === 'switched') return null;
  const distinct = [...new Set(bandIds)];
  if (distinct.length < 2) return null;
  const bands = distinct.map((id) => bandFor(id, region)).flatMap((r) => (r.ok ? [r.band] : []));
  if (bands.every((band) => selectFilter(unit, band).covered)) return null;
  const how = unit.filterSelection === 'hand' ? 'swapped by hand' : 'fixed';
  return `A rotation over several bands (${bands.map((b) => b.name).join(', ')}) needs filters the controller switches; this unit's filters are ${how}, so only the band${bands.filter((b) => selectFilter(unit, b).covered).length === 1 ? '' : 's'} of the filter in circuit may be scheduled. Set the unit's filter selection to "switched by the controller" if it has relays.`;
}
