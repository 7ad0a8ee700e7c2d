import { bandFor, type Band } from '@/shared/domain/bands';
import { rotationFilterProblem, selectFilter, type FilterSetup } from '@/shared/domain/workshop/filter-selection';

const band = (id: string): Band => {
  const r = bandFor(id, 'itu1');
  if (!r.ok) throw new Error(r.reason);
  return r.band;
};

// Cut-offs above the window top and below twice the dial (the coverage rule); values common practice, no source
const filters = [
  { bands: ['40m' as const], type: 'chebyshev-0.5', order: 5, cutoffHz: 7.8e6, controlCode: 'K1' },
  { bands: ['20m' as const], type: 'chebyshev-0.5', order: 5, cutoffHz: 15.6e6, controlCode: 'K2' },
];

describe('selectFilter', () => {
  it('when the controller switches the filters, each band gets its filter and its control code', () => {
    const unit: FilterSetup = { filters, filterSelection: 'switched' };
    expect(selectFilter(unit, band('20m'))).toMatchObject({ covered: true, select: { mode: 'switched', index: 1, controlCode: 'K2' } });
    expect(selectFilter(unit, band('40m'))).toMatchObject({ covered: true, select: { index: 0, controlCode: 'K1' } });
  });

  it('when filters are swapped by hand, only the band of the fitted filter is served, and the refusal says what to do', () => {
    const unit: FilterSetup = { filters, filterSelection: 'hand', fittedFilter: { index: 0, atUtc: '2026-12-02T10:04:00.000Z' } };
    expect(selectFilter(unit, band('40m'))).toMatchObject({ covered: true, select: { mode: 'hand', index: 0, controlCode: null } });
    const r = selectFilter(unit, band('20m'));
    expect(r.covered).toBe(false);
    if (!r.covered) expect(r.reason).toMatch(/40 m filter is fitted \(recorded 2026-12-02 10:04 UTC\).*fit the 20 m filter and record it/);
  });

  it('when filters are swapped by hand and none is recorded, asks for the record', () => {
    const r = selectFilter({ filters, filterSelection: 'hand', fittedFilter: null }, band('40m'));
    expect(r.covered === false && r.reason).toMatch(/none is recorded as fitted/);
  });

  it('when the unit has one fixed filter, only the first filter counts', () => {
    const unit: FilterSetup = { filters, filterSelection: 'fixed' };
    expect(selectFilter(unit, band('40m')).covered).toBe(true);
    expect(selectFilter(unit, band('20m')).covered).toBe(false);
  });
});

describe('rotationFilterProblem', () => {
  it('when a two-band rotation runs on hand-swapped filters, names the rule; switched filters are fine', () => {
    const hand: FilterSetup = { filters, filterSelection: 'hand', fittedFilter: { index: 0 } };
    expect(rotationFilterProblem(hand, ['40m', '20m'], 'itu1')).toMatch(/needs filters the controller switches/);
    expect(rotationFilterProblem(hand, ['40m', '40m'], 'itu1')).toBeNull();
    expect(rotationFilterProblem({ ...hand, filterSelection: 'switched' }, ['40m', '20m'], 'itu1')).toBeNull();
  });

  it('when one hand-fitted filter serves both bands of the rotation, allows it', () => {
    const dual: FilterSetup = {
      filters: [{ bands: ['30m', '40m'], type: 'chebyshev-0.5', order: 5, cutoffHz: 10.5e6 }],
      filterSelection: 'hand',
      fittedFilter: { index: 0 },
    };
    expect(rotationFilterProblem(dual, ['40m', '30m'], 'itu1')).toBeNull();
  });
});
