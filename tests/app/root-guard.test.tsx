import { errorResponse, jsonResponse, renderRoute, screenText, stubFetch } from '../utils/render';
import { demoOperator } from '../utils/fixtures';

import { screen, waitFor } from '@testing-library/react-native';

import SignInRoute from '@/app/(auth)/sign-in';
import AuthLayoutRoute from '@/app/(auth)/_layout';
import OverviewRoute from '@/app/(tabs)/index';
import TabsLayoutRoute from '@/app/(tabs)/_layout';
import RootLayoutRoute from '@/app/_layout';

const routes = {
  _layout: RootLayoutRoute,
  '(auth)/_layout': AuthLayoutRoute,
  '(auth)/sign-in': SignInRoute,
  '(tabs)/_layout': TabsLayoutRoute,
  '(tabs)/index': OverviewRoute,
  '(tabs)/stations': () => null,
  '(tabs)/club': () => null,
  '(tabs)/settings': () => null,
  '+not-found': () => null,
};

const operator = demoOperator;

describe('root layout guards', () => {
  it('when signed out, a visit to / lands on the sign-in screen', async () => {
    stubFetch(() => errorResponse(401, 'unauthenticated', 'Sign in first'));
    const router = renderRoute(routes, { initialUrl: '/' });

    await waitFor(() => expect(screen.getByLabelText('Sign in')).toBeTruthy());
    expect(router.getPathname()).toBe('/sign-in');
  });

  it('when signed in, / shows the overview with the greeting and the live clock', async () => {
    stubFetch((call) => (call.url.endsWith('/auth/me') ? jsonResponse(200, operator) : jsonResponse(200, [])));
    const router = renderRoute(routes, { initialUrl: '/' });

    // the overview's first-run card loads on first use and re-renders the screen: wait for all of it together
    await waitFor(() => {
      const text = screenText();
      expect(text).toContain('Hello, Ilse Marrow');
      expect(text).toMatch(/\d\d:\d\d:\d\d UTC/);
      expect(text).toContain('next slot in');
    });
    expect(router.getPathname()).toBe('/');
  });
});
