import { errorResponse, jsonResponse, renderRoute, screenText, stubFetch } from '../../utils/render';

import { fireEvent, screen, waitFor } from '@testing-library/react-native';

import { checkCustomRange, parseUtcInput, rollingRange } from '@/components/receptions/period';
import StationResultsRoute from '@/app/(tabs)/stations/[id]/results';

import { stationFixture } from '../../utils/fixtures';
import { pageFixture, reachFixture, reportFixture } from './fixtures';

// jest runs without dynamic import(): the lazy map and chart chunks render in place here
jest.mock('@/components/map/lazy-world-map', () => ({ LazyWorldMap: jest.requireActual('@/components/map/world-map').default }));
jest.mock('@/components/receptions/lazy-parts', () => ({
  LazyReceptionCharts: jest.requireActual('@/components/receptions/reception-charts').default,
}));

const routes = { 'stations/[id]/results': StationResultsRoute };

function serve(reach = reachFixture(), page = pageFixture()) {
  return stubFetch(({ url }) => {
    if (url.startsWith('/api/stations/12/reach')) return jsonResponse(200, reach);
    if (url.startsWith('/api/stations/12/receptions')) return jsonResponse(200, page);
    if (url === '/api/stations/12') return jsonResponse(200, stationFixture({ bands: [] }));
    return errorResponse(404, 'not-found', `no stub for ${url}`);
  });
}

describe('results screen per station', () => {
  it('when the station has reports, shows the period figures, the chart strips and the reports', async () => {
    serve();
    renderRoute(routes, { initialUrl: '/stations/12/results' });
    expect(await screen.findByLabelText('Reports: 1,284')).toBeOnTheScreen();
    expect(screen.getByLabelText('Receivers: 37')).toBeOnTheScreen();
    expect(screen.getByLabelText('Transmissions heard: 42 %')).toBeOnTheScreen();
    expect(screen.getByLabelText('Furthest receiver: 8,123 km')).toBeOnTheScreen();
    expect(screen.getByLabelText('Median distance: 1,205 km')).toBeOnTheScreen();
    expect(screen.getByLabelText('Best SNR: −3 dB')).toBeOnTheScreen();
    expect(screen.getByLabelText('Distance per watt: 40,617 km/W')).toBeOnTheScreen();
    expect(screenText()).toContain('210 of 500 planned');
    expect(screenText()).toContain('+4 dB referred to 1 W');
    // the lazy chart chunk: one strip per band, with its busiest hour
    await waitFor(() => expect(screenText()).toContain('When each band was heard (UTC hour)'));
    expect(screenText()).toContain('40 m: 80 reports, busiest 03–04 UTC; 20 m: 500 reports, busiest 14–15 UTC');
    // the reports (a phone: one card per report) and the export link carrying the period
    await waitFor(() => expect(screenText()).toContain('Q2ROB'));
    expect(screenText()).toContain('Off plan +2 Hz');
    const csv = screen.getByLabelText('Export CSV');
    expect(String(csv.props.href)).toMatch(/^\/api\/stations\/12\/receptions\?from=.*&to=.*&format=csv$/);
  });

  it('when nobody reported the station, says how reports get in and links to both ways', async () => {
    serve(reachFixture({ reports: 0, receivers: 0, mapReceivers: [], hourBand: [], snrByDistance: [], furthestKm: null, medianKm: null }));
    renderRoute(routes, { initialUrl: '/stations/12/results' });
    expect(await screen.findByLabelText('Set up a listening post')).toBeOnTheScreen();
    expect(screen.getByLabelText('Import a file of reports')).toBeOnTheScreen();
    expect(screenText()).toContain('Reports arrive in two ways');
    expect(screen.queryByLabelText('Export CSV')).toBeNull();
  });

  it('when the reach request fails, shows the server message with a retry', async () => {
    stubFetch(({ url }) =>
      url === '/api/stations/12'
        ? jsonResponse(200, stationFixture())
        : errorResponse(400, 'bad-request', 'from must fall between the years 2000 and 2099'),
    );
    renderRoute(routes, { initialUrl: '/stations/12/results' });
    await waitFor(() => expect(screenText()).toContain('from must fall between the years 2000 and 2099'));
    expect(screen.getByLabelText('Try again')).toBeOnTheScreen();
  });

  it('when the operator picks a band and sorts by distance, asks the server for exactly that', async () => {
    const { calls } = serve(reachFixture(), pageFixture([reportFixture(), reportFixture({ id: 2, rxCallsign: 'Q5KIW' })], 60));
    renderRoute(routes, { initialUrl: '/stations/12/results' });
    await screen.findByLabelText('Reports: 1,284');
    fireEvent.press(screen.getByLabelText('20 m'));
    await waitFor(() => expect(calls.some((c) => c.url.includes('/reach?') && c.url.includes('band=20m'))).toBe(true));
    fireEvent.press(await screen.findByLabelText('Distance'));
    await waitFor(() => expect(calls.some((c) => /receptions\?.*band=20m.*sort=distance&order=desc/.test(c.url))).toBe(true));
    expect(screenText()).toContain('1–25 of 60 · page 1 of 3');
    fireEvent.press(screen.getByLabelText('Next page'));
    await waitFor(() => expect(calls.some((c) => /receptions\?.*page=2/.test(c.url))).toBe(true));
  });
});

describe('period of the results', () => {
  it('a rolling window ends at the next whole minute and spans exactly its length', () => {
    const range = rollingRange('24h', Date.UTC(2026, 11, 2, 15, 0, 30));
    expect(range).toEqual({ from: '2026-12-01T15:01:00.000Z', to: '2026-12-02T15:01:00.000Z' });
  });

  it.each([
    ['2026-11-30 18:00', Date.UTC(2026, 10, 30, 18, 0)],
    ['2026-11-30', Date.UTC(2026, 10, 30)],
    ['2026-02-31 10:00', null],
    ['2026-11-30 25:00', null],
    ['30/11/2026', null],
  ])('reads %s as UTC', (text, expected) => {
    expect(parseUtcInput(text)).toBe(expected);
  });

  it('a custom range must end after it starts', () => {
    expect(checkCustomRange('2026-12-02 10:00', '2026-12-01 10:00')).toEqual({ ok: false, message: 'The end must come after the start.' });
  });
});
