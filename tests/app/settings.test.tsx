import { createTestQueryClient, jsonResponse, renderRoute, stubFetch } from '../utils/render';

import { fireEvent, screen, waitFor } from '@testing-library/react-native';

import SettingsRoute from '@/app/(tabs)/settings';
import { sessionKeys } from '@/components/auth/queries';
import { stationKeys } from '@/components/stations/queries';
import type { SessionUser } from '@/shared/api/contracts';

const operator: SessionUser = {
  id: 2,
  email: 'operator@faintline.example',
  displayName: 'Ilse Marrow',
  callsign: 'Q1IMW',
  clubs: [],
  adminOfClubIds: [],
};

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
});
