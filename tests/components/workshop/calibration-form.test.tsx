import { errorResponse, jsonResponse, renderWithProviders, screenText, stubFetch } from '../../utils/render';

import { fireEvent, screen, waitFor } from '@testing-library/react-native';

import { CalibrationForm } from '@/components/workshop/calibration-form';
import { useCalibrationProposalMutation, useSaveCalibrationMutation } from '@/components/workshop/queries';

const proposal = {
  referenceErrorPpm: 4.2,
  errorHz: 29.57,
  offsets: [
    { bandId: '40m', frequencyHz: 7_040_120, calibrationOffsetHz: 29.568504 },
    { bandId: '20m', frequencyHz: 14_097_120, calibrationOffsetHz: 59.207904 },
  ],
};

function Harness({ onSaved }: { onSaved?: () => void }) {
  const propose = useCalibrationProposalMutation(12);
  const save = useSaveCalibrationMutation(12);
  return (
    <CalibrationForm
      region="itu1"
      audioOffsetHz={1520}
      bandIds={['40m', '20m']}
      onPropose={(measurement) => propose.mutateAsync(measurement)}
      onAccept={async (input) => {
        await save.mutateAsync(input);
        onSaved?.();
      }}
    />
  );
}

describe('CalibrationForm', () => {
  it('when the heard frequency is left empty, says what to fill in and sends nothing', async () => {
    const { fetchMock } = stubFetch(() => jsonResponse(500));
    renderWithProviders(<Harness />);

    // the commanded frequency starts as the 40 m dial plus the audio offset
    expect(screen.getByLabelText('Commanded frequency (Hz)').props.value).toBe('7040120');
    fireEvent.press(screen.getByLabelText('Work out the offsets'));

    await waitFor(() => expect(screenText()).toContain('Give the frequency your receiver heard, in Hz'));
    expect(fetchMock).not.toHaveBeenCalled();
  });

  it('when a measurement is proposed, shows the ppm and every offset, and accepting posts the edited values', async () => {
    const { calls } = stubFetch((call) =>
      call.url.endsWith('/calibration/proposal') ? jsonResponse(200, proposal) : jsonResponse(200, { id: 12, bands: [] }),
    );
    const onSaved = jest.fn();
    renderWithProviders(<Harness onSaved={onSaved} />);

    fireEvent.changeText(screen.getByLabelText('Heard frequency (Hz)'), '7040149,6');
    fireEvent.press(screen.getByLabelText('Work out the offsets'));

    await waitFor(() => expect(screenText()).toContain('Proposed offsets'));
    expect(calls[0]).toEqual({
      url: '/api/stations/12/calibration/proposal',
      method: 'POST',
      body: { bandId: '40m', commandedHz: 7040120, observedHz: 7040149.6 },
    });
    expect(screenText()).toContain('+4.200 ppm');
    expect(screen.getByLabelText('Offset for 40 m (Hz)').props.value).toBe('29.57');
    expect(screen.getByLabelText('Offset for 20 m (Hz)').props.value).toBe('59.21');

    fireEvent.changeText(screen.getByLabelText('Offset for 20 m (Hz)'), '58.9');
    fireEvent.press(screen.getByLabelText('Accept offsets'));

    await waitFor(() => expect(onSaved).toHaveBeenCalled());
    expect(calls[1]).toEqual({
      url: '/api/stations/12/calibration',
      method: 'POST',
      body: {
        source: 'measured',
        referenceErrorPpm: 4.2,
        offsets: [
          { bandId: '40m', calibrationOffsetHz: 29.57 },
          { bandId: '20m', calibrationOffsetHz: 58.9 },
        ],
      },
    });
  });

  it('when an edited offset is not a number, says so beside it and does not save', async () => {
    const { calls } = stubFetch(() => jsonResponse(200, proposal));
    renderWithProviders(<Harness />);

    fireEvent.changeText(screen.getByLabelText('Heard frequency (Hz)'), '7040149.6');
    fireEvent.press(screen.getByLabelText('Work out the offsets'));
    await waitFor(() => expect(screenText()).toContain('Proposed offsets'));
    fireEvent.changeText(screen.getByLabelText('Offset for 40 m (Hz)'), 'abc');
    fireEvent.press(screen.getByLabelText('Accept offsets'));

    await waitFor(() => expect(screenText()).toContain('Give the offset in Hz, such as 29.6 or −4.2'));
    expect(calls).toHaveLength(1);
  });

  it('when the server refuses the proposal, shows its message', async () => {
    stubFetch(() => errorResponse(400, 'bad-request', 'Enable 40 m before measuring on it'));
    renderWithProviders(<Harness />);

    fireEvent.changeText(screen.getByLabelText('Heard frequency (Hz)'), '7040149.6');
    fireEvent.press(screen.getByLabelText('Work out the offsets'));

    await waitFor(() => expect(screenText()).toContain('Enable 40 m before measuring on it'));
  });
});
