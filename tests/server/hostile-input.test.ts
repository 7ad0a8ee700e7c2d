import fc from 'fast-check';
import type { Express } from 'express';
import request from 'supertest';
import { createApp, createHttpHandler } from '@/server/app';
import { createLogger } from '@/server/lib/logger';
import { API_ROUTES, type RouteSpec } from './helpers/routes';
import { makeClub, signedInAgent, startTestServer, truncateAll, validUnit, type TestServer } from './helpers/test-app';

let server: TestServer;
let handler: ReturnType<typeof createHttpHandler>;
beforeAll(async () => {
  // Limits high enough that the generated requests reach validation rather than the rate limiters.
  server = await startTestServer({ DEVICE_RATE_LIMIT: '100000', SIGN_IN_ATTEMPTS: '100000' });
  handler = createHttpHandler(server.app, createLogger('silent'));
});
afterAll(() => server.close());

/** Every "METHOD /path" the app routes, read from Express's own router stack (mount paths joined). */
function routesOf(app: Express): string[] {
  type Layer = { rawPath?: string; route?: { path: string; methods: Record<string, boolean> }; handle: { stack?: Layer[] } };
  const found: string[] = [];
  const walk = (stack: Layer[], prefix: string) => {
    for (const layer of stack) {
      if (layer.route) {
        for (const method of Object.keys(layer.route.methods)) found.push(`${method.toUpperCase()} ${prefix}${layer.route.path}`);
      } else if (layer.handle.stack) {
        walk(layer.handle.stack, prefix + (layer.rawPath && layer.rawPath !== '/' ? layer.rawPath : ''));
      }
    }
  };
  walk((app as unknown as { router: { stack: Layer[] } }).router.stack, '');
  return found.map((r) => r.replace(/:\w+/g, ':p').replace(/\/$/, ''));
}

async function scenario() {
  await truncateAll(server.sequelize);
  const owner = await signedInAgent(server.app, { displayName: 'Fuzz Owner' });
  const member = await signedInAgent(server.app, { displayName: 'Fuzz Member' });
  const club = await makeClub('Fuzz Circle', owner.user.id, [member.user.id]);
  const { body: unit } = await owner.agent.post('/api/units').send(validUnit);
  const { body: station } = await owner.agent
    .post('/api/stations')
    .send({ name: 'Fuzz station', callsign: 'Q9ZZT', locator: 'JO22AB', unitId: unit.id });
  const { body: device } = await owner.agent.post(`/api/stations/${station.id}/device-token`);
  const ids: Record<string, string> = {
    station: String(station.id),
    unit: String(unit.id),
    club: String(club),
    member: String(member.user.id),
    band: '20m',
    photo: '1',
    proposal: '1',
    notification: '1',
  };
  return { agent: owner.agent, token: device.token as string, ids };
}

const fill = (path: string, ids: Record<string, string>) => path.replace(/:(\w+)/g, (_m, name: string) => ids[name] ?? '1');

function send(route: RouteSpec, path: string, token: string, agent: request.Agent, body?: string) {
  const target = route.device ? request(handler) : agent;
  let req = target[route.method](path);
  if (route.device) req = req.set('Authorization', `Bearer ${token}`);
  if (body !== undefined) req = req.set('Content-Type', 'application/json').send(body);
  return req;
}

// Hostile values: wrong types, huge and negative numbers, long and control-character strings, deep nesting.
const controlString = fc.string({
  unit: fc.constantFrom('\u0000', '\u0007', '\u001b', '\u007f', '\u202e', '\u2066', 'a', 'é', '%', '\\', '"'),
  maxLength: 40,
});
const hostileScalar = fc.oneof(
  fc.constantFrom(1e308, -1e308, Number.MAX_SAFE_INTEGER + 2, -1, 0, -0.5, 2 ** 31, -(2 ** 63), 1e-320),
  fc.integer(),
  fc.double({ noNaN: true, noDefaultInfinity: true }),
  fc.boolean(),
  fc.constant(null),
  controlString,
  fc.string({ minLength: 0, maxLength: 8 }).map((s) => s.repeat(2000)),
  fc.constantFrom('9999-12-31T23:59:59-10:00', '0000-01-01T00:00:00Z', '0999-06-01T00:00:00Z', '2026-02-30T00:00:00Z', 'NaN', '__proto__'),
);
const hostileValue: fc.Arbitrary<unknown> = fc.letrec((tie) => ({
  value: fc.oneof({ depthSize: 'small', withCrossShrink: true }, hostileScalar, tie('array'), tie('object')),
  array: fc.array(tie('value'), { maxLength: 4 }),
  object: fc.dictionary(fc.constantFrom('__proto__', 'constructor', 'prototype', 'name', 'x', ''), tie('value'), { maxKeys: 3 }),
})).value;

/** Paths to every value inside a body, e.g. ['transmissions', 0, 'startUtc']. */
function leafPaths(value: unknown, at: (string | number)[] = []): (string | number)[][] {
  if (Array.isArray(value)) return value.flatMap((v, i) => leafPaths(v, [...at, i]));
  if (value && typeof value === 'object') return Object.entries(value).flatMap(([k, v]) => leafPaths(v, [...at, k]));
  return at.length ? [at] : [];
}

function withValueAt(body: unknown, path: (string | number)[], value: unknown): unknown {
  if (!path.length) return value;
  const [head, ...rest] = path;
  const copy = (Array.isArray(body) ? [...body] : { ...(body as object) }) as Record<string | number, unknown>;
  copy[head] = withValueAt(copy[head], rest, value);
  return copy;
}

/** A body: the route's valid body with one value (at any depth) or key replaced by a hostile value, a duplicated key, or no object at all. */
function hostileBody(route: RouteSpec) {
  const keys = Object.keys(route.body ?? {});
  const leaves = leafPaths(route.body ?? {});
  const keyPool = fc.constantFrom(...keys, '__proto__', 'constructor', 'email', 'name', 'notes', 'id', 'ownerId');
  return fc.oneof(
    fc.tuple(keyPool, hostileValue).map(([key, value]) => {
      const text = JSON.stringify({ ...route.body, [key]: value === undefined ? null : value });
      // JSON.stringify drops a "__proto__" key set through spread; write it into the text itself.
      return key === '__proto__' ? text.replace(/^\{/, `{"__proto__":${JSON.stringify(value ?? null)},`).replace(/,\}$/, '}') : text;
    }),
    fc
      .tuple(fc.constantFrom(...(keys.length ? keys : ['name'])), hostileValue)
      .map(
        ([key, value]) =>
          `{${JSON.stringify(key)}:${JSON.stringify(value ?? null)},${JSON.stringify(route.body ?? {}).slice(1, -1)}${keys.length ? ',' : ''}${JSON.stringify(key)}:${JSON.stringify(value ?? null)}}`,
      ),
    hostileValue.map((value) => JSON.stringify(value ?? null)),
    ...(leaves.length
      ? [
          fc
            .tuple(fc.constantFrom(...leaves), hostileValue)
            .map(([path, value]) => JSON.stringify(withValueAt(route.body, path, value ?? null))),
        ]
      : []),
  );
}

const hostileParam = fc.oneof(
  fc.constantFrom(
    '%',
    '%zz',
    '%c0',
    '%e2%82',
    '%00',
    '-1',
    '0',
    '1e3',
    '9'.repeat(40),
    '1.5',
    '0x10',
    '%2F..%2F',
    'null',
    '__proto__',
    ' 1',
    '1%20',
  ),
  fc.string({ maxLength: 30 }).map(encodeURIComponent),
  fc.bigInt({ min: -(2n ** 70n), max: 2n ** 70n }).map(String),
);

describe('hostile input', () => {
  it('the route list used below names every route the app has', () => {
    const listed = new Set(API_ROUTES.map((r) => `${r.method.toUpperCase()} ${r.path}`.replace(/:\w+/g, ':p')));
    const missing = routesOf(server.app).filter((r) => r.startsWith('GET /api') || r.startsWith('P') || r.startsWith('DELETE'));
    expect(missing.filter((r) => !listed.has(r) && !r.startsWith('GET /api/health'))).toEqual([]);
  });

  it('when a path has malformed percent-encoding, answers 400 with the JSON error body (API, test inbox, web routes)', async () => {
    const withInbox = createApp({
      config: server.config,
      sequelize: server.sequelize,
      mailer: server.mailer,
      logger: createLogger('silent'),
      fakeSmtp: server.smtp,
    });
    const { agent } = await scenario().then((s) => s);
    for (const path of ['/api/stations/%', '/api/units/%zz', '/api/stations/1/bands/%c0', '/api/clubs/%e2%82/review']) {
      const res = await agent.get(path);
      expect({ path, status: res.status, code: res.body.error?.code }).toEqual({ path, status: 400, code: 'bad-request' });
      expect(res.body.error.message).toMatch(/%25/);
    }
    for (const path of ['/dev/inbox/%', '/stations/%', '/%zz', '/units/%c0/photos']) {
      const res = await request(withInbox).get(path);
      expect({ path, status: res.status, code: res.body.error?.code }).toEqual({ path, status: 400, code: 'bad-request' });
    }
  });

  it('when a timestamp is out of range or not a real time, answers 400 naming the field and stores nothing', async () => {
    const { agent, token, ids } = await scenario();
    const device = (path: string, body: object) =>
      request(handler).post(`/api/device/v1${path}`).set('Authorization', `Bearer ${token}`).send(body);
    const tx = (startUtc: string) => ({
      transmissions: [{ startUtc, bandId: '20m', frequencyHz: 14097100, messageText: 'Q9ZZT JO22 23' }],
    });
    for (const startUtc of [
      '9999-12-31T23:59:59-10:00',
      '0000-01-01T00:00:00Z',
      '0999-06-01T00:00:00Z',
      '1999-12-31T23:59:59Z',
      '2100-01-01T00:00:00Z',
      '2026-02-30T10:00:00Z',
      '2026-02-29T10:00:00Z',
    ]) {
      const res = await device('/transmissions', tx(startUtc));
      expect({ startUtc, status: res.status }).toEqual({ startUtc, status: 400 });
      expect(Object.keys(res.body.error.fields)).toEqual(['transmissions.0.startUtc']);
    }
    const heartbeat = {
      uptimeS: 1,
      firmwareVersion: '1',
      timeSource: 'gps',
      clockOffsetMs: 1,
      lastTransmission: { startUtc: '0999-01-01T00:00:00Z', bandId: '20m' },
    };
    const hb = await device('/heartbeat', heartbeat);
    expect(hb.status).toBe(400);
    expect(hb.body.error.fields).toHaveProperty(['lastTransmission.startUtc']);
    const [[{ n }]] = (await server.sequelize.query(
      'SELECT (SELECT COUNT(*) FROM device_transmissions) + (SELECT COUNT(*) FROM device_heartbeats) AS n',
    )) as [[{ n: number }], unknown];
    expect(Number(n)).toBe(0);
    // The leap day of a leap year and the edges of the range are real times.
    expect((await device('/transmissions', tx('2028-02-29T10:00:00Z'))).status).toBe(202);
    expect((await device('/transmissions', tx('2000-01-01T00:00:00Z'))).status).toBe(202);
    expect((await device('/transmissions', tx('2099-12-31T23:59:59-00:00'))).status).toBe(202);
    const plan = await agent.get(`/api/stations/${ids.station}/plan?from=0999-01-01T00:00:00Z`);
    expect(plan.status).toBe(400);
    expect(plan.body.error.fields).toHaveProperty('from');
    const schedule = await agent
      .post(`/api/stations/${ids.station}/schedule`)
      .send({ steps: [{ bandId: '20m', slots: 2 }], cadence: { kind: 'every-slot' }, startDate: '0999-01-01' });
    expect(schedule.status).toBe(400);
    expect(schedule.body.error.fields).toHaveProperty('startDate');
  });

  it('when a multipart part header carries a NUL or another control character, answers 400', async () => {
    const { agent, ids } = await scenario();
    const part = (disposition: string, type: string) =>
      Buffer.from(`--XX\r\nContent-Disposition: form-data; ${disposition}\r\nContent-Type: ${type}\r\n\r\nabc\r\n--XX--\r\n`, 'latin1');
    for (const body of [
      part('name="photo"; filename="a\u0000b.png"', 'image/png'),
      part('name="pho\u0001to"; filename="a.png"', 'image/png'),
      part('name="photo"; filename="a.png"', 'image/p\u0000ng'),
      part('name="photo"; filename="a.png"', 'image/png\u001b'),
    ]) {
      const res = await agent.post(`/api/units/${ids.unit}/photos`).set('Content-Type', 'multipart/form-data; boundary=XX').send(body);
      expect(res.status).toBeGreaterThanOrEqual(400);
      expect(res.status).toBeLessThan(500);
      expect(res.body.error.fields).toHaveProperty('photo');
    }
  });

  // Bounded: about 45 s in all on a shared 2-core machine; fast-check's seed is printed on failure.
  it('when generated hostile bodies and path parameters go to every route, no answer is a 5xx', async () => {
    const { agent, token, ids } = await scenario();
    const deadline = Date.now() + 40_000;
    const withBody = API_ROUTES.filter((r) => r.method !== 'get' && r.method !== 'delete' && !r.path.endsWith('/sign-out'));
    const perRoute = Math.max(1, Math.floor(20_000 / withBody.length));
    for (const route of withBody) {
      await fc.assert(
        fc.asyncProperty(hostileBody(route), async (body) => {
          const res = await send(route, fill(route.path, ids), token, agent, body);
          if (res.status >= 500)
            throw new Error(`${route.method} ${route.path} ${body.slice(0, 300)} → ${res.status} ${JSON.stringify(res.body)}`);
        }),
        { numRuns: 25, interruptAfterTimeLimit: perRoute, markInterruptAsFailure: false },
      );
    }
    const withParams = API_ROUTES.filter((r) => r.path.includes(':'));
    const paramBudget = Math.max(1, Math.floor((deadline - Date.now()) / withParams.length));
    for (const route of withParams) {
      await fc.assert(
        fc.asyncProperty(hostileParam, fc.nat(), async (param, which) => {
          const names = [...route.path.matchAll(/:(\w+)/g)].map((m) => m[1]);
          const target = names[which % names.length];
          const path = fill(route.path, { ...ids, [target]: param });
          const res = await send(route, path, token, agent, route.body ? JSON.stringify(route.body) : undefined);
          if (res.status >= 500) throw new Error(`${route.method} ${path} → ${res.status} ${JSON.stringify(res.body)}`);
        }),
        { numRuns: 30, interruptAfterTimeLimit: paramBudget, markInterruptAsFailure: false },
      );
    }
  }, 90_000);
});
