import { once } from 'node:events';
import { createServer, get, type IncomingMessage } from 'node:http';
import type { AddressInfo } from 'node:net';
import { gunzipSync } from 'node:zlib';
import request from 'supertest';
import { createHttpHandler } from '@/server/app';
import { createLogger } from '@/server/lib/logger';
import { commandForBand } from '@/shared/domain/calibration';
import { toneFrequenciesHz } from '@/shared/domain/tones';
import { encodeMessage } from '@/shared/domain/wspr/encode';
import { makeClub, signedInAgent, startTestServer, truncateAll, validUnit, type TestServer } from './helpers/test-app';

let server: TestServer;
// Devices reach the server through node:http: config polls take the fast path, the rest Express.
let handler: ReturnType<typeof createHttpHandler>;
beforeAll(async () => {
  server = await startTestServer({ DEVICE_RATE_LIMIT: '30' });
  handler = createHttpHandler(server.app, createLogger('silent'));
});
afterAll(() => server.close());
beforeEach(() => truncateAll(server.sequelize));

async function provisioned() {
  const owner = await signedInAgent(server.app);
  const { body: unit } = await owner.agent.post('/api/units').send(validUnit);
  const { body: station } = await owner.agent
    .post('/api/stations')
    .send({ name: 'Device station', callsign: 'Q9ZZT', locator: 'JO22AB', unitId: unit.id, transmitEnabled: true });
  await owner.agent.put(`/api/stations/${station.id}/bands/20m`).send({ enabled: true, calibrationOffsetHz: 12.5 });
  await owner.agent
    .post(`/api/stations/${station.id}/schedule`)
    .send({ steps: [{ bandId: '20m', slots: 2 }], cadence: { kind: 'every-nth', nth: 5 }, startDate: '2026-01-01' });
  const { body } = await owner.agent.post(`/api/stations/${station.id}/device-token`);
  return { ...owner, unit, station, token: body.token as string };
}

const device = (token: string) => ({
  get: (path: string) => request(handler).get(`/api/device/v1${path}`).set('Authorization', `Bearer ${token}`),
  post: (path: string, body: unknown) =>
    request(handler)
      .post(`/api/device/v1${path}`)
      .set('Authorization', `Bearer ${token}`)
      .send(body as object),
});

const heartbeat = {
  uptimeS: 3600,
  firmwareVersion: '1.4.2',
  timeSource: 'network',
  clockOffsetMs: 12,
  temperatureC: 24.5,
  supplyV: 5.02,
  lastTransmission: null,
  errorCodes: [],
};

describe('device tokens', () => {
  it('when created, the token works; rotated, the old one stops at once; revoked, the new one stops too', async () => {
    const { agent, station, token } = await provisioned();
    expect(token).toMatch(/^fld_/);
    expect((await device(token).get('/config')).status).toBe(200);
    const { body: rotated } = await agent.post(`/api/stations/${station.id}/device-token`);
    expect((await device(token).get('/config')).status).toBe(401);
    expect((await device(rotated.token).get('/config')).status).toBe(200);
    expect((await agent.delete(`/api/stations/${station.id}/device-token`)).status).toBe(204);
    expect((await device(rotated.token).get('/config')).status).toBe(401);
  });

  it('when another operator or the club admin asks for a token, responds 404 / 403', async () => {
    const { station, user } = await provisioned();
    const stranger = await signedInAgent(server.app);
    expect((await stranger.agent.post(`/api/stations/${station.id}/device-token`)).status).toBe(404);
    const admin = await signedInAgent(server.app);
    await makeClub('Token Circle', admin.user.id, [user.id]);
    expect((await admin.agent.post(`/api/stations/${station.id}/device-token`)).status).toBe(403);
  });

  it('when no token, a malformed header or a made-up token is sent, responds 401 without setting a cookie', async () => {
    for (const header of [undefined, 'Token abc', 'Bearer fld_not-a-real-token']) {
      const req = request(handler).get('/api/device/v1/config');
      const res = await (header ? req.set('Authorization', header) : req);
      expect(res.status).toBe(401);
      expect(res.headers['set-cookie']).toBeUndefined();
    }
  });

  it('when a device heartbeats, it can only ever write to its own station', async () => {
    const a = await provisioned();
    const b = await provisioned();
    await device(a.token).post('/heartbeat', heartbeat);
    const healthA = await a.agent.get(`/api/stations/${a.station.id}/health`);
    const healthB = await b.agent.get(`/api/stations/${b.station.id}/health`);
    expect(healthA.body.lastHeartbeatAt).not.toBeNull();
    expect(healthB.body.lastHeartbeatAt).toBeNull();
    expect((await a.agent.get(`/api/stations/${b.station.id}/health`)).status).toBe(404);
  });
});

describe('GET /api/device/v1/config', () => {
  it('when fetched, carries the core’s symbols and tone frequencies for every planned transmission', async () => {
    const { token } = await provisioned();
    const res = await device(token).get('/config');
    expect(res.status).toBe(200);
    expect(res.body.identity.callsign).toBe('Q9ZZT');
    expect(res.body.status).toBe('transmit');
    const txs = res.body.plan.transmissions;
    expect(txs.length).toBeGreaterThan(0);
    for (const tx of txs.slice(0, 6)) {
      const core = encodeMessage(tx.messageText);
      expect(core.ok && Array.from(core.symbols).join('')).toBe(tx.symbols);
      expect(tx.symbols).toHaveLength(162);
      toneFrequenciesHz(tx.carrierHz).forEach((f, k) => expect(tx.tonesHz[k]).toBeCloseTo(f, 3));
      const command = commandForBand(14_095_600, tx.carrierHz - 14_095_600, { referenceErrorPpm: 0, bandOffsetHz: 12.5 });
      command.commandTonesHz.forEach((f, k) => expect(tx.commandTonesHz[k]).toBeCloseTo(f, 3));
      expect(tx.registers.tones).toHaveLength(4);
    }
    // a 6-character locator alternates Type 1 and Type 3 (WSPR protocol description)
    expect(txs.slice(0, 2).map((t: { messageType: number }) => t.messageType)).toEqual([1, 3]);
  });

  it('when nothing changed, answers 304 to If-None-Match; after each kind of change, 200 with a new ETag', async () => {
    const { agent, station, unit, token, user } = await provisioned();
    const admin = await signedInAgent(server.app);
    const clubId = await makeClub('Etag Circle', admin.user.id, [user.id]);
    let etag = (await device(token).get('/config')).headers.etag;
    expect((await device(token).get('/config').set('If-None-Match', etag)).status).toBe(304);
    const changes: [string, () => Promise<unknown>][] = [
      ['station', () => agent.patch(`/api/stations/${station.id}`).send({ audioOffsetHz: 1490 })],
      ['bands', () => agent.put(`/api/stations/${station.id}/bands/40m`).send({ enabled: true })],
      [
        'calibration',
        () =>
          agent
            .post(`/api/stations/${station.id}/calibration`)
            .send({ source: 'typed', offsets: [{ bandId: '20m', calibrationOffsetHz: 13 }] }),
      ],
      ['schedule', () => agent.patch(`/api/stations/${station.id}/schedule`).send({ stagger: { stepHz: 2, spanHz: 6 } })],
      ['unit', () => agent.patch(`/api/units/${unit.id}`).send({ attenuatorDb: 3 })],
      [
        'suspension',
        () => admin.agent.post(`/api/clubs/${clubId}/stations/${station.id}/suspension`).send({ reason: 'Checking the device API' }),
      ],
    ];
    for (const [what, change] of changes) {
      await new Promise((r) => setTimeout(r, 5)); // change stamps are kept to the millisecond
      await change();
      const res = await device(token).get('/config').set('If-None-Match', etag);
      expect({ what, status: res.status }).toEqual({ what, status: 200 });
      expect(res.headers.etag).not.toBe(etag);
      etag = res.headers.etag;
    }
    const suspended = await device(token).get('/config');
    expect(suspended.body.status).toBe('suspended');
    expect(suspended.body.plan.transmissions).toEqual([]);
  });
});

describe('the config poll on both paths', () => {
  it('when asked through Express and through the fast path, both answer the same body, ETag and 304', async () => {
    const { token } = await provisioned();
    const fast = await device(token).get('/config');
    const viaExpress = await request(server.app).get('/api/device/v1/config').set('Authorization', `Bearer ${token}`);
    expect(viaExpress.status).toBe(200);
    expect(viaExpress.headers.etag).toBe(fast.headers.etag);
    expect(viaExpress.body).toEqual(fast.body);
    const notModified = await request(server.app)
      .get('/api/device/v1/config')
      .set('Authorization', `Bearer ${token}`)
      .set('If-None-Match', fast.headers.etag);
    expect(notModified.status).toBe(304);
  });

  it('when polled past the limit on the fast path, responds 429 (one count shared with the other device routes)', async () => {
    const { token } = await provisioned();
    for (let i = 0; i < 29; i += 1) await device(token).post('/heartbeat', heartbeat);
    expect((await device(token).get('/config')).status).toBe(200);
    const limited = await device(token).get('/config');
    expect(limited.status).toBe(429);
    expect(limited.body.error.code).toBe('rate-limited');
  });
});

describe('config encodings', () => {
  // The bytes as sent: supertest would inflate them before we could look.
  async function rawGet(token: string, headers: Record<string, string>) {
    const listener = createServer(handler).listen(0, '127.0.0.1');
    await once(listener, 'listening');
    try {
      const { port } = listener.address() as AddressInfo;
      const res = await new Promise<IncomingMessage>((resolve, reject) =>
        get(
          { host: '127.0.0.1', port, path: '/api/device/v1/config', headers: { ...headers, authorization: `Bearer ${token}` } },
          resolve,
        ).on('error', reject),
      );
      const chunks: Buffer[] = [];
      for await (const chunk of res) chunks.push(chunk as Buffer);
      return { headers: res.headers, body: Buffer.concat(chunks) };
    } finally {
      listener.close();
    }
  }

  it('when the device takes gzip, sends the same document compressed, with its own ETag, and 304s either ETag', async () => {
    const { token } = await provisioned();
    const plain = await device(token).get('/config').set('Accept-Encoding', 'identity');
    expect(plain.headers['content-encoding']).toBeUndefined();
    const packed = await rawGet(token, { 'accept-encoding': 'gzip' });
    expect(packed.headers['content-encoding']).toBe('gzip');
    expect(packed.headers.vary).toBe('Accept-Encoding');
    // RFC 1952: a gzip member starts with the bytes 1f 8b
    expect([...packed.body.subarray(0, 2)]).toEqual([0x1f, 0x8b]);
    expect(JSON.parse(gunzipSync(packed.body).toString('utf8'))).toEqual(plain.body);
    expect(packed.body.length * 4).toBeLessThan(Number(plain.headers['content-length']));
    // RFC 9110 §8.8.3: different content codings of one version get different strong validators
    expect(packed.headers.etag).not.toBe(plain.headers.etag);
    for (const etag of [plain.headers.etag as string, packed.headers.etag as string]) {
      const again = await device(token).get('/config').set('Accept-Encoding', 'gzip').set('If-None-Match', etag);
      expect(again.status).toBe(304);
      expect(again.headers.etag).toBe(packed.headers.etag);
      expect(again.headers['x-content-type-options']).toBeUndefined();
    }
  });

  it('when gzip is refused with q=0, answers plain JSON', async () => {
    const { token } = await provisioned();
    const res = await device(token).get('/config').set('Accept-Encoding', 'gzip;q=0, identity');
    expect(res.status).toBe(200);
    expect(res.headers['content-encoding']).toBeUndefined();
    expect(res.body.identity.callsign).toBe('Q9ZZT');
  });
});

describe('device reports', () => {
  it('when a heartbeat is malformed, responds 400 naming the field and stores nothing', async () => {
    const { agent, station, token } = await provisioned();
    const bad = await device(token).post('/heartbeat', { ...heartbeat, clockOffsetMs: 'soon', timeSource: 'sundial' });
    expect(bad.status).toBe(400);
    expect(Object.keys(bad.body.error.fields).sort()).toEqual(['clockOffsetMs', 'timeSource']);
    const { HeartbeatModel } = await import('@/server/db/models/device.model');
    expect(await HeartbeatModel.count({ where: { stationId: station.id } })).toBe(0);
    const good = await device(token).post('/heartbeat', heartbeat);
    expect(good.status).toBe(202);
    expect((await agent.get(`/api/stations/${station.id}/health`)).body).toMatchObject({
      online: true,
      clockOffsetMs: 12,
      temperatureC: 24.5,
      firmwareVersion: '1.4.2',
    });
  });

  it('when many heartbeats arrive at once, each is acknowledged only after it is stored', async () => {
    const { station, token } = await provisioned();
    const { HeartbeatModel } = await import('@/server/db/models/device.model');
    const answers = await Promise.all(Array.from({ length: 25 }, (_, i) => device(token).post('/heartbeat', { ...heartbeat, uptimeS: i })));
    expect(answers.map((a) => a.status)).toEqual(Array(25).fill(202));
    const rows = await HeartbeatModel.findAll({ where: { stationId: station.id } });
    expect(rows.map((r) => JSON.parse(r.report).uptimeS).sort((a: number, b: number) => a - b)).toEqual(
      Array.from({ length: 25 }, (_, i) => i),
    );
  });

  it('when transmissions are logged, they are stored; a bad band is refused', async () => {
    const { agent, station, token } = await provisioned();
    const sent = await device(token).post('/transmissions', {
      transmissions: [
        {
          startUtc: new Date(Math.floor(Date.now() / 120_000) * 120_000 + 1000).toISOString(),
          bandId: '20m',
          frequencyHz: 14_097_100,
          messageText: 'Q9ZZT JO22 10',
        },
      ],
    });
    expect(sent.status).toBe(202);
    expect((await agent.get(`/api/stations/${station.id}/health`)).body.recent).toHaveLength(1);
    expect(
      (
        await device(token).post('/transmissions', {
          transmissions: [{ startUtc: 'now', bandId: '11m', frequencyHz: 1, messageText: 'x' }],
        })
      ).status,
    ).toBe(400);
  });

  it('when a device sends more than its limit in a minute, responds 429', async () => {
    const { token } = await provisioned();
    const statuses: number[] = [];
    for (let i = 0; i < 32; i += 1) statuses.push((await device(token).post('/heartbeat', heartbeat)).status);
    expect(statuses.slice(0, 30).every((s) => s === 202)).toBe(true);
    expect(statuses.slice(30)).toEqual([429, 429]);
  });
});

describe('alerts, with a controllable clock', () => {
  it('when a scheduled device goes silent, one alert opens, is mailed once, de-duplicates, and resolves when it reports again', async () => {
    const { evaluateAlerts } = await import('@/server/features/devices/alerts.service');
    const { HeartbeatModel, AlertModel } = await import('@/server/db/models/device.model');
    const { station, email } = await provisioned();
    const t0 = Date.UTC(2026, 11, 2, 12, 0, 0);
    await HeartbeatModel.create({
      stationId: station.id,
      receivedAt: new Date(t0),
      report: JSON.stringify(heartbeat),
      clockOffsetMs: 5,
      temperatureC: 24,
    });
    expect(await evaluateAlerts(server.sequelize, t0 + 60_000)).toEqual([]);

    const later = t0 + 45 * 60_000; // silent 45 minutes, limit 30
    const first = await evaluateAlerts(server.sequelize, later);
    expect(first).toHaveLength(1);
    expect(first![0].to).toBe(email);
    expect(first![0].subject).toMatch(/silent while scheduled/);
    const again = await evaluateAlerts(server.sequelize, later + 60_000);
    expect(again).toEqual([]);
    expect(await AlertModel.count({ where: { stationId: station.id } })).toBe(1);

    await HeartbeatModel.create({
      stationId: station.id,
      receivedAt: new Date(later + 90_000),
      report: JSON.stringify(heartbeat),
      clockOffsetMs: 5,
      temperatureC: 24,
    });
    expect(await evaluateAlerts(server.sequelize, later + 120_000)).toEqual([]);
    const alert = await AlertModel.findOne({ where: { stationId: station.id } });
    expect(alert!.resolvedAt).not.toBeNull();
  });

  it('when a device was never heard from, its silence counts from when the token was issued', async () => {
    const { evaluateAlerts } = await import('@/server/features/devices/alerts.service');
    await provisioned();
    const now = Date.now();
    expect(await evaluateAlerts(server.sequelize, now + 60_000)).toEqual([]);
    const mails = await evaluateAlerts(server.sequelize, now + 31 * 60_000);
    expect(mails!.map((m) => m.subject)).toEqual([expect.stringMatching(/silent while scheduled/)]);
  });

  it('when the clock is off by more than the threshold, an alert opens and closes once the offset is back', async () => {
    const { evaluateAlerts } = await import('@/server/features/devices/alerts.service');
    const { HeartbeatModel, AlertModel } = await import('@/server/db/models/device.model');
    const { station } = await provisioned();
    const t0 = Date.UTC(2026, 11, 2, 12, 0, 0);
    await HeartbeatModel.create({ stationId: station.id, receivedAt: new Date(t0), report: '{}', clockOffsetMs: 1800, temperatureC: 24 });
    const mails = await evaluateAlerts(server.sequelize, t0 + 1000);
    expect(mails!.map((m) => m.subject)).toEqual([expect.stringMatching(/clock off/)]);
    await HeartbeatModel.create({
      stationId: station.id,
      receivedAt: new Date(t0 + 60_000),
      report: '{}',
      clockOffsetMs: 40,
      temperatureC: 24,
    });
    await evaluateAlerts(server.sequelize, t0 + 61_000);
    expect(await AlertModel.count({ where: { stationId: station.id, resolvedAt: null } })).toBe(0);
  });

  it('when two processes evaluate at the same moment, only one opens and mails the alert', async () => {
    const { evaluateAlerts } = await import('@/server/features/devices/alerts.service');
    const { createSequelize } = await import('@/server/db/sequelize');
    const { HeartbeatModel } = await import('@/server/db/models/device.model');
    const { station } = await provisioned();
    const t0 = Date.UTC(2026, 11, 2, 12, 0, 0);
    await HeartbeatModel.create({ stationId: station.id, receivedAt: new Date(t0), report: '{}', clockOffsetMs: 2500, temperatureC: 24 });
    const second = createSequelize(server.config.DATABASE_URL);
    try {
      const results = await Promise.all([evaluateAlerts(server.sequelize, t0 + 1000), evaluateAlerts(second, t0 + 1000)]);
      const mails = results.flatMap((r) => r ?? []);
      expect(mails).toHaveLength(1);
    } finally {
      await second.close();
    }
  });
});
