/**
 * Two real Faintline server processes on one database, as behind a load balancer: a session made on one works
 * on the other, a device token revoked on one is refused by the other within the change feed's bound (not
 * the cache lifetime, which is set to a minute here), and an alert opening is mailed once.
 */
import { spawn, type ChildProcess } from 'node:child_process';
import { createServer } from 'node:net';
import request from 'supertest';
import { evaluateAlerts } from '@/server/features/devices/alerts.service';
import { createSequelize } from '@/server/db/sequelize';
import { migrateToLatest } from '@/server/db/migrator';
import { startFakeSmtp, type FakeSmtp } from '@/server/mail/fake-smtp';
import { PASSWORD, TEST_DATABASE_URL, truncateAll, uniqueEmail, validUnit } from './helpers/test-app';

/** What the README promises: another process drops a revoked token within this many ms (poll 250 ms + query). */
const FEED_BOUND_MS = 1000;

const freePort = () =>
  new Promise<number>((resolve, reject) => {
    const probe = createServer();
    probe.once('error', reject);
    probe.listen(0, '127.0.0.1', () => {
      const { port } = probe.address() as { port: number };
      probe.close(() => resolve(port));
    });
  });

type Proc = { url: string; child: ChildProcess; output: string[] };

async function startProcess(smtpPort: number): Promise<Proc> {
  const port = await freePort();
  const output: string[] = [];
  const child = spawn(process.execPath, ['--import', 'tsx', 'server/index.ts'], {
    env: {
      ...process.env,
      NODE_ENV: 'test',
      PORT: String(port),
      DATABASE_URL: TEST_DATABASE_URL,
      FAKE_SMTP: '0',
      SMTP_PORT: String(smtpPort),
      FAINTLINE_SEED_DEMO: '0',
      WEB_DIST_DIR: 'tests/server/fixtures/no-dist',
      BCRYPT_COST: '4',
      LOG_LEVEL: 'warn',
      DEVICE_CACHE_MS: '60000',
      CHANGE_FEED_POLL_MS: '250',
      ALERTS_CRON: '0 0 1 1 *',
    },
    stdio: ['ignore', 'pipe', 'pipe'],
  });
  child.stdout?.on('data', (d: Buffer) => output.push(d.toString()));
  child.stderr?.on('data', (d: Buffer) => output.push(d.toString()));
  const url = `http://127.0.0.1:${port}`;
  const deadline = Date.now() + 90_000; // a cold tsx start on a busy 2-core machine can take half a minute
  while (Date.now() < deadline) {
    if (child.exitCode !== null) throw new Error(`server exited: ${output.join('')}`);
    const ok = await request(url)
      .get('/api/health')
      .then((r) => r.status === 200)
      .catch(() => false);
    if (ok) return { url, child, output };
    await new Promise((r) => setTimeout(r, 100));
  }
  throw new Error(`server did not start: ${output.join('')}`);
}

async function stopProcess(p: Proc | undefined) {
  if (!p || p.child.exitCode !== null) return;
  const exited = new Promise((resolve) => p.child.once('exit', resolve));
  p.child.kill('SIGTERM');
  await exited;
}

let smtp: FakeSmtp;
let a: Proc;
let b: Proc;
const sequelize = createSequelize(TEST_DATABASE_URL);

beforeAll(async () => {
  await migrateToLatest(sequelize);
  await truncateAll(sequelize);
  smtp = await startFakeSmtp();
  [a, b] = await Promise.all([startProcess(smtp.port), startProcess(smtp.port)]);
}, 200_000);

afterAll(async () => {
  await Promise.all([stopProcess(a), stopProcess(b)]);
  await smtp.close();
  await sequelize.close();
});

async function signUpOn(url: string) {
  const agent = request.agent(url);
  const email = uniqueEmail('two');
  const res = await agent.post('/api/auth/register').send({ email, displayName: 'Wren Halloway', password: PASSWORD, callsign: 'Q7TWO' });
  expect(res.status).toBe(201);
  return { agent, email };
}

it('a session made on one process works on the other', async () => {
  const { agent, email } = await signUpOn(a.url);
  const cookie = (await agent.get('/api/auth/me')).request.cookies;
  const onB = await request(b.url).get('/api/auth/me').set('Cookie', cookie);
  expect(onB.status).toBe(200);
  expect(onB.body.email).toBe(email);
});

it('a device token revoked on one process is refused by the other within the change feed bound', async () => {
  const { agent } = await signUpOn(a.url);
  const { body: unit } = await agent.post('/api/units').send(validUnit);
  const { body: station } = await agent
    .post('/api/stations')
    .send({ name: 'Shared beacon', callsign: 'Q7TWO', locator: 'JO22AB', unitId: unit.id, transmitEnabled: true });
  const { body: issued } = await agent.post(`/api/stations/${station.id}/device-token`);
  const poll = () => request(b.url).get('/api/device/v1/config').set('Authorization', `Bearer ${issued.token}`);
  expect((await poll()).status).toBe(200); // process B now holds the token in its cache (for a minute)

  expect((await agent.delete(`/api/stations/${station.id}/device-token`)).status).toBe(204);
  const revokedAt = Date.now();
  let status = 200;
  while (status === 200 && Date.now() - revokedAt < 5000) {
    status = (await poll()).status;
    if (status === 200) await new Promise((r) => setTimeout(r, 25));
  }
  const tookMs = Date.now() - revokedAt;
  expect(status).toBe(401);
  expect(tookMs).toBeLessThanOrEqual(FEED_BOUND_MS);
});

it('an alert opening is mailed once when two processes evaluate at the same moment', async () => {
  const { agent } = await signUpOn(a.url);
  const { body: unit } = await agent.post('/api/units').send(validUnit);
  const { body: station } = await agent
    .post('/api/stations')
    .send({ name: 'Silent beacon', callsign: 'Q7TWO', locator: 'JO22AB', unitId: unit.id, transmitEnabled: true });
  expect((await agent.put(`/api/stations/${station.id}/bands/20m`).send({ enabled: true, calibrationOffsetHz: 0 })).status).toBe(200);
  const schedule = await agent
    .post(`/api/stations/${station.id}/schedule`)
    .send({ steps: [{ bandId: '20m', slots: 2 }], cadence: { kind: 'every-nth', nth: 5 }, startDate: '2026-01-01' });
  expect(schedule.status).toBe(201);
  expect((await agent.post(`/api/stations/${station.id}/device-token`)).status).toBe(201);
  // Two connection pools stand for the two processes' pools: the job lock lives in the database.
  const other = createSequelize(TEST_DATABASE_URL);
  try {
    const later = Date.now() + 3 * 3600_000;
    const results = await Promise.all([evaluateAlerts(sequelize, later), evaluateAlerts(other, later)]);
    expect(results.flatMap((r) => r ?? []).filter((m) => /silent/.test(m.subject))).toHaveLength(1);
  } finally {
    await other.close();
  }
});
