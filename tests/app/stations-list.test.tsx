import { errorResponse, jsonResponse, pendingFetch, renderRoute, screenText, stubFetch } from '../utils/render';
import { stationFixture } from '../utils/fixtures';

import { fireEvent, screen, waitFor } from '@testing-library/react-native';

import StationsRoute from '@/app/(tabs)/stations/index';
import type { Station } from '@/shared/schemas';

function renderStations() {
  return renderRoute({ 'stations/index': StationsRoute, 'stations/new': () => null }, { initialUrl: '/stations' });
}

const station = (overrides: Partial<Station>) => stationFixture({ id: 1, ownerId: 7, createdAt: '2026-11-30T09:00:00.000Z', ...overrides });

describe('/stations', () => {
  it('while the list loads, shows a loading state', () => {
    pendingFetch();
    renderStations();

    expect(screen.getByLabelText('Loading your stations…')).toBeTruthy();
  });

  it('when the operator has no stations, shows the empty state with a call to action', async () => {
    stubFetch(() => jsonResponse(200, []));
    const router = renderStations();

    await waitFor(() => expect(screenText()).toContain('No stations yet'));
    fireEvent.press(screen.getByLabelText('Add your first station'));

    await waitFor(() => expect(router.getPathname()).toBe('/stations/new'));
  });

  it('when the server fails, shows the error and loads again on retry', async () => {
    let attempts = 0;
    stubFetch((call) => {
      if (call.url.includes('/fleet/health')) return jsonResponse(200, []); // the devices' state beside each station
      attempts += 1;
      return attempts === 1
        ? errorResponse(503, 'unavailable', 'The database is not answering right now.')
        : jsonResponse(200, [station({}), station({ id: 2, name: 'Garden mast', locator: 'IO91' })]);
    });
    renderStations();

    await waitFor(() => expect(screenText()).toContain('The database is not answering right now.'));
    fireEvent.press(screen.getByLabelText('Try again'));

    // each row is a link named by what it shows
    await waitFor(() => expect(screenText()).toContain('Garden mast'));
    expect(screenText()).toContain('Attic beacon');
    expect(screenText()).toContain('IO91wm'); // subsquare in its usual lower case
    expect(attempts).toBe(2);
  });
});
