import { createTestQueryClient, jsonResponse, renderRoute, screenText, stubFetch, type FetchCall } from '../../utils/render';
import { demoOperator, stationFixture } from '../../utils/fixtures';

import { act, fireEvent, screen, waitFor } from '@testing-library/react-native';
import { router } from 'expo-router';

import StationDeviceRoute from '@/app/(tabs)/stations/[id]/device';
import { sessionKeys } from '@/components/auth/queries';

import { healthFixture } from './fixtures';

const operator = demoOperator;
const attic = stationFixture();

/** A small fake server: the token exists once created; each POST issues a new one. */
function fakeServer() {
  let issued = 0;
  let hasDevice = false;
  return stubFetch((call: FetchCall) => {
    if (call.url === '/api/stations/12') return jsonResponse(200, attic);
    if (call.url === '/api/stations/12/health')
      return jsonResponse(200, healthFixture({ stationId: 12, hasDevice, online: false, heartbeatAgeS: null, lastHeartbeatAt: null }));
    if (call.url === '/api/stations/12/device-token' && call.method === 'POST') {
      issued += 1;
      hasDevice = true;
      return jsonResponse(201, { token: `fld_secret_token_${issued}` });
    }
    if (call.url === '/api/stations/12/device-token' && call.method === 'DELETE') {
      hasDevice = false;
      return jsonResponse(204);
    }
    return jsonResponse(404, { error: { code: 'not-found', message: 'no such thing' } });
  });
}

function renderDevice() {
  const queryClient = createTestQueryClient();
  queryClient.setQueryData(sessionKeys.me(), operator);
  return renderRoute(
    { 'stations/[id]': () => null, 'stations/[id]/device': StationDeviceRoute, 'health/index': () => null },
    { initialUrl: '/stations/12/device', queryClient },
  );
}

describe('/stations/[id]/device', () => {
  it('when the owner creates a token, shows it once with a copy button and forgets it after leaving the screen', async () => {
    const { calls } = fakeServer();
    renderDevice();
    await waitFor(() => expect(screenText()).toContain('No device yet'));
    expect(screenText()).toContain('/api/device/v1/config');
    expect(screenText()).toContain('Authorization: Bearer');

    fireEvent.press(screen.getByLabelText('Create a device token'));
    await waitFor(() => expect(screenText()).toContain('fld_secret_token_1'));
    expect(screenText()).toContain('You will not see it again');
    expect(screen.getByLabelText('Copy token')).toBeTruthy();
    expect(calls.filter((c) => c.method === 'POST')).toHaveLength(1);

    // another screen on top (the device screen stays in the stack), then back
    act(() => router.push('/health'));
    act(() => router.back());
    await waitFor(() => expect(screenText()).toContain('A token is active'));
    expect(screenText()).not.toContain('fld_secret_token_1');
  });

  it('when the screen is rendered afresh, the token is not there (never cached)', async () => {
    fakeServer();
    const first = renderDevice();
    await waitFor(() => expect(screen.getByLabelText('Create a device token')).toBeTruthy());
    fireEvent.press(screen.getByLabelText('Create a device token'));
    await waitFor(() => expect(screenText()).toContain('fld_secret_token_1'));
    const cache = first.queryClient
      .getQueryCache()
      .getAll()
      .map((q) => JSON.stringify(q.state.data));
    expect(cache.join(' ')).not.toContain('fld_secret_token_1');
    first.unmount();

    renderDevice();
    await waitFor(() => expect(screenText()).toContain('Authorization: Bearer'));
    expect(screenText()).not.toContain('fld_secret_token');
  });

  it('when the owner replaces or revokes the token, asks first and acts only after confirming', async () => {
    const { calls } = fakeServer();
    renderDevice();
    await waitFor(() => expect(screen.getByLabelText('Create a device token')).toBeTruthy());
    fireEvent.press(screen.getByLabelText('Create a device token'));
    await waitFor(() => expect(screen.getByLabelText('I have stored it')).toBeTruthy());
    fireEvent.press(screen.getByLabelText('I have stored it'));
    await waitFor(() => expect(screenText()).toContain('A token is active'));
    expect(screenText()).not.toContain('fld_secret_token_1');

    fireEvent.press(screen.getByLabelText('Replace token of the device'));
    expect(screenText()).toContain('Replace the device token?');
    fireEvent.press(screen.getByLabelText('Cancel'));
    expect(calls.filter((c) => c.method === 'POST')).toHaveLength(1);

    fireEvent.press(screen.getByLabelText('Replace token of the device'));
    fireEvent.press(screen.getByLabelText('Replace token'));
    await waitFor(() => expect(screenText()).toContain('fld_secret_token_2'));
    expect(screenText()).not.toContain('Replace the device token?');
    fireEvent.press(screen.getByLabelText('I have stored it'));

    await waitFor(() => expect(screen.getByLabelText('Revoke token of the device')).toBeTruthy());
    fireEvent.press(screen.getByLabelText('Revoke token of the device'));
    expect(screenText()).toContain('Revoke the device token?');
    expect(calls.some((c) => c.method === 'DELETE')).toBe(false);
    fireEvent.press(screen.getByLabelText('Revoke token'));
    await waitFor(() => expect(calls.some((c) => c.method === 'DELETE')).toBe(true));
    await waitFor(() => expect(screenText()).toContain('No device yet'));
  });
});
