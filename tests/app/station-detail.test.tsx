import { createTestQueryClient, jsonResponse, renderRoute, screenText, stubFetch } from '../utils/render';
import { demoOperator, stationFixture } from '../utils/fixtures';

import { fireEvent, screen, waitFor } from '@testing-library/react-native';

import StationDetailRoute from '@/app/(tabs)/stations/[id]';
import { sessionKeys } from '@/components/auth/queries';
import type { SessionUser } from '@/shared/api/contracts';

const operator: SessionUser = { ...demoOperator, clubs: [{ clubId: 1, clubName: 'Saltmarsh Beacon Circle', role: 'member' }] };
const admin: SessionUser = {
  ...operator,
  id: 1,
  email: 'admin@faintline.example',
  displayName: 'Hanne Stoll',
  callsign: 'Q3HST',
  clubs: [{ clubId: 1, clubName: 'Saltmarsh Beacon Circle', role: 'admin' }],
  adminOfClubIds: [1],
};
const attic = stationFixture({ notes: 'End-fed wire under the roof tiles.' });

function renderDetail(user: SessionUser) {
  const queryClient = createTestQueryClient();
  queryClient.setQueryData(sessionKeys.me(), user);
  return renderRoute({ 'stations/index': () => null, 'stations/[id]': StationDetailRoute }, { initialUrl: '/stations/12', queryClient });
}

describe('/stations/[id]', () => {
  it('when the owner presses Delete, asks first and deletes only after confirming', async () => {
    const { calls } = stubFetch((call) => (call.method === 'DELETE' ? jsonResponse(204) : jsonResponse(200, attic)));
    renderDetail(operator);

    await waitFor(() => expect(screen.getByLabelText('Delete Attic beacon')).toBeTruthy());
    expect(screen.getByLabelText('Edit Attic beacon')).toBeTruthy();
    fireEvent.press(screen.getByLabelText('Delete Attic beacon'));

    expect(screenText()).toContain('Delete this station?');
    expect(calls.some((call) => call.method === 'DELETE')).toBe(false);
    fireEvent.press(screen.getByLabelText('Delete station'));

    await waitFor(() => expect(calls.some((call) => call.method === 'DELETE')).toBe(true));
    expect(calls.find((call) => call.method === 'DELETE')?.url).toBe('/api/stations/12');
  });

  it('when the owner cancels the question, nothing is deleted', async () => {
    const { calls } = stubFetch(() => jsonResponse(200, attic));
    renderDetail(operator);

    await waitFor(() => expect(screen.getByLabelText('Delete Attic beacon')).toBeTruthy());
    fireEvent.press(screen.getByLabelText('Delete Attic beacon'));
    fireEvent.press(screen.getByLabelText('Cancel'));

    expect(screenText()).not.toContain('Delete this station?');
    expect(calls.every((call) => call.method === 'GET')).toBe(true);
  });

  it("when a club admin opens a member's station, shows it read-only without Edit or Delete", async () => {
    stubFetch(() => jsonResponse(200, attic));
    renderDetail(admin);

    await waitFor(() => expect(screenText()).toContain('Read-only: this station belongs to Ilse Marrow'));
    expect(screen.queryByLabelText('Edit Attic beacon')).toBeNull();
    expect(screen.queryByLabelText('Delete Attic beacon')).toBeNull();
  });
});
