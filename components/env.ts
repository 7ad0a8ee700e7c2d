/**
 * The client's one env module. Expo inlines EXPO_PUBLIC_* values into the bundle at build time,
 * so each is read by its literal name and only ever holds public, non-secret settings.
 */
export const env = {
  /**
   * Show the link to the server's local test inbox: in development builds (`__DEV__`), or when the build
   * was made with EXPO_PUBLIC_SHOW_DEV_INBOX=1 (`npm start` and the browser tests do that). Never otherwise.
   */
  showDevInbox: process.env.EXPO_PUBLIC_SHOW_DEV_INBOX === '1' || (typeof __DEV__ !== 'undefined' && __DEV__),
} as const;

/** Path of the development mail inbox page served by the API server. */
export const DEV_INBOX_PATH = '/dev/inbox';
