import { errorResponse, jsonResponse, renderWithProviders, screenText, stubFetch } from '../../utils/render';

import { fireEvent, screen, waitFor } from '@testing-library/react-native';

import { useCreateUnitMutation } from '@/components/units/queries';
import { UnitForm } from '@/components/units/unit-form';
import { filterAndSortUnits } from '@/components/units/unit-summary';
import type { Unit } from '@/shared/schemas';

function Harness({ onSaved }: { onSaved?: () => void }) {
  const create = useCreateUnitMutation();
  return (
    <UnitForm
      onSubmit={async (values) => {
        await create.mutateAsync(values);
        onSaved?.();
      }}
    />
  );
}

function fillBasics() {
  fireEvent.changeText(screen.getByLabelText('Unit name'), 'Balcony board');
  fireEvent.changeText(screen.getByLabelText('Tolerance (± ppm)'), '10');
  fireEvent.changeText(screen.getByLabelText('Generator output (dBm)'), '10');
  fireEvent.press(screen.getByLabelText('Add a filter'));
  fireEvent.press(screen.getByLabelText('Filter 1: 40 m'));
  fireEvent.changeText(screen.getByLabelText('Filter 1 cut-off (MHz)'), '7,8');
}

describe('UnitForm', () => {
  it('when the values are valid, posts the unit with MHz turned into Hz and shows the power arithmetic', async () => {
    const { calls } = stubFetch((call) => jsonResponse(201, { id: 5, photos: [], ...(call.body as object) }));
    const onSaved = jest.fn();
    renderWithProviders(<Harness onSaved={onSaved} />);

    fillBasics();
    expect(screenText()).toContain('Reported power in the message');
    fireEvent.press(screen.getByLabelText('Save unit'));

    await waitFor(() => expect(onSaved).toHaveBeenCalled());
    const body = calls[0].body as Record<string, unknown>;
    expect(calls[0].url).toBe('/api/units');
    expect(body).toMatchObject({
      name: 'Balcony board',
      referenceHz: 25e6,
      tolerancePpm: 10,
      generatorLevelDbm: 10,
      filters: [{ bands: ['40m'], type: 'chebyshev-0.5', order: 5, cutoffHz: 7.8e6 }],
    });
  });

  it("when the server rejects a filter's cut-off, shows its message beside that filter's field", async () => {
    stubFetch(() =>
      errorResponse(400, 'bad-request', 'Check the marked fields', { 'filters.0.cutoffHz': 'The cut-off must be below 500 MHz' }),
    );
    renderWithProviders(<Harness />);

    fillBasics();
    fireEvent.press(screen.getByLabelText('Save unit'));

    await waitFor(() => expect(screenText()).toContain('The cut-off must be below 500 MHz'));
    expect(screenText()).not.toContain('Check the marked fields');
  });

  it('when a number field is left empty, says to fill it in and sends nothing', async () => {
    const { fetchMock } = stubFetch(() => jsonResponse(500));
    renderWithProviders(<Harness />);

    fireEvent.changeText(screen.getByLabelText('Unit name'), 'Bare board');
    fireEvent.press(screen.getByLabelText('Save unit'));

    await waitFor(() => expect(screenText()).toContain('Fill this in (a number)'));
    expect(fetchMock).not.toHaveBeenCalled();
  });
});

describe('filterAndSortUnits', () => {
  const unit = (id: number, name: string, bands: string[][]) =>
    ({
      id,
      name,
      serialLabel: '',
      filters: bands.map((b) => ({ bands: b, type: 'butterworth', order: 5, cutoffHz: 1e6 })),
    }) as unknown as Unit;
  const units = [unit(1, 'Shed kit', [['20m']]), unit(2, 'Attic board', [['40m'], ['20m']]), unit(3, 'Loft board', [['80m']])];

  it.each([
    ['', 'name', ['Attic board', 'Loft board', 'Shed kit']],
    ['', 'band', ['Loft board', 'Attic board', 'Shed kit']],
    ['20 m', 'name', ['Attic board', 'Shed kit']],
    ['board', 'band', ['Loft board', 'Attic board']],
  ] as const)('when filtered by “%s” and sorted by %s, lists %j', (query, sort, names) => {
    expect(filterAndSortUnits(units, query, sort).map((u) => u.name)).toEqual(names);
  });
});
