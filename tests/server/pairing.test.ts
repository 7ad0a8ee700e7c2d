import type { Express } from 'express';
import request from 'supertest';
import { createApp, createHttpHandler } from '@/server/app';
import { createLogger } from '@/server/lib/logger';
import { makeClub, signedInAgent, startTestServer, truncateAll, validUnit, type TestServer } from './helpers/test-app';

// Checks follow RFC 8628 (OAuth 2.0 Device Authorization Grant): §3.2 the device authorization
// response, §3.4 the token request, §3.5 its error codes and slow_down's 5 s, §6.1 the user-code
// alphabet; and RFC 6749 §5.1/§5.2 for the token and error answers (Cache-Control: no-store).
const GRANT = 'urn:ietf:params:oauth:grant-type:device_code';
const RFC_ALPHABET = 'BCDFGHJKLMNPQRSTVWXZ'; // RFC 8628 §6.1, the example character set
const USER_CODE = new RegExp(`^[${RFC_ALPHABET}]{4}-[${RFC_ALPHABET}]{4}$`);

let server: TestServer;
let app: Express;
let handler: ReturnType<typeof createHttpHandler>;
// the clock pairing is timed by: tests move it forward by hand
let clockMs = Date.parse('2026-12-02T12:00:00Z');
const advance = (seconds: number) => (clockMs += seconds * 1000);

beforeAll(async () => {
  server = await startTestServer({ PAIRING_CODE_ATTEMPTS: '5', PAIRING_ADDRESS_ATTEMPTS: '8', PAIRING_REQUESTS_PER_ADDRESS: '1000' });
  app = createApp({
    config: server.config,
    sequelize: server.sequelize,
    mailer: server.mailer,
    logger: createLogger('silent'),
    now: () => new Date(clockMs),
  });
  handler = createHttpHandler(app, createLogger('silent'));
});
afterAll(() => server.close());
beforeEach(async () => {
  await truncateAll(server.sequelize);
  clockMs = Date.parse('2026-12-02T12:00:00Z');
});

/** A device asking to be paired, form-encoded as in RFC 8628 §3.1's example. */
async function requestCodes(fields: Record<string, string> = {}) {
  const res = await request(handler).post('/api/device/v1/pairing').type('form').send(fields);
  expect(res.status).toBe(200);
  return res.body as {
    device_code: string;
    user_code: string;
    verification_uri: string;
    verification_uri_complete: string;
    expires_in: number;
    interval: number;
  };
}

/** One poll of the token endpoint, form-encoded as in RFC 8628 §3.4's example. */
const poll = (deviceCode: string) =>
  request(handler).post('/api/device/v1/token').type('form').send({ grant_type: GRANT, device_code: deviceCode });
const config = (token: string) => request(handler).get('/api/device/v1/config').set('Authorization', `Bearer ${token}`);

async function ownerWithStation(agentApp = app) {
  const owner = await signedInAgent(agentApp, { displayName: 'Pairing Owner' });
  const { body: unit } = await owner.agent.post('/api/units').send(validUnit);
  const { body: station } = await owner.agent
    .post('/api/stations')
    .send({ name: 'Porch beacon', callsign: 'Q7PRC', locator: 'JO22AB', unitId: unit.id, transmitEnabled: true });
  await owner.agent.put(`/api/stations/${station.id}/bands/20m`).send({ enabled: true });
  return { ...owner, station: station as { id: number; name: string } };
}

describe('POST /api/device/v1/pairing', () => {
  it('when a device asks, answers the RFC 8628 §3.2 fields with a readable code and stores neither code in the clear', async () => {
    const res = await request(handler).post('/api/device/v1/pairing').type('form').send({ model: 'QB-2 beacon', firmware: '0.9.1' });
    expect(res.status).toBe(200);
    expect(res.headers['cache-control']).toBe('no-store');
    expect(res.headers['content-type']).toMatch(/application\/json/);
    const body = res.body;
    expect(Object.keys(body).sort()).toEqual([
      'device_code',
      'expires_in',
      'interval',
      'user_code',
      'verification_uri',
      'verification_uri_complete',
    ]);
    expect(body.user_code).toMatch(USER_CODE);
    expect(body.verification_uri).toBe('http://127.0.0.1:8080/pair');
    expect(body.verification_uri_complete).toBe(`http://127.0.0.1:8080/pair?code=${body.user_code}`);
    expect(body.expires_in).toBe(600);
    expect(body.interval).toBe(5); // RFC 8628 §3.2: 5 s when the server names no other
    expect(body.device_code.length).toBeGreaterThanOrEqual(43); // 32 random bytes, base64url
    const [rows] = await server.sequelize.query('SELECT * FROM device_pairings');
    const stored = JSON.stringify(rows);
    expect(stored).not.toContain(body.device_code);
    expect(stored).not.toContain(body.user_code.replace('-', ''));
    expect(stored).toContain('QB-2 beacon');
  });

  it('when asked with JSON or with nothing, answers too; codes differ every time', async () => {
    const json = await request(handler).post('/api/device/v1/pairing').send({ model: 'QB-3' });
    const empty = await request(handler).post('/api/device/v1/pairing');
    expect([json.status, empty.status]).toEqual([200, 200]);
    expect(json.body.user_code).not.toBe(empty.body.user_code);
    expect(json.body.device_code).not.toBe(empty.body.device_code);
  });

  it('when the scope names no kind of device or a field is too long, answers invalid_scope / invalid_request', async () => {
    const scope = await request(handler).post('/api/device/v1/pairing').type('form').send({ scope: 'toaster' });
    expect(scope.status).toBe(400);
    expect(scope.body.error).toBe('invalid_scope');
    const long = await request(handler)
      .post('/api/device/v1/pairing')
      .type('form')
      .send({ model: 'x'.repeat(61) });
    expect(long.status).toBe(400);
    expect(long.body).toEqual({ error: 'invalid_request', error_description: expect.stringMatching(/^model/) });
  });

  it('draws user codes only from the RFC 8628 §6.1 alphabet (no vowels, no look-alikes)', async () => {
    const seen = new Set<string>();
    for (let i = 0; i < 25; i += 1) for (const c of (await requestCodes()).user_code.replace('-', '')) seen.add(c);
    for (const c of seen) expect(RFC_ALPHABET).toContain(c);
    expect(seen.size).toBeGreaterThan(10); // 200 draws from 20 letters
  });
});

describe('POST /api/device/v1/token', () => {
  it('answers the request errors first, in RFC 6749 §5.2 JSON with no-store', async () => {
    const { device_code } = await requestCodes();
    const cases: [Record<string, string>, string][] = [
      [{ device_code }, 'invalid_request'],
      [{ grant_type: 'authorization_code', device_code }, 'unsupported_grant_type'],
      [{ grant_type: GRANT }, 'invalid_request'],
      [{ grant_type: GRANT, device_code: 'made-up-device-code' }, 'invalid_grant'],
    ];
    for (const [fields, error] of cases) {
      const res = await request(handler).post('/api/device/v1/token').type('form').send(fields);
      expect(res.status).toBe(400);
      expect(res.headers['cache-control']).toBe('no-store');
      expect(res.body).toEqual({ error, error_description: expect.any(String) });
    }
    const broken = await request(handler).post('/api/device/v1/token').set('Content-Type', 'application/json').send('{"grant_type":');
    expect(broken.status).toBe(400);
    expect(broken.body.error).toBe('invalid_request');
  });

  it('while the owner has not acted, answers authorization_pending (form or JSON)', async () => {
    const { device_code } = await requestCodes();
    expect((await poll(device_code)).body.error).toBe('authorization_pending');
    advance(5);
    const json = await request(handler).post('/api/device/v1/token').send({ grant_type: GRANT, device_code });
    expect(json.status).toBe(400);
    expect(json.body.error).toBe('authorization_pending');
  });

  it('when polled before the interval is up, answers slow_down and the interval grows by 5 s each time (RFC 8628 §3.5)', async () => {
    const { device_code, interval } = await requestCodes();
    expect((await poll(device_code)).body.error).toBe('authorization_pending');
    advance(1);
    const first = await poll(device_code);
    expect(first.body).toMatchObject({ error: 'slow_down', interval: interval + 5 });
    advance(interval); // the old 5 s are no longer enough
    expect((await poll(device_code)).body).toMatchObject({ error: 'slow_down', interval: interval + 10 });
    advance(interval + 10);
    expect((await poll(device_code)).body.error).toBe('authorization_pending');
    advance(interval + 10);
    expect((await poll(device_code)).body.error).toBe('authorization_pending');
  });

  it('when expires_in has passed, answers expired_token and the owner can no longer find the code', async () => {
    const { agent } = await ownerWithStation();
    const { device_code, user_code, expires_in } = await requestCodes();
    advance(expires_in - 1);
    expect((await poll(device_code)).body.error).toBe('authorization_pending');
    advance(1);
    expect((await poll(device_code)).body.error).toBe('expired_token');
    const look = await agent.get(`/api/pairing/${user_code}`);
    expect(look.status).toBe(404);
  });
});

describe('pairing by the owner', () => {
  it('when approved, the device gets a working token once; the station’s old token stops at once; rotate and revoke work as before', async () => {
    const { agent, station } = await ownerWithStation();
    const { body: old } = await agent.post(`/api/stations/${station.id}/device-token`);
    expect((await config(old.token)).status).toBe(200); // now in the gateway's token cache

    const codes = await requestCodes({ model: 'QB-2 beacon', firmware: '0.9.1' });
    const typed = codes.user_code.toLowerCase(); // typed in lower case, with the dash
    const look = await agent.get(`/api/pairing/${typed}`);
    expect(look.status).toBe(200);
    expect(look.body).toMatchObject({ userCode: codes.user_code, targetKind: 'station', model: 'QB-2 beacon', firmware: '0.9.1' });
    expect(look.body.targets).toEqual([{ kind: 'station', id: station.id, name: 'Porch beacon', callsign: 'Q7PRC', hasToken: true }]);
    expect((await agent.get(`/api/pairing/${codes.user_code.replace('-', ' ')}`)).status).toBe(200);

    const approved = await agent.post(`/api/pairing/${typed}/approve`).send({ targetId: station.id });
    expect(approved.status).toBe(200);
    expect(approved.body).toMatchObject({ status: 'approved', target: { id: station.id } });
    expect((await config(old.token)).status).toBe(401); // stopped at once, cache and all

    const granted = await poll(codes.device_code);
    expect(granted.status).toBe(200);
    expect(granted.headers['cache-control']).toBe('no-store');
    expect(granted.headers.pragma).toBe('no-cache');
    expect(granted.body).toMatchObject({ access_token: expect.stringMatching(/^fld_/), token_type: 'Bearer' });
    const token = granted.body.access_token as string;
    const first = await config(token);
    expect(first.status).toBe(200);
    expect(first.body.identity.callsign).toBe('Q7PRC');

    // the device code is spent; the user code is spent; a second approval is refused
    advance(5);
    expect((await poll(codes.device_code)).body.error).toBe('invalid_grant');
    expect((await agent.post(`/api/pairing/${typed}/approve`).send({ targetId: station.id })).status).toBe(404);
    expect((await agent.get(`/api/pairing/${typed}`)).status).toBe(404);

    // audited in the owner's log
    const log = await agent.get('/api/audit');
    expect(log.body.map((e: { action: string }) => e.action)).toContain('device.pair');

    // the paired token is an ordinary device token: rotating replaces it, revoking stops it
    const { body: rotated } = await agent.post(`/api/stations/${station.id}/device-token`);
    expect((await config(token)).status).toBe(401);
    expect((await config(rotated.token)).status).toBe(200);
    await agent.delete(`/api/stations/${station.id}/device-token`);
    expect((await config(rotated.token)).status).toBe(401);
  });

  it('when refused, the device gets access_denied and the code cannot be approved afterwards', async () => {
    const { agent, station } = await ownerWithStation();
    const { device_code, user_code } = await requestCodes();
    const refused = await agent.post(`/api/pairing/${user_code}/refuse`);
    expect(refused.status).toBe(200);
    expect(refused.body).toEqual({ status: 'refused' });
    expect((await poll(device_code)).body.error).toBe('access_denied');
    expect((await agent.post(`/api/pairing/${user_code}/approve`).send({ targetId: station.id })).status).toBe(404);
    const log = await agent.get('/api/audit');
    expect(log.body.map((e: { action: string }) => e.action)).toContain('device.pair-refuse');
  });

  it('when the station is someone else’s, answers 404 (a club admin 403) and the code stays usable', async () => {
    const owner = await ownerWithStation();
    const stranger = await signedInAgent(app);
    const admin = await signedInAgent(app);
    await makeClub('Pairing Circle', admin.user.id, [owner.user.id]);
    const { user_code, device_code } = await requestCodes();
    expect((await stranger.agent.post(`/api/pairing/${user_code}/approve`).send({ targetId: owner.station.id })).status).toBe(404);
    expect((await admin.agent.post(`/api/pairing/${user_code}/approve`).send({ targetId: owner.station.id })).status).toBe(403);
    expect((await owner.agent.post(`/api/pairing/${user_code}/approve`).send({})).status).toBe(400);
    expect((await owner.agent.post(`/api/pairing/${user_code}/approve`).send({ targetId: owner.station.id })).status).toBe(200);
    expect((await poll(device_code)).status).toBe(200);
  });

  it('when signed out, answers 401; a code not in the alphabet answers 400 saying what a code looks like', async () => {
    const { user_code } = await requestCodes();
    expect((await request(app).get(`/api/pairing/${user_code}`)).status).toBe(401);
    const { agent } = await ownerWithStation();
    const bad = await agent.get('/api/pairing/ABCD-EFGH'); // vowels are never drawn
    expect(bad.status).toBe(400);
    expect(bad.body.error.message).toMatch(/8 letters/);
  });
});

describe('wrong codes are limited (the code space cannot be walked)', () => {
  it('a wrong code says only that; after 5 per account even the right one is held back; right codes cost nothing', async () => {
    clockMs = Date.now(); // the second server process below keeps real time
    const { agent } = await ownerWithStation();
    const { user_code } = await requestCodes();
    for (let i = 0; i < 8; i += 1) expect((await agent.get(`/api/pairing/${user_code}`)).status).toBe(200);
    const answers = new Set<string>();
    for (const wrong of ['BBBB-BBBB', 'CCCC-CCCC', 'DDDD-DDDD', 'FFFF-FFFF', 'GGGG-GGGG']) {
      const res = await agent.get(`/api/pairing/${wrong}`);
      expect(res.status).toBe(404);
      answers.add(JSON.stringify(res.body));
    }
    expect(answers.size).toBe(1); // the same words for every wrong code
    const held = await agent.get(`/api/pairing/${user_code}`);
    expect(held.status).toBe(429);
    expect(held.body.error.message).toMatch(/Too many wrong codes/);
    // a second server process on the same database sees the same count
    const other = await server.restart(); // its own connection pool and memory, real clock
    const cookie = (await agent.get('/api/auth/me')).request.cookies;
    expect((await request(other).get(`/api/pairing/${user_code}`).set('Cookie', cookie)).status).toBe(429);
    // once the 15-minute window has passed, codes are accepted again (this one has expired by then: a fresh one)
    advance(15 * 60);
    const fresh = await requestCodes();
    expect((await agent.get(`/api/pairing/${fresh.user_code}`)).status).toBe(200);
  });

  it('an address is limited across accounts (8 wrong codes here), so new accounts do not buy more tries', async () => {
    const first = await signedInAgent(app);
    const second = await signedInAgent(app);
    for (let i = 0; i < 5; i += 1) expect((await first.agent.get('/api/pairing/BBBB-BBBB')).status).toBe(404);
    for (let i = 0; i < 3; i += 1) expect((await second.agent.get('/api/pairing/CCCC-CCCC')).status).toBe(404);
    expect((await second.agent.get('/api/pairing/DDDD-DDDD')).status).toBe(429);
  });

  it('wrong approvals count as well', async () => {
    const { agent, station } = await ownerWithStation();
    for (let i = 0; i < 5; i += 1)
      expect((await agent.post('/api/pairing/BBBB-BBBB/approve').send({ targetId: station.id })).status).toBe(404);
    expect((await agent.post('/api/pairing/BBBB-BBBB/approve').send({ targetId: station.id })).status).toBe(429);
  });
});
