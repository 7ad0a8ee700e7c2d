import { createTestQueryClient, jsonResponse, renderRoute, screenText, stubFetch } from '../utils/render';
import { demoOperator } from '../utils/fixtures';

import { fireEvent, screen, waitFor } from '@testing-library/react-native';

import SettingsRoute from '@/app/(tabs)/settings';
import { sessionKeys } from '@/components/auth/queries';
import { stationKeys } from '@/components/stations/queries';

const operator = demoOperator;

function renderSettings() {
  const queryClient = createTestQueryClient();
  queryClient.setQueryData(sessionKeys.me(), operator);
  queryClient.setQueryData(stationKeys.list(), []);
  return renderRoute({ settings: SettingsRoute }, { initialUrl: '/settings', queryClient });
}

describe('/settings', () => {
  beforeEach(() => localStorage.clear());

  it('when the operator picks Dark, keeps the choice in localStorage', () => {
    stubFetch(() => jsonResponse(200, operator));
    renderSettings();

    fireEvent.press(screen.getByLabelText('Dark'));
    expect(localStorage.getItem('faintline.theme')).toBe('dark');

    fireEvent.press(screen.getByLabelText('System'));
    expect(localStorage.getItem('faintline.theme')).toBeNull();
  });

  it('when the operator signs out, calls the API and forgets the session and cached data', async () => {
    const { calls } = stubFetch(() => jsonResponse(204));
    const { queryClient } = renderSettings();

    fireEvent.press(screen.getByLabelText('Sign out'));

    await waitFor(() => expect(queryClient.getQueryData(sessionKeys.me())).toBeNull());
    expect(calls).toEqual([{ url: '/api/auth/sign-out', method: 'POST', body: undefined }]);
    expect(queryClient.getQueryData(stationKeys.list())).toBeUndefined();
  });

  it('when the operator changes name and callsign, sends them upper-cased and the shell shows the new name', async () => {
    const updated = { ...operator, displayName: 'Ilse Marrow-Venn', callsign: 'Q1IMV' };
    const { calls } = stubFetch(() => jsonResponse(200, updated));
    const { queryClient } = renderSettings();

    expect(screen.getByLabelText('Display name').props.value).toBe('Ilse Marrow');
    fireEvent.changeText(screen.getByLabelText('Display name'), 'Ilse Marrow-Venn');
    fireEvent.changeText(screen.getByLabelText('Your callsign (optional)'), 'q1imv');
    fireEvent.press(screen.getByLabelText('Save account'));

    await waitFor(() =>
      expect(calls).toEqual([{ url: '/api/auth/me', method: 'PATCH', body: { displayName: 'Ilse Marrow-Venn', callsign: 'Q1IMV' } }]),
    );
    await waitFor(() => expect(queryClient.getQueryData(sessionKeys.me())).toEqual(updated));
    await waitFor(() => expect(screenText()).toContain('Saved.'));
  });

  it('when the callsign has no digit, says what to fix and sends nothing', async () => {
    const { calls } = stubFetch(() => jsonResponse(200, operator));
    renderSettings();

    fireEvent.changeText(screen.getByLabelText('Your callsign (optional)'), 'QIMW');
    fireEvent.press(screen.getByLabelText('Save account'));

    await waitFor(() => expect(screenText()).toContain('A callsign needs a digit'));
    expect(calls).toEqual([]);
  });
});
