import request from 'supertest';
import { createApp } from '@/server/app';
import { createLogger } from '@/server/lib/logger';
import { PASSWORD, signedInAgent, startTestServer, truncateAll, uniqueEmail, type TestServer } from './helpers/test-app';

let server: TestServer;
beforeAll(async () => {
  server = await startTestServer({ SIGN_IN_ATTEMPTS: '3', BCRYPT_COST: '8' });
});
afterAll(() => server.close());
beforeEach(() => truncateAll(server.sequelize));

const signIn = (app: Parameters<typeof request>[0], email: string, password: string) =>
  request(app).post('/api/auth/sign-in').send({ email, password });

describe('accounts and sessions', () => {
  it('the sign-in limiter counts " Name@Example" and "name@example" as one address', async () => {
    const { email } = await signedInAgent(server.app);
    const spellings = [email, ` ${email}`, email.toUpperCase(), `${email} `];
    const statuses: number[] = [];
    for (const spelling of spellings) statuses.push((await signIn(server.app, spelling, 'wrong-password')).status);
    expect(statuses).toEqual([401, 401, 401, 429]);
  });

  it('an unknown e-mail takes about as long to refuse as a wrong password (same bcrypt work factor)', async () => {
    const { email } = await signedInAgent(server.app);
    const time = async (address: string) => {
      const start = process.hrtime.bigint();
      await signIn(server.app, address, 'wrong-password');
      return Number(process.hrtime.bigint() - start) / 1e6;
    };
    // Interleaved, medians of 3 each (limit 3 per address: fresh unknown addresses, one known address twice).
    const known = [await time(email), await time(email)];
    const unknown = [await time(uniqueEmail('nobody')), await time(uniqueEmail('nobody')), await time(uniqueEmail('nobody'))];
    const median = (xs: number[]) => [...xs].sort((a, b) => a - b)[Math.floor(xs.length / 2)];
    // With cost 8 a compare takes ~15 ms or more; before, the unknown path used cost 4 (~1 ms).
    expect(median(unknown)).toBeGreaterThan(median(known) * 0.5);
  });

  it('a password reset ends every session of the account; "sign out everywhere else" ends all but this one', async () => {
    const first = await signedInAgent(server.app);
    const second = request.agent(server.app);
    expect((await second.post('/api/auth/sign-in').send({ email: first.email, password: PASSWORD })).status).toBe(200);
    const third = request.agent(server.app);
    expect((await third.post('/api/auth/sign-in').send({ email: first.email, password: PASSWORD })).status).toBe(200);

    const ended = await first.agent.post('/api/auth/sessions/end-others');
    expect(ended.status).toBe(200);
    expect(ended.body.ended).toBe(2);
    expect((await first.agent.get('/api/auth/me')).status).toBe(200);
    expect((await second.get('/api/auth/me')).status).toBe(401);
    expect((await third.get('/api/auth/me')).status).toBe(401);

    await request(server.app).post('/api/auth/password-reset').send({ email: first.email });
    const mail = await server.smtp.waitFor((m) => m.to.includes(first.email));
    const token = decodeURIComponent(/token=([^\s]+)/.exec(mail.text)![1]);
    expect((await request(server.app).post('/api/auth/password-reset/confirm').send({ token, password: 'a-new-password-1' })).status).toBe(
      200,
    );
    expect((await first.agent.get('/api/auth/me')).status).toBe(401);
    expect((await request(server.app).post('/api/auth/sessions/end-others')).status).toBe(401);
  });

  it('authenticated API answers carry Cache-Control: no-store', async () => {
    const { agent } = await signedInAgent(server.app);
    for (const path of ['/api/auth/me', '/api/stations', '/api/units', '/api/clubs']) {
      expect((await agent.get(path)).headers['cache-control']).toBe('no-store');
    }
  });

  it('the local test inbox answers only loopback requests and never in production', async () => {
    const dev = createApp({
      config: server.config,
      sequelize: server.sequelize,
      mailer: server.mailer,
      logger: createLogger('silent'),
      fakeSmtp: server.smtp,
    });
    expect((await request(dev).get('/dev/inbox/messages.json')).status).toBe(200);
    // Through the loopback proxy for a remote client (trust proxy: loopback) the client's address counts.
    const remote = await request(dev).get('/dev/inbox/messages.json').set('X-Forwarded-For', '203.0.113.7');
    expect(remote.status).toBe(404);
    expect(JSON.stringify(remote.body)).not.toMatch(/@/);
    const prod = createApp({
      config: { ...server.config, NODE_ENV: 'production' },
      sequelize: server.sequelize,
      mailer: server.mailer,
      logger: createLogger('silent'),
      fakeSmtp: server.smtp,
    });
    const res = await request(prod).get('/dev/inbox/messages.json');
    expect(res.status).not.toBe(200);
    expect(res.text).not.toMatch(/"subject"/);
  });
});
