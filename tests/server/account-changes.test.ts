import request from 'supertest';
import { createHttpHandler } from '@/server/app';
import { createLogger } from '@/server/lib/logger';
import { makeClub, PASSWORD, signedInAgent, startTestServer, truncateAll, validUnit, type TestServer } from './helpers/test-app';

let server: TestServer;
beforeAll(async () => {
  server = await startTestServer({ SIGN_IN_ATTEMPTS: '50' });
});
afterAll(() => server.close());
beforeEach(() => truncateAll(server.sequelize));

const count = async (sql: string, replacements: unknown[] = []) => {
  const [rows] = await server.sequelize.query(sql, { replacements });
  return Number((rows as { n: number }[])[0].n);
};
const auditRows = async (action: string) => {
  const [rows] = await server.sequelize.query('SELECT * FROM audit_entries WHERE action = ? ORDER BY id', { replacements: [action] });
  return rows as { ownerId: number | null; actorId: number | null; clubId: number | null; summary: string; before: string | null }[];
};
const signIn = (email: string, password: string) => request(server.app).post('/api/auth/sign-in').send({ email, password });
const tokenIn = (text: string) => decodeURIComponent(/token=([^\s]+)/.exec(text)![1]);

describe('change password', () => {
  it('refuses a wrong current password beside its field and keeps the old password', async () => {
    const { agent, email } = await signedInAgent(server.app);
    const res = await agent.post('/api/auth/password').send({ currentPassword: 'not-my-password', newPassword: 'a-brand-new-password' });
    expect(res.status).toBe(400);
    expect(res.body.error.fields).toEqual({ currentPassword: 'This is not your current password' });
    expect((await signIn(email, PASSWORD)).status).toBe(200);
    expect((await signIn(email, 'a-brand-new-password')).status).toBe(401);
  });

  it('refuses a new password that is too short or the same as the current one', async () => {
    const { agent } = await signedInAgent(server.app);
    const short = await agent.post('/api/auth/password').send({ currentPassword: PASSWORD, newPassword: 'short' });
    expect(short.status).toBe(400);
    expect(short.body.error.fields).toHaveProperty('newPassword');
    const same = await agent.post('/api/auth/password').send({ currentPassword: PASSWORD, newPassword: PASSWORD });
    expect(same.status).toBe(400);
    expect(same.body.error.fields.newPassword).toMatch(/differs/);
  });

  it('changes the password, ends the other sessions (not this one), voids reset links, mails a notice and is audited', async () => {
    const first = await signedInAgent(server.app);
    const second = request.agent(server.app);
    expect((await second.post('/api/auth/sign-in').send({ email: first.email, password: PASSWORD })).status).toBe(200);
    await request(server.app).post('/api/auth/password-reset').send({ email: first.email });
    const resetMail = await server.smtp.waitFor((m) => m.to.includes(first.email) && /Reset/.test(m.subject));

    const res = await first.agent.post('/api/auth/password').send({ currentPassword: PASSWORD, newPassword: 'a-brand-new-password' });
    expect(res.status).toBe(200);
    expect(res.body).toEqual({ ended: 1 });
    expect((await first.agent.get('/api/auth/me')).status).toBe(200);
    expect((await second.get('/api/auth/me')).status).toBe(401);
    expect((await signIn(first.email, PASSWORD)).status).toBe(401);
    expect((await signIn(first.email, 'a-brand-new-password')).status).toBe(200);
    const reset = await request(server.app)
      .post('/api/auth/password-reset/confirm')
      .send({ token: tokenIn(resetMail.text), password: 'yet-another-password' });
    expect(reset.status).toBe(400);
    await server.smtp.waitFor((m) => m.to.includes(first.email) && /password was changed/.test(m.subject));
    const [entry] = await auditRows('password.change');
    expect(entry).toMatchObject({ ownerId: first.user.id, actorId: first.user.id });
    expect(entry.summary).toMatch(/1 other session/);
  });
});

describe('change e-mail', () => {
  it('changes the address only when the link mailed to the new address is opened; the old address gets a notice', async () => {
    const { agent, email, user } = await signedInAgent(server.app);
    const newEmail = `moved-${user.id}@test.faintline.example`;
    const asked = await agent.post('/api/auth/email-change').send({ newEmail: ` ${newEmail.toUpperCase()} `, password: PASSWORD });
    expect(asked.status).toBe(202);
    expect(asked.body.message).toContain(newEmail);
    expect((await agent.get('/api/auth/email-change')).body).toMatchObject({ newEmail });

    // Unconfirmed: nothing changed yet.
    expect((await agent.get('/api/auth/me')).body.email).toBe(email);
    expect((await signIn(newEmail, PASSWORD)).status).toBe(401);

    await request(server.app).post('/api/auth/password-reset').send({ email });
    const resetMail = await server.smtp.waitFor((m) => m.to.includes(email) && /Reset/.test(m.subject));
    const mail = await server.smtp.waitFor((m) => m.to.includes(newEmail));
    expect(mail.text).toContain('/confirm-email?token=');
    const confirmed = await request(server.app)
      .post('/api/auth/email-change/confirm')
      .send({ token: tokenIn(mail.text) });
    expect(confirmed.status).toBe(200);
    expect((await agent.get('/api/auth/me')).body.email).toBe(newEmail);
    expect((await signIn(email, PASSWORD)).status).toBe(401);
    expect((await signIn(newEmail, PASSWORD)).status).toBe(200);
    const notice = await server.smtp.waitFor((m) => m.to.includes(email) && /e-mail was changed/.test(m.subject));
    expect(notice.text).toContain(newEmail);
    expect((await agent.get('/api/auth/email-change')).body).toBeNull();
    // A reset link mailed to the old address no longer works.
    const reset = await request(server.app)
      .post('/api/auth/password-reset/confirm')
      .send({ token: tokenIn(resetMail.text), password: 'taken-over-password' });
    expect(reset.status).toBe(400);

    // The link works once.
    const again = await request(server.app)
      .post('/api/auth/email-change/confirm')
      .send({ token: tokenIn(mail.text) });
    expect(again.status).toBe(400);
    expect(again.body.error.fields.token).toMatch(/already used/);

    const [entry] = await auditRows('email.change');
    expect(JSON.parse(entry.before!)).toEqual({ email });
  });

  it('refuses an address another account uses, its own address, and a wrong password', async () => {
    const { agent, email } = await signedInAgent(server.app);
    const other = await signedInAgent(server.app);
    const taken = await agent.post('/api/auth/email-change').send({ newEmail: other.email, password: PASSWORD });
    expect(taken.status).toBe(409);
    expect(taken.body.error.fields.newEmail).toMatch(/Another account already uses this e-mail address/);
    const own = await agent.post('/api/auth/email-change').send({ newEmail: email, password: PASSWORD });
    expect(own.status).toBe(400);
    expect(own.body.error.fields.newEmail).toMatch(/already your e-mail/);
    const wrong = await agent.post('/api/auth/email-change').send({ newEmail: 'free@test.faintline.example', password: 'not-it-at-all' });
    expect(wrong.status).toBe(400);
    expect(wrong.body.error.fields).toEqual({ password: 'This is not your current password' });
    expect(await count('SELECT COUNT(*) AS n FROM email_changes')).toBe(0);
  });

  it('refuses an expired link and a link whose address was taken meanwhile', async () => {
    const { agent, user } = await signedInAgent(server.app);
    const newEmail = `later-${user.id}@test.faintline.example`;
    await agent.post('/api/auth/email-change').send({ newEmail, password: PASSWORD });
    const mail = await server.smtp.waitFor((m) => m.to.includes(newEmail));
    await server.sequelize.query('UPDATE email_changes SET expiresAt = ? WHERE userId = ?', {
      replacements: [new Date(Date.now() - 60_000), user.id],
    });
    const expired = await request(server.app)
      .post('/api/auth/email-change/confirm')
      .send({ token: tokenIn(mail.text) });
    expect(expired.status).toBe(400);
    expect(expired.body.error.fields.token).toMatch(/expired/);

    // A new request replaces the old one; someone registers the address before the link is opened.
    await agent.post('/api/auth/email-change').send({ newEmail, password: PASSWORD });
    const second = await server.smtp.waitFor((m) => m.to.includes(newEmail) && tokenIn(m.text) !== tokenIn(mail.text));
    await request(server.app).post('/api/auth/register').send({ email: newEmail, password: PASSWORD, displayName: 'Quick Taker' });
    const raced = await request(server.app)
      .post('/api/auth/email-change/confirm')
      .send({ token: tokenIn(second.text) });
    expect(raced.status).toBe(409);
    expect((await agent.get('/api/auth/me')).body.email).not.toBe(newEmail);
  });

  it('a pending change can be cancelled; its link then no longer works', async () => {
    const { agent, user } = await signedInAgent(server.app);
    const newEmail = `cancel-${user.id}@test.faintline.example`;
    await agent.post('/api/auth/email-change').send({ newEmail, password: PASSWORD });
    const mail = await server.smtp.waitFor((m) => m.to.includes(newEmail));
    expect((await agent.delete('/api/auth/email-change')).status).toBe(204);
    expect(
      (
        await request(server.app)
          .post('/api/auth/email-change/confirm')
          .send({ token: tokenIn(mail.text) })
      ).status,
    ).toBe(400);
  });
});

describe('delete account', () => {
  async function ownerWithThings() {
    const owner = await signedInAgent(server.app, { displayName: 'Quinn Leaving' });
    const { body: unit } = await owner.agent.post('/api/units').send(validUnit);
    const { body: station } = await owner.agent
      .post('/api/stations')
      .send({ name: 'Attic', callsign: 'Q9ZZT', locator: 'JO22AB', unitId: unit.id, transmitEnabled: true });
    await owner.agent.post(`/api/stations/${station.id}/schedule`).send({
      steps: [{ bandId: '20m', slots: 2 }],
      cadence: { kind: 'every-nth', nth: 5 },
      startDate: '2026-01-01',
    });
    const { body: device } = await owner.agent.post(`/api/stations/${station.id}/device-token`);
    const { body: post } = await owner.agent.post('/api/listening-posts').send({ name: 'Shed', callsign: 'Q9ZZR', locator: 'JO22ab' });
    return { ...owner, unit, station, deviceToken: device.token as string, post };
  }

  it('refuses a wrong password and changes nothing', async () => {
    const owner = await ownerWithThings();
    const res = await owner.agent.post('/api/auth/account/delete').send({ password: 'not-my-password' });
    expect(res.status).toBe(400);
    expect(res.body.error.fields).toEqual({ password: 'This is not your current password' });
    expect((await owner.agent.get('/api/stations')).body).toHaveLength(1);
  });

  it('refuses while the person is the only admin of a club with other members, names the club, and deletes nothing', async () => {
    const owner = await ownerWithThings();
    const member = await signedInAgent(server.app, { displayName: 'Quill Staying' });
    const clubId = await makeClub('Harbour Beacon Circle', owner.user.id, [member.user.id]);
    const preview = await owner.agent.get('/api/auth/account/deletion');
    expect(preview.body).toMatchObject({ stations: 1, deviceTokens: 1, units: 1, listeningPosts: 1, allowed: false });
    expect(preview.body.clubs).toEqual([{ clubId, clubName: 'Harbour Beacon Circle', outcome: 'hand-over' }]);

    const res = await owner.agent.post('/api/auth/account/delete').send({ password: PASSWORD });
    expect(res.status).toBe(409);
    expect(res.body.error.message).toMatch(/only admin of Harbour Beacon Circle/);
    expect((await owner.agent.get('/api/stations')).body).toHaveLength(1);
    expect((await owner.agent.get('/api/units')).body).toHaveLength(1);
    expect(await count('SELECT COUNT(*) AS n FROM club_memberships WHERE clubId = ?', [clubId])).toBe(2);

    // Once another member is an admin, the account can go.
    expect((await owner.agent.patch(`/api/clubs/${clubId}/members/${member.user.id}`).send({ role: 'admin' })).status).toBe(200);
    expect((await owner.agent.get('/api/auth/account/deletion')).body.allowed).toBe(true);
    expect((await owner.agent.post('/api/auth/account/delete').send({ password: PASSWORD })).status).toBe(200);
  });

  it('deletes stations, tokens, units, posts and sessions in one go; the club log records it; other accounts keep theirs', async () => {
    const owner = await ownerWithThings();
    const otherSession = request.agent(server.app);
    await otherSession.post('/api/auth/sign-in').send({ email: owner.email, password: PASSWORD });
    const admin = await signedInAgent(server.app, { displayName: 'Quentin Admin' });
    const { body: adminStation } = await admin.agent.post('/api/stations').send({ name: 'Mast', callsign: 'Q9ZZA', locator: 'JO22AB' });
    const clubId = await makeClub('Harbour Beacon Circle', admin.user.id, [owner.user.id]);
    const soloClub = await makeClub('Solo Loft Club', owner.user.id, []);
    const handler = createHttpHandler(server.app, createLogger('silent'));
    expect((await request(handler).get('/api/device/v1/config').set('Authorization', `Bearer ${owner.deviceToken}`)).status).toBe(200);

    const preview = (await owner.agent.get('/api/auth/account/deletion')).body;
    expect(preview.clubs).toEqual([
      { clubId, clubName: 'Harbour Beacon Circle', outcome: 'leave' },
      { clubId: soloClub, clubName: 'Solo Loft Club', outcome: 'delete-club' },
    ]);

    const res = await owner.agent.post('/api/auth/account/delete').send({ password: PASSWORD });
    expect(res.status).toBe(200);
    expect((await owner.agent.get('/api/auth/me')).status).toBe(401);
    expect((await otherSession.get('/api/auth/me')).status).toBe(401);
    expect((await signIn(owner.email, PASSWORD)).status).toBe(401);
    expect((await request(handler).get('/api/device/v1/config').set('Authorization', `Bearer ${owner.deviceToken}`)).status).toBe(401);
    for (const table of ['stations', 'units', 'listening_posts', 'schedules', 'device_tokens', 'club_memberships']) {
      const column = ['schedules', 'device_tokens'].includes(table) ? 'stationId' : table === 'club_memberships' ? 'userId' : 'ownerId';
      const id = column === 'stationId' ? owner.station.id : owner.user.id;
      expect({ table, n: await count(`SELECT COUNT(*) AS n FROM ${table} WHERE ${column} = ?`, [id]) }).toEqual({ table, n: 0 });
    }
    expect(await count('SELECT COUNT(*) AS n FROM clubs WHERE id = ?', [soloClub])).toBe(0);
    // The own log went; the club log has the departure; one record of the deletion stays.
    expect(await count('SELECT COUNT(*) AS n FROM audit_entries WHERE action = ?', ['station.create'])).toBe(1); // the admin's
    const departure = await auditRows('member.account-deleted');
    expect(departure).toHaveLength(1);
    expect(departure[0]).toMatchObject({ clubId, ownerId: null, actorId: null });
    expect(departure[0].summary).toMatch(/Quinn Leaving deleted their account and left the club; their station was deleted/);
    const clubLog = await admin.agent.get(`/api/clubs/${clubId}/audit`);
    expect(clubLog.body.map((e: { action: string }) => e.action)).toContain('member.account-deleted');
    expect(await auditRows('account.delete')).toHaveLength(1);
    await server.smtp.waitFor((m) => m.to.includes(owner.email) && /account is deleted/.test(m.subject));

    // The admin's own things are untouched.
    expect((await admin.agent.get(`/api/stations/${adminStation.id}`)).status).toBe(200);
    expect((await admin.agent.get(`/api/clubs/${clubId}`)).body.members).toHaveLength(1);
  });
});

describe('authorization walk: own-account routes', () => {
  it('when anonymous, every own-account route answers 401 and changes nothing', async () => {
    const anonymous = request(server.app);
    expect((await anonymous.post('/api/auth/password').send({ currentPassword: PASSWORD, newPassword: 'long-enough-pass' })).status).toBe(
      401,
    );
    expect((await anonymous.get('/api/auth/email-change')).status).toBe(401);
    expect((await anonymous.post('/api/auth/email-change').send({ newEmail: 'x@test.faintline.example', password: PASSWORD })).status).toBe(
      401,
    );
    expect((await anonymous.delete('/api/auth/email-change')).status).toBe(401);
    expect((await anonymous.get('/api/auth/account/deletion')).status).toBe(401);
    expect((await anonymous.post('/api/auth/account/delete').send({ password: PASSWORD })).status).toBe(401);
  });

  it('each route acts on the signed-in account only: another person sees nothing of it and keeps their own things', async () => {
    const a = await signedInAgent(server.app, { displayName: 'First Person' });
    const b = await signedInAgent(server.app, { displayName: 'Second Person' });
    await b.agent.post('/api/stations').send({ name: 'Garden', callsign: 'Q9ZZB', locator: 'JO22AB' });
    await a.agent.post('/api/auth/email-change').send({ newEmail: `a-moved-${a.user.id}@test.faintline.example`, password: PASSWORD });
    expect((await b.agent.get('/api/auth/email-change')).body).toBeNull();
    expect((await b.agent.get('/api/auth/account/deletion')).body).toMatchObject({ stations: 1, clubs: [] });
    // b cannot cancel a's change, and b typing a's password deletes nothing.
    expect((await b.agent.delete('/api/auth/email-change')).status).toBe(204);
    expect((await a.agent.get('/api/auth/email-change')).body).not.toBeNull();
    expect((await a.agent.post('/api/auth/account/delete').send({ password: PASSWORD })).status).toBe(200);
    expect((await b.agent.get('/api/stations')).body).toHaveLength(1);
    expect((await b.agent.get('/api/auth/me')).status).toBe(200);
  });
});
