import { errorResponse, jsonResponse, renderWithProviders, screenText, stubFetch } from '../../utils/render';

import { fireEvent, screen, waitFor } from '@testing-library/react-native';

import { useCreateStationMutation } from '@/components/stations/queries';
import { StationForm } from '@/components/stations/station-form';

function NewStationHarness({ onSaved }: { onSaved?: () => void }) {
  const create = useCreateStationMutation();
  return (
    <StationForm
      onSubmit={async (values) => {
        await create.mutateAsync(values);
        onSaved?.();
      }}
    />
  );
}

function fill(values: { name?: string; callsign?: string; locator?: string; notes?: string }) {
  if (values.name !== undefined) fireEvent.changeText(screen.getByLabelText('Name'), values.name);
  if (values.callsign !== undefined) fireEvent.changeText(screen.getByLabelText('Callsign'), values.callsign);
  if (values.locator !== undefined) fireEvent.changeText(screen.getByLabelText('Locator'), values.locator);
  if (values.notes !== undefined) fireEvent.changeText(screen.getByLabelText('Notes'), values.notes);
}

const saved = (body: Record<string, unknown>) => ({
  id: 41,
  ownerId: 7,
  ownerName: 'Ilse Marrow',
  unitId: null,
  region: 'itu1',
  audioOffsetHz: 1500,
  transmitEnabled: false,
  referenceErrorPpm: null,
  bands: [],
  createdAt: '2026-12-02T10:00:00.000Z',
  updatedAt: '2026-12-02T10:00:00.000Z',
  ...body,
});

describe('StationForm', () => {
  it('when the locator is not Maidenhead, shows the error beside it and does not call the API', async () => {
    const { fetchMock } = stubFetch(() => jsonResponse(500));
    renderWithProviders(<NewStationHarness />);

    fill({ name: 'Attic beacon', callsign: 'q1imw', locator: 'ZZ99' });
    fireEvent.press(screen.getByLabelText('Save station'));

    await waitFor(() => expect(screenText()).toContain('Use a 4- or 6-character Maidenhead locator'));
    expect(fetchMock).not.toHaveBeenCalled();
  });

  it('when the values are valid, upper-cases callsign and locator and posts them', async () => {
    const { calls } = stubFetch((call) => jsonResponse(201, saved(call.body as Record<string, unknown>)));
    const onSaved = jest.fn();
    renderWithProviders(<NewStationHarness onSaved={onSaved} />);

    fill({ name: '  Attic beacon ', callsign: 'q1imw/p', locator: 'io91wm', notes: 'End-fed wire' });
    // the callsign is upper-cased while typing (autoCapitalize does nothing on desktop web)
    expect(screen.getByLabelText('Callsign').props.value).toBe('Q1IMW/P');
    fireEvent.press(screen.getByLabelText('Save station'));

    await waitFor(() => expect(onSaved).toHaveBeenCalled());
    expect(calls[0]).toEqual({
      url: '/api/stations',
      method: 'POST',
      body: { name: 'Attic beacon', callsign: 'Q1IMW/P', locator: 'IO91WM', notes: 'End-fed wire' },
    });
  });

  it("when the server rejects a field, shows the server's message beside that field", async () => {
    stubFetch(() => errorResponse(400, 'bad-request', 'Check the marked fields', { callsign: 'That callsign cannot be sent in WSPR' }));
    renderWithProviders(<NewStationHarness />);

    fill({ name: 'Shed rig', callsign: 'Q2TRY', locator: 'JO22' });
    fireEvent.press(screen.getByLabelText('Save station'));

    await waitFor(() => expect(screenText()).toContain('That callsign cannot be sent in WSPR'));
    expect(screenText()).not.toContain('Check the marked fields');
  });
});
