import { errorResponse, jsonResponse, renderWithProviders, screenText, stubFetch } from '../../utils/render';

import { fireEvent, screen, waitFor } from '@testing-library/react-native';

import { AlertSettingsForm } from '@/components/health/alert-settings-form';
import { useSaveAlertSettingsMutation } from '@/components/health/queries';

function Harness() {
  const save = useSaveAlertSettingsMutation(11);
  return <AlertSettingsForm settings={{ silentMinutes: 30, clockOffsetMs: 1000 }} onSubmit={(values) => save.mutateAsync(values)} />;
}

describe('AlertSettingsForm', () => {
  it('when the thresholds are out of range, says what to fix and sends nothing', async () => {
    const { calls } = stubFetch(() => jsonResponse(200, {}));
    renderWithProviders(<Harness />);
    fireEvent.changeText(screen.getByLabelText('Silent for (minutes)'), '0');
    fireEvent.changeText(screen.getByLabelText('Clock offset limit (ms)'), '50');
    fireEvent.press(screen.getByLabelText('Save thresholds'));
    await waitFor(() => expect(screenText()).toContain('At least 100 ms'));
    expect(screenText()).toMatch(/Allow at least \d+ minutes? of silence/);
    fireEvent.changeText(screen.getByLabelText('Silent for (minutes)'), 'soon');
    fireEvent.press(screen.getByLabelText('Save thresholds'));
    await waitFor(() => expect(screenText()).not.toMatch(/Allow at least \d+ minutes? of silence/));
    expect(calls).toHaveLength(0);
  });

  it('when the thresholds are valid, saves them with PUT and confirms', async () => {
    const { calls } = stubFetch((call) => jsonResponse(200, call.body));
    renderWithProviders(<Harness />);
    fireEvent.changeText(screen.getByLabelText('Silent for (minutes)'), '15');
    fireEvent.changeText(screen.getByLabelText('Clock offset limit (ms)'), '750');
    fireEvent.press(screen.getByLabelText('Save thresholds'));
    await waitFor(() => expect(screenText()).toContain('Thresholds saved'));
    expect(calls[0]).toEqual({ url: '/api/stations/11/alert-settings', method: 'PUT', body: { silentMinutes: 15, clockOffsetMs: 750 } });
  });

  it('when the server refuses a field, shows its message beside that field', async () => {
    stubFetch(() => errorResponse(400, 'bad-request', 'Check the thresholds', { clockOffsetMs: 'At most 10 000 ms' }));
    renderWithProviders(<Harness />);
    fireEvent.press(screen.getByLabelText('Save thresholds'));
    await waitFor(() => expect(screenText()).toContain('At most 10 000 ms'));
    expect(screenText()).not.toContain('Thresholds saved');
  });
});
