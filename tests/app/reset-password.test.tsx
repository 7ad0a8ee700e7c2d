import { errorResponse, jsonResponse, renderRoute, screenText, stubFetch } from '../utils/render';

import { fireEvent, screen, waitFor } from '@testing-library/react-native';

import ResetPasswordRoute from '@/app/(auth)/reset-password';

const token = 'k3J9vQ2mX8pL5tR7wZ1cB4nH6';
const routes = { 'reset-password': ResetPasswordRoute, 'sign-in': () => null, 'forgot-password': () => null };

describe('/reset-password', () => {
  it('when the link carries a token, sends it with the new password and confirms', async () => {
    const { calls } = stubFetch(() => jsonResponse(200, { message: 'Your password is changed. Sign in with it now.' }));
    renderRoute(routes, { initialUrl: `/reset-password?token=${token}` });

    fireEvent.changeText(screen.getByLabelText('New password'), 'a-new-long-password');
    fireEvent.press(screen.getByLabelText('Set new password'));

    await waitFor(() => expect(screenText()).toContain('Your password is changed. Sign in with it now.'));
    expect(calls[0]).toEqual({
      url: '/api/auth/password-reset/confirm',
      method: 'POST',
      body: { token, password: 'a-new-long-password' },
    });
    expect(screen.getByLabelText('Sign in with your new password')).toBeTruthy();
  });

  it('when the server says the link expired, shows why and offers a new link', async () => {
    stubFetch(() => errorResponse(400, 'bad-request', 'This reset link is invalid, used or expired.'));
    renderRoute(routes, { initialUrl: `/reset-password?token=${token}` });

    fireEvent.changeText(screen.getByLabelText('New password'), 'a-new-long-password');
    fireEvent.press(screen.getByLabelText('Set new password'));

    await waitFor(() => expect(screenText()).toContain('This reset link is invalid, used or expired.'));
    expect(screen.getByLabelText('Ask for a new link')).toBeTruthy();
  });

  it('when the link has no token, says so instead of showing the form', () => {
    stubFetch(() => jsonResponse(500));
    renderRoute(routes, { initialUrl: '/reset-password' });

    expect(screen.queryByLabelText('New password')).toBeNull();
    expect(screen.getByLabelText('Ask for a new link')).toBeTruthy();
  });
});
