import { errorResponse, jsonResponse, renderWithProviders, screenText, stubFetch } from '../../utils/render';

import { fireEvent, screen, waitFor } from '@testing-library/react-native';

import { sessionKeys, useSignInMutation } from '@/components/auth/queries';
import { SignInForm } from '@/components/auth/sign-in-form';

function SignInHarness() {
  const signIn = useSignInMutation();
  return <SignInForm onSubmit={signIn.mutateAsync} />;
}

function fillAndSubmit(email: string, password: string) {
  fireEvent.changeText(screen.getByLabelText('E-mail'), email);
  fireEvent.changeText(screen.getByLabelText('Password'), password);
  fireEvent.press(screen.getByLabelText('Sign in'));
}

describe('SignInForm', () => {
  it('when the server answers 401, shows the server message and stays signed out', async () => {
    const { calls } = stubFetch(() => errorResponse(401, 'unauthenticated', 'That e-mail and password do not match an account.'));
    const { queryClient } = renderWithProviders(<SignInHarness />);

    fillAndSubmit('Operator@Faintline.example ', 'wrong-password');

    await waitFor(() => expect(screenText()).toContain('That e-mail and password do not match an account.'));
    expect(calls).toEqual([
      { url: '/api/auth/sign-in', method: 'POST', body: { email: 'operator@faintline.example', password: 'wrong-password' } },
    ]);
    expect(queryClient.getQueryData(sessionKeys.me())).toBeUndefined();
  });

  it('when the server answers 429, shows the wait message at form level', async () => {
    stubFetch(() => errorResponse(429, 'rate-limited', 'Too many attempts. Wait a few minutes and try again.'));
    renderWithProviders(<SignInHarness />);

    fillAndSubmit('operator@faintline.example', 'faintline-demo');

    await waitFor(() => expect(screenText()).toContain('Too many attempts. Wait a few minutes and try again.'));
  });

  it('when the fields are empty, shows the schema messages beside them and sends nothing', async () => {
    const { fetchMock } = stubFetch(() => jsonResponse(500));
    renderWithProviders(<SignInHarness />);

    fireEvent.press(screen.getByLabelText('Sign in'));

    await waitFor(() => expect(screenText()).toContain('Enter a valid e-mail address'));
    expect(screenText()).toContain('Enter your password');
    expect(fetchMock).not.toHaveBeenCalled();
  });

  it('when the password is right, puts the user into the session cache', async () => {
    const user = {
      id: 7,
      email: 'operator@faintline.example',
      displayName: 'Ilse Marrow',
      callsign: 'Q1IMW',
      clubs: [],
      adminOfClubIds: [],
    };
    stubFetch(() => jsonResponse(200, user));
    const { queryClient } = renderWithProviders(<SignInHarness />);

    fillAndSubmit('operator@faintline.example', 'faintline-demo');

    await waitFor(() => expect(queryClient.getQueryData(sessionKeys.me())).toEqual(user));
  });
});
