/**
 * Every API route with a body that passes validation, so hostile variations of it reach as deep
 * as possible. `:station`, `:unit`, `:club`, `:member`, `:photo`, `:proposal`, `:notification` are
 * filled in from a scenario; tests/server/hostile-input.test.ts checks this list against the app's own routes.
 */
export type RouteSpec = {
  method: 'get' | 'post' | 'patch' | 'put' | 'delete';
  path: string;
  body?: Record<string, unknown>;
  device?: true;
};

const unit = {
  name: 'Bench board',
  timeSource: 'network',
  generatorKind: 'pll',
  referenceHz: 25e6,
  tolerancePpm: 10,
  generatorLevelDbm: 10,
};
const schedule = { steps: [{ bandId: '20m', slots: 2 }], cadence: { kind: 'every-nth', nth: 5 }, startDate: '2026-01-01' };

export const API_ROUTES: RouteSpec[] = [
  {
    method: 'post',
    path: '/api/auth/register',
    body: { email: 'fuzz@test.faintline.example', password: 'long-enough-pass', displayName: 'Fuzz' },
  },
  { method: 'post', path: '/api/auth/sign-in', body: { email: 'fuzz@test.faintline.example', password: 'long-enough-pass' } },
  { method: 'get', path: '/api/auth/me' },
  { method: 'post', path: '/api/auth/sign-out' },
  { method: 'post', path: '/api/auth/sessions/end-others' },
  { method: 'patch', path: '/api/auth/me', body: { displayName: 'Fuzz Operator', callsign: 'Q9ZZT' } },
  { method: 'post', path: '/api/auth/password-reset', body: { email: 'fuzz@test.faintline.example' } },
  { method: 'post', path: '/api/auth/password-reset/confirm', body: { token: 'x'.repeat(40), password: 'long-enough-pass' } },
  { method: 'get', path: '/api/stations' },
  { method: 'post', path: '/api/stations', body: { name: 'Loft', callsign: 'Q9ZZT', locator: 'JO22ab', notes: '' } },
  { method: 'get', path: '/api/stations/:station' },
  { method: 'patch', path: '/api/stations/:station', body: { name: 'Loft 2', notes: 'n' } },
  { method: 'put', path: '/api/stations/:station/bands/:band', body: { enabled: true, calibrationOffsetHz: 1 } },
  {
    method: 'post',
    path: '/api/stations/:station/calibration',
    body: { source: 'typed', referenceErrorPpm: 1, offsets: [{ bandId: '20m', calibrationOffsetHz: 2 }] },
  },
  {
    method: 'post',
    path: '/api/stations/:station/calibration/proposal',
    body: { bandId: '20m', commandedHz: 14097100, observedHz: 14097105 },
  },
  { method: 'get', path: '/api/stations/:station/config' },
  { method: 'get', path: '/api/stations/:station/schedule' },
  { method: 'post', path: '/api/stations/:station/schedule', body: schedule },
  { method: 'patch', path: '/api/stations/:station/schedule', body: { name: 'Rotation', paused: true } },
  { method: 'get', path: '/api/stations/:station/plan' },
  { method: 'post', path: '/api/stations/:station/device-token' },
  { method: 'get', path: '/api/stations/:station/health' },
  { method: 'put', path: '/api/stations/:station/alert-settings', body: { silentMinutes: 30, clockOffsetMs: 500 } },
  { method: 'get', path: '/api/fleet/health' },
  { method: 'get', path: '/api/units' },
  { method: 'post', path: '/api/units', body: unit },
  { method: 'get', path: '/api/units/:unit' },
  { method: 'patch', path: '/api/units/:unit', body: { notes: 'n' } },
  { method: 'post', path: '/api/units/:unit/copy' },
  { method: 'post', path: '/api/units/:unit/photos', body: { photo: 'not a file' } },
  { method: 'get', path: '/api/units/:unit/photos/:photo' },
  { method: 'get', path: '/api/units/:unit/photos/:photo/thumb' },
  { method: 'get', path: '/api/clubs' },
  { method: 'post', path: '/api/clubs', body: { name: 'Fuzz Circle', maxPowerDbm: 30 } },
  { method: 'get', path: '/api/clubs/:club' },
  { method: 'patch', path: '/api/clubs/:club', body: { maxPowerDbm: 27 } },
  { method: 'get', path: '/api/clubs/:club/stations' },
  { method: 'patch', path: '/api/clubs/:club/members/:member', body: { role: 'member' } },
  { method: 'get', path: '/api/clubs/:club/invitations' },
  { method: 'post', path: '/api/clubs/:club/invitations', body: { email: 'new@test.faintline.example' } },
  { method: 'get', path: '/api/clubs/:club/review' },
  { method: 'get', path: '/api/clubs/:club/conflicts' },
  { method: 'get', path: '/api/clubs/:club/occupancy' },
  { method: 'post', path: '/api/clubs/:club/offset-proposals', body: { stationId: 1, proposedOffsetHz: 1480 } },
  { method: 'post', path: '/api/clubs/:club/stations/:station/suspension', body: { reason: 'Testing the rules' } },
  { method: 'get', path: '/api/clubs/:club/audit' },
  { method: 'get', path: '/api/clubs/:club/health' },
  { method: 'post', path: '/api/invitations/accept', body: { token: 'x'.repeat(40) } },
  { method: 'get', path: '/api/offset-proposals' },
  { method: 'post', path: '/api/offset-proposals/:proposal/accept' },
  { method: 'post', path: '/api/offset-proposals/:proposal/decline' },
  { method: 'get', path: '/api/notifications' },
  { method: 'post', path: '/api/notifications/:notification/read' },
  { method: 'get', path: '/api/audit' },
  {
    method: 'post',
    path: '/api/device/v1/heartbeat',
    device: true,
    body: { uptimeS: 1, firmwareVersion: '1', timeSource: 'gps', clockOffsetMs: 1 },
  },
  {
    method: 'post',
    path: '/api/device/v1/transmissions',
    device: true,
    body: { transmissions: [{ startUtc: '2026-12-02T10:00:01Z', bandId: '20m', frequencyHz: 14097100, messageText: 'Q9ZZT JO22 23' }] },
  },
  { method: 'get', path: '/api/device/v1/config', device: true },
  { method: 'post', path: '/api/device/v1/pairing', body: { model: 'Fuzz beacon', firmware: '1.0' } },
  {
    method: 'post',
    path: '/api/device/v1/token',
    body: { grant_type: 'urn:ietf:params:oauth:grant-type:device_code', device_code: 'x'.repeat(43) },
  },
  { method: 'get', path: '/api/pairing/:code' },
  { method: 'post', path: '/api/pairing/:code/approve', body: { targetId: 1 } },
  { method: 'post', path: '/api/pairing/:code/refuse' },
  { method: 'post', path: '/api/units/:unit/fitted-filter', body: { filterIndex: 0 } },
  // Last: they take things away from the scenario.
  { method: 'delete', path: '/api/clubs/:club/stations/:station/suspension' },
  { method: 'delete', path: '/api/units/:unit/photos/:photo' },
  { method: 'delete', path: '/api/stations/:station/schedule' },
  { method: 'delete', path: '/api/stations/:station/device-token' },
  { method: 'delete', path: '/api/clubs/:club/members/:member' },
  { method: 'delete', path: '/api/units/:unit' },
  { method: 'delete', path: '/api/stations/:station' },
];
