import request from 'supertest';
import { PASSWORD, startTestServer, truncateAll, uniqueEmail, type TestServer } from './helpers/test-app';

let server: TestServer;
beforeAll(async () => {
  server = await startTestServer();
});
afterAll(() => server.close());
beforeEach(() => truncateAll(server.sequelize));

async function register(email = uniqueEmail()) {
  const agent = request.agent(server.app);
  const res = await agent.post('/api/auth/register').send({ email, password: PASSWORD, displayName: 'Mara Quell', callsign: 'q7mqa' });
  return { agent, res, email };
}

describe('POST /api/auth/register', () => {
  it('when the input is valid, responds 201 with the signed-in user and upper-cases the callsign', async () => {
    const { agent, res, email } = await register();
    expect(res.status).toBe(201);
    expect(res.body).toMatchObject({ email, displayName: 'Mara Quell', callsign: 'Q7MQA', clubs: [], adminOfClubIds: [] });
    expect(res.body.passwordHash).toBeUndefined();
    const me = await agent.get('/api/auth/me');
    expect(me.status).toBe(200);
    expect(me.body.email).toBe(email);
  });

  it('when the e-mail is taken, responds 409 naming the email field', async () => {
    const { email } = await register();
    const again = await request(server.app).post('/api/auth/register').send({ email, password: PASSWORD, displayName: 'Other' });
    expect(again.status).toBe(409);
    expect(again.body.error.fields.email).toMatch(/already exists/);
  });

  it('when the password is short and the e-mail malformed, responds 400 naming both fields', async () => {
    const res = await request(server.app).post('/api/auth/register').send({ email: 'not-an-email', password: 'short', displayName: 'X Y' });
    expect(res.status).toBe(400);
    expect(Object.keys(res.body.error.fields).sort()).toEqual(['email', 'password']);
  });
});

describe('POST /api/auth/sign-in', () => {
  it('when the password is right, responds 200 and issues a new HttpOnly SameSite=Lax session cookie', async () => {
    const { email } = await register();
    const agent = request.agent(server.app);
    const res = await agent.post('/api/auth/sign-in').send({ email, password: PASSWORD });
    expect(res.status).toBe(200);
    const cookie = String(res.headers['set-cookie']);
    expect(cookie).toMatch(/faintline\.sid=/);
    expect(cookie).toMatch(/HttpOnly/);
    expect(cookie).toMatch(/SameSite=Lax/);
  });

  it('when a session id existed before sign-in, replaces it with a new one', async () => {
    const { email } = await register();
    // A first sign-in gives a session id; signing in again on that session must regenerate it.
    const agent = request.agent(server.app);
    const first = await agent.post('/api/auth/sign-in').send({ email, password: PASSWORD });
    const second = await agent.post('/api/auth/sign-in').send({ email, password: PASSWORD });
    const sid = (res: request.Response) => String(res.headers['set-cookie']).match(/faintline\.sid=([^;]+)/)?.[1];
    expect(sid(first)).toBeDefined();
    expect(sid(second)).toBeDefined();
    expect(sid(second)).not.toBe(sid(first));
  });

  it('when the password is wrong, responds 401 with a message and no cookie', async () => {
    const { email } = await register();
    const res = await request(server.app).post('/api/auth/sign-in').send({ email, password: 'wrong-password' });
    expect(res.status).toBe(401);
    expect(res.body.error).toEqual({ code: 'unauthenticated', message: 'Wrong e-mail or password' });
  });

  it('when sign-in fails more often than allowed, responds 429', async () => {
    const { email } = await register();
    const statuses: number[] = [];
    for (let i = 0; i < server.config.SIGN_IN_ATTEMPTS + 1; i += 1) {
      statuses.push(
        (
          await request(server.app)
            .post('/api/auth/sign-in')
            .send({ email, password: `wrong-${i}` })
        ).status,
      );
    }
    expect(statuses.slice(0, server.config.SIGN_IN_ATTEMPTS).every((s) => s === 401)).toBe(true);
    expect(statuses.at(-1)).toBe(429);
    const rightPassword = await request(server.app).post('/api/auth/sign-in').send({ email, password: PASSWORD });
    expect(rightPassword.status).toBe(429);
  });
});

describe('GET /api/auth/me and sign-out', () => {
  it('when anonymous, responds 401', async () => {
    const res = await request(server.app).get('/api/auth/me');
    expect(res.status).toBe(401);
    expect(res.body.error.code).toBe('unauthenticated');
  });

  it('when signed out, the old cookie no longer works', async () => {
    const { agent } = await register();
    expect((await agent.post('/api/auth/sign-out')).status).toBe(204);
    expect((await agent.get('/api/auth/me')).status).toBe(401);
  });

  it('when the server restarts, the session is still valid (sessions live in MariaDB)', async () => {
    const { res } = await register();
    const cookie = String(res.headers['set-cookie']).split(';')[0];
    const restarted = await server.restart();
    const me = await request(restarted).get('/api/auth/me').set('Cookie', cookie);
    expect(me.status).toBe(200);
    expect(me.body.email).toBe(res.body.email);
  });
});

describe('PATCH /api/auth/me', () => {
  it('when the name and callsign are valid, saves them, upper-cases the callsign and logs the change', async () => {
    const { agent } = await register();
    const res = await agent.patch('/api/auth/me').send({ displayName: 'Mara Quell-Ostby', callsign: 'q7mqb/p' });
    expect(res.status).toBe(200);
    expect(res.body).toMatchObject({ displayName: 'Mara Quell-Ostby', callsign: 'Q7MQB/P' });
    expect((await agent.get('/api/auth/me')).body).toMatchObject({ displayName: 'Mara Quell-Ostby', callsign: 'Q7MQB/P' });
    const log = await agent.get('/api/audit');
    expect(log.body.map((e: { action: string }) => e.action)).toContain('profile.update');
  });

  it('when the callsign is empty, clears it', async () => {
    const { agent } = await register();
    const res = await agent.patch('/api/auth/me').send({ displayName: 'Mara Quell', callsign: '' });
    expect(res.status).toBe(200);
    expect(res.body.callsign).toBeNull();
  });

  it('when the name is too short and the callsign has no digit, responds 400 naming both and changes nothing', async () => {
    const { agent } = await register();
    const res = await agent.patch('/api/auth/me').send({ displayName: 'M', callsign: 'QABC' });
    expect(res.status).toBe(400);
    expect(Object.keys(res.body.error.fields).sort()).toEqual(['callsign', 'displayName']);
    expect((await agent.get('/api/auth/me')).body).toMatchObject({ displayName: 'Mara Quell', callsign: 'Q7MQA' });
  });

  it('when anonymous, responds 401', async () => {
    expect((await request(server.app).patch('/api/auth/me').send({ displayName: 'Nobody', callsign: '' })).status).toBe(401);
  });
});

describe('password reset by e-mail', () => {
  it('when requested, mails a link that changes the password once and then stops working', async () => {
    const { email } = await register();
    const ask = await request(server.app).post('/api/auth/password-reset').send({ email });
    expect(ask.status).toBe(202);
    const mail = await server.smtp.waitFor((m) => m.to.includes(email));
    expect(mail.subject).toBe('Reset your Faintline password');
    const token = decodeURIComponent(mail.text.match(/reset-password\?token=([^\s]+)/)![1]);

    const confirm = await request(server.app).post('/api/auth/password-reset/confirm').send({ token, password: 'a-brand-new-password' });
    expect(confirm.status).toBe(200);
    const reuse = await request(server.app).post('/api/auth/password-reset/confirm').send({ token, password: 'yet-another-password' });
    expect(reuse.status).toBe(400);
    expect(reuse.body.error.fields.token).toMatch(/invalid, already used or expired/);

    expect((await request(server.app).post('/api/auth/sign-in').send({ email, password: PASSWORD })).status).toBe(401);
    expect((await request(server.app).post('/api/auth/sign-in').send({ email, password: 'a-brand-new-password' })).status).toBe(200);
  });

  it('when the link has expired, refuses it', async () => {
    const { email } = await register();
    const { createPasswordReset } = await import('@/server/features/auth/auth.service');
    const longAgo = new Date(Date.now() - 31 * 60_000);
    const reset = await createPasswordReset(email, longAgo);
    const res = await request(server.app)
      .post('/api/auth/password-reset/confirm')
      .send({ token: reset!.token, password: 'a-brand-new-password' });
    expect(res.status).toBe(400);
  });

  it('when the e-mail is unknown, answers the same 202 and sends nothing', async () => {
    const before = server.smtp.messages.length;
    const res = await request(server.app).post('/api/auth/password-reset').send({ email: 'nobody@test.faintline.example' });
    expect(res.status).toBe(202);
    await new Promise((r) => setTimeout(r, 300));
    expect(server.smtp.messages.length).toBe(before);
  });
});
