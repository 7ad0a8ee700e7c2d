import { MemoryStore } from 'express-rate-limit';
import request from 'supertest';
import { createHttpHandler } from '@/server/app';
import { createLogger } from '@/server/lib/logger';
import { SlidingWindowStore } from '@/server/lib/sliding-window-store';
import { signedInAgent, startTestServer, truncateAll, type TestServer } from './helpers/test-app';

let server: TestServer;
let handler: ReturnType<typeof createHttpHandler>;
let queries = 0;
beforeAll(async () => {
  server = await startTestServer({ UNKNOWN_TOKENS_PER_ADDRESS: '1000', UPLOADS_PER_USER: '3' });
  handler = createHttpHandler(server.app, createLogger('silent'));
  // Counts every statement this app sends to MariaDB (the real database; nothing is mocked).
  server.sequelize.addHook('beforeQuery', () => {
    queries += 1;
  });
});
const others: TestServer[] = [];
afterAll(async () => {
  await Promise.all(others.map((other) => other.close()));
  await server.close();
});
beforeEach(() => truncateAll(server.sequelize));

const config = (token: string) => request(handler).get('/api/device/v1/config').set('Authorization', `Bearer ${token}`);
const heartbeat = (token: string) =>
  request(handler).post('/api/device/v1/heartbeat').set('Authorization', `Bearer ${token}`).send({ uptimeS: 1 });
const receptions = (token: string) =>
  request(handler).post('/api/device/v1/receptions').set('Authorization', `Bearer ${token}`).send({ reports: [] });

describe('unknown device tokens cost no database query once seen', () => {
  it('when one unknown token is sent 1000 times (config polls, heartbeats, reception posts), the database is asked at most once per route family', async () => {
    queries = 0;
    for (let i = 0; i < 500; i += 1) expect((await config('fld_made-up-token-never-issued')).status).toBe(401);
    for (let i = 0; i < 300; i += 1) expect((await heartbeat('fld_made-up-token-never-issued')).status).toBe(401);
    for (let i = 0; i < 200; i += 1) expect((await receptions('flp_made-up-token-never-issued')).status).toBe(401);
    // The device token is looked up once (config and heartbeat share the gateway), the listening-post token once.
    expect(queries).toBeGreaterThan(0);
    expect(queries).toBeLessThanOrEqual(2);
  });

  it('when a token longer than any issued one is sent, it is refused without a lookup', async () => {
    queries = 0;
    const res = await config(`fld_${'x'.repeat(500)}`);
    expect(res.status).toBe(401);
    expect(res.body.error.code).toBe('unauthenticated');
    expect(queries).toBe(0);
  });
});

describe('an address that sends many unknown tokens is throttled', () => {
  it('when one address sends more than the allowed unknown tokens in a minute, it gets 429 with Retry-After and the JSON error, without lookups', async () => {
    // Closed in afterAll: a closed second app would leave the shared models on a closed pool.
    const strict = await startTestServer({ UNKNOWN_TOKENS_PER_ADDRESS: '5' });
    others.push(strict);
    const strictHandler = createHttpHandler(strict.app, createLogger('silent'));
    let lookups = 0;
    strict.sequelize.addHook('beforeQuery', () => {
      lookups += 1;
    });
    const statuses: number[] = [];
    for (let i = 0; i < 20; i += 1) {
      const res = await request(strictHandler).get('/api/device/v1/config').set('Authorization', `Bearer fld_guess-${i}`);
      statuses.push(res.status);
      if (res.status === 429) {
        expect(res.headers['retry-after']).toBeDefined();
        expect(res.body.error.code).toBe('rate-limited');
      }
    }
    expect(statuses.slice(0, 5)).toEqual([401, 401, 401, 401, 401]);
    expect(statuses.slice(5).every((s) => s === 429)).toBe(true);
    // Five guesses were looked up; the fifteen after them never reached the database.
    expect(lookups).toBe(5);
  });
});

describe('the per-device limit counts in a sliding window', () => {
  // The property (a burst straddling a window edge passes at most about one limit) is the reason for a sliding
  // window over a fixed one; the fixed-window store shows the doubling it prevents.
  async function burstAcrossEdge(store: { increment(key: string): Promise<{ totalHits: number }> | { totalHits: number } }) {
    const limit = 120;
    let passed = 0;
    for (let i = 0; i < limit; i += 1) if ((await store.increment('device')).totalHits <= limit) passed += 1;
    return { limit, passed };
  }

  it('when 120 requests arrive just before a window edge and 120 just after, at most 121 pass (a fixed window passes 240)', async () => {
    let nowMs = 59_500;
    const sliding = new SlidingWindowStore({ windowMs: 60_000, now: () => nowMs });
    const before = await burstAcrossEdge(sliding);
    nowMs = 60_500;
    const after = await burstAcrossEdge(sliding);
    expect(before.passed).toBe(120);
    expect(before.passed + after.passed).toBeLessThanOrEqual(121);

    const fixed = new MemoryStore();
    fixed.init({ windowMs: 60_000 } as Parameters<MemoryStore['init']>[0]);
    const fixedBefore = await burstAcrossEdge(fixed);
    fixed.resetAll(); // what a fixed window does at its edge
    const fixedAfter = await burstAcrossEdge(fixed);
    fixed.shutdown();
    expect(fixedBefore.passed + fixedAfter.passed).toBe(240);
  });

  it('when a window has passed since a burst, the device may send again in proportion to the time gone by', async () => {
    let nowMs = 0;
    const sliding = new SlidingWindowStore({ windowMs: 60_000, now: () => nowMs });
    for (let i = 0; i < 120; i += 1) await sliding.increment('device');
    nowMs = 90_000; // half of the previous window still overlaps: about 60 of its requests still count
    let passed = 0;
    for (let i = 0; i < 120; i += 1) if (sliding.increment('device').totalHits <= 120) passed += 1;
    expect(passed).toBe(60);
    nowMs = 240_000; // two windows on: nothing counts any more
    expect(sliding.get('device').totalHits).toBe(0);
  });
});

describe('uploads per account', () => {
  it('when an account starts more uploads than allowed in 10 minutes, the next gets 429 with Retry-After; another account is not affected', async () => {
    const csv = Buffer.from('time,tx,rx,snr\n2026-11-30 12:00,Q1AAA,Q2BBB,-12\n');
    const first = await signedInAgent(server.app);
    const statuses: number[] = [];
    for (let i = 0; i < 4; i += 1) {
      const res = await first.agent
        .post('/api/reception-imports/preview')
        .attach('file', csv, { filename: 'r.csv', contentType: 'text/csv' });
      statuses.push(res.status);
      if (res.status === 429) {
        expect(res.headers['retry-after']).toBeDefined();
        expect(res.body.error.message).toMatch(/At most 3 uploads in 10 minutes/);
      }
    }
    expect(statuses.slice(0, 3).every((s) => s !== 429)).toBe(true);
    expect(statuses[3]).toBe(429);
    const second = await signedInAgent(server.app);
    const other = await second.agent
      .post('/api/reception-imports/preview')
      .attach('file', csv, { filename: 'r.csv', contentType: 'text/csv' });
    expect(other.status).not.toBe(429);
  });
});
