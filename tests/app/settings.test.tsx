import { createTestQueryClient, errorResponse, jsonResponse, renderRoute, screenText, stubFetch } from '../utils/render';
import { demoOperator } from '../utils/fixtures';

import { fireEvent, screen, waitFor } from '@testing-library/react-native';

import SettingsRoute from '@/app/(tabs)/settings';
import { accountKeys } from '@/components/account/queries';
import { sessionKeys } from '@/components/auth/queries';
import type { AccountDeletionPreview } from '@/shared/api/answers';
import { stationKeys } from '@/components/stations/queries';

const operator = demoOperator;

const preview: AccountDeletionPreview = {
  stations: 2,
  deviceTokens: 1,
  units: 1,
  listeningPosts: 0,
  clubs: [{ clubId: 3, clubName: 'Marsh Lane Radio Circle', outcome: 'leave' }],
  allowed: true,
};

/** The settings cards' own reads, answered as the server would for this operator. */
const reads = (call: { url: string; method: string }, deletion = preview) =>
  call.url === '/api/auth/account/deletion' ? jsonResponse(200, deletion) : jsonResponse(200, null);
const writes = (calls: { method: string }[]) => calls.filter((call) => call.method !== 'GET');

function renderSettings(deletion: AccountDeletionPreview = preview) {
  const queryClient = createTestQueryClient();
  queryClient.setQueryData(sessionKeys.me(), operator);
  queryClient.setQueryData(stationKeys.list(), []);
  queryClient.setQueryData(accountKeys.emailChange(), null);
  queryClient.setQueryData(accountKeys.deletion(), deletion);
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
    // (the settings cards read their data again once the cache is emptied; only the sign-out is sent)
    expect(writes(calls)).toEqual([{ url: '/api/auth/sign-out', method: 'POST', body: undefined }]);
    expect(queryClient.getQueryData(stationKeys.list())).toBeUndefined();
  });

  it('when the operator changes name and callsign, sends them upper-cased and the shell shows the new name', async () => {
    const updated = { ...operator, displayName: 'Ilse Marrow-Venn', callsign: 'Q1IMV' };
    const { calls } = stubFetch((call) => (call.method === 'GET' ? reads(call) : jsonResponse(200, updated)));
    const { queryClient } = renderSettings();

    expect(screen.getByLabelText('Display name').props.value).toBe('Ilse Marrow');
    fireEvent.changeText(screen.getByLabelText('Display name'), 'Ilse Marrow-Venn');
    fireEvent.changeText(screen.getByLabelText('Your callsign (optional)'), 'q1imv');
    fireEvent.press(screen.getByLabelText('Save account'));

    await waitFor(() =>
      expect(writes(calls)).toEqual([
        { url: '/api/auth/me', method: 'PATCH', body: { displayName: 'Ilse Marrow-Venn', callsign: 'Q1IMV' } },
      ]),
    );
    await waitFor(() => expect(queryClient.getQueryData(sessionKeys.me())).toEqual(updated));
    await waitFor(() => expect(screenText()).toContain('Saved.'));
  });

  it('when the callsign has no digit, says what to fix and sends nothing', async () => {
    const { calls } = stubFetch((call) => (call.method === 'GET' ? reads(call) : jsonResponse(200, operator)));
    renderSettings();

    fireEvent.changeText(screen.getByLabelText('Your callsign (optional)'), 'QIMW');
    fireEvent.press(screen.getByLabelText('Save account'));

    await waitFor(() => expect(screenText()).toContain('A callsign needs a digit'));
    expect(writes(calls)).toEqual([]);
  });

  it('when the operator signs out everywhere else, asks first and then says how many sessions ended', async () => {
    const { calls } = stubFetch((call) => (call.method === 'GET' ? reads(call) : jsonResponse(200, { ended: 3 })));
    renderSettings();

    fireEvent.press(screen.getByLabelText('Sign out everywhere else'));
    expect(screenText()).toContain('Sign out everywhere else?');
    expect(writes(calls)).toEqual([]);
    fireEvent.press(screen.getByLabelText('Sign out the others'));

    await waitFor(() => expect(screenText()).toContain('3 other sessions were signed out.'));
    expect(writes(calls)).toEqual([{ url: '/api/auth/sessions/end-others', method: 'POST', body: undefined }]);
    // (the router's screen container hides its subtree from RNTL's role queries; read the host's role instead)
    const status = screen.UNSAFE_root.findAll((node) => typeof node.type === 'string' && node.props.role === 'status');
    expect(status).toHaveLength(1);
    expect(status[0]).toHaveTextContent('3 other sessions were signed out.');
  });

  it('lists what deleting the account takes, asks for the password, asks again, then deletes and signs out', async () => {
    const { calls } = stubFetch((call) =>
      call.url === '/api/auth/account/delete' ? jsonResponse(200, { message: 'Your account is deleted.' }) : reads(call),
    );
    const { queryClient } = renderSettings();
    expect(screenText()).toContain('Your 2 stations go');
    expect(screenText()).toContain('You leave Marsh Lane Radio Circle');

    fireEvent.press(screen.getByLabelText('Delete my account…'));
    await waitFor(() => expect(screenText()).toContain('Enter your current password'));
    expect(writes(calls)).toEqual([]);

    fireEvent.changeText(screen.getByLabelText('Type your password to confirm'), 'correct-horse-battery');
    fireEvent.press(screen.getByLabelText('Delete my account…'));
    await waitFor(() => expect(screenText()).toContain('Delete your account for good?'));
    fireEvent.press(screen.getByLabelText('Delete my account'));

    await waitFor(() => expect(queryClient.getQueryData(sessionKeys.me())).toBeNull());
    expect(writes(calls)).toEqual([{ url: '/api/auth/account/delete', method: 'POST', body: { password: 'correct-horse-battery' } }]);
  });

  it('when the operator is the only admin of a club, says to hand over first and offers no delete button', () => {
    const blocked: AccountDeletionPreview = {
      ...preview,
      clubs: [{ clubId: 3, clubName: 'Marsh Lane Radio Circle', outcome: 'hand-over' }],
      allowed: false,
    };
    stubFetch((call) => reads(call, blocked));
    renderSettings(blocked);
    expect(screenText()).toContain('You are the only admin of Marsh Lane Radio Circle');
    expect(screen.queryByLabelText('Delete my account…')).toBeNull();
  });

  it('when the new e-mail is taken, says so beside the field; a sent link shows the address it waits for', async () => {
    let taken = true;
    stubFetch((call) => {
      if (call.url === '/api/auth/email-change' && call.method === 'POST') {
        if (taken)
          return errorResponse(409, 'conflict', 'Another account already uses this e-mail address', {
            newEmail: 'Another account already uses this e-mail address. Choose a different one.',
          });
        return jsonResponse(202, { message: 'We sent a confirmation link to new@faintline.example.' });
      }
      if (call.url === '/api/auth/email-change' && !taken) {
        return jsonResponse(200, { newEmail: 'new@faintline.example', expiresAtUtc: '2026-12-03T18:00:00.000Z' });
      }
      return reads(call);
    });
    renderSettings();
    fireEvent.changeText(screen.getByLabelText('New e-mail'), 'new@faintline.example');
    fireEvent.changeText(screen.getByLabelText('Your password'), 'correct-horse-battery');
    fireEvent.press(screen.getByLabelText('Send confirmation link'));
    await waitFor(() => expect(screenText()).toContain('Another account already uses this e-mail address. Choose a different one.'));

    taken = false;
    fireEvent.press(screen.getByLabelText('Send confirmation link'));
    await waitFor(() => expect(screenText()).toContain('We sent a confirmation link to new@faintline.example.'));
    await waitFor(() =>
      expect(screenText()).toContain('open the link we sent to new@faintline.example (it works until 2026-12-03 18:00 UTC)'),
    );
  });
});
