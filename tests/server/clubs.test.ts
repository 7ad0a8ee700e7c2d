import request from 'supertest';
import { makeClub, signedInAgent, startTestServer, truncateAll, validUnit, type TestServer } from './helpers/test-app';

let server: TestServer;
beforeAll(async () => {
  server = await startTestServer();
});
afterAll(() => server.close());
beforeEach(() => truncateAll(server.sequelize));

type Persona = 'anonymous' | 'outsider' | 'member' | 'otherAdmin' | 'admin';

async function scenario() {
  const admin = await signedInAgent(server.app, { displayName: 'Club Admin' });
  const member = await signedInAgent(server.app, { displayName: 'Club Member' });
  const outsider = await signedInAgent(server.app, { displayName: 'Outsider' });
  const otherAdmin = await signedInAgent(server.app, { displayName: 'Other Admin' });
  const clubId = await makeClub('Harbour Circle', admin.user.id, [member.user.id]);
  await makeClub('Other Circle', otherAdmin.user.id, [outsider.user.id]);
  const { body: unit } = await member.agent.post('/api/units').send(validUnit);
  const { body: station } = await member.agent
    .post('/api/stations')
    .send({ name: 'Member beacon', callsign: 'Q9ZZT', locator: 'JO22', unitId: unit.id, transmitEnabled: true });
  const agents: Record<Persona, request.Agent | ReturnType<typeof request>> = {
    anonymous: request(server.app),
    outsider: outsider.agent,
    member: member.agent,
    otherAdmin: otherAdmin.agent,
    admin: admin.agent,
  };
  return { admin, member, outsider, otherAdmin, clubId, station, agents };
}

// For each club route: the status each persona must get. Reads and admin actions are hidden (404)
// from people outside the club, refused (403) to plain members, and allowed to this club's admins.
const routes: {
  method: 'get' | 'post' | 'patch' | 'delete';
  path: (c: number, s: number) => string;
  body?: object;
  expect: Record<Persona, number>;
}[] = [
  { method: 'get', path: (c) => `/api/clubs/${c}`, expect: { anonymous: 401, outsider: 404, member: 200, otherAdmin: 404, admin: 200 } },
  {
    method: 'patch',
    path: (c) => `/api/clubs/${c}`,
    body: { maxPowerDbm: 27 },
    expect: { anonymous: 401, outsider: 404, member: 403, otherAdmin: 404, admin: 200 },
  },
  {
    method: 'get',
    path: (c) => `/api/clubs/${c}/stations`,
    expect: { anonymous: 401, outsider: 404, member: 403, otherAdmin: 404, admin: 200 },
  },
  {
    method: 'get',
    path: (c) => `/api/clubs/${c}/review`,
    expect: { anonymous: 401, outsider: 404, member: 403, otherAdmin: 404, admin: 200 },
  },
  {
    method: 'get',
    path: (c) => `/api/clubs/${c}/conflicts`,
    expect: { anonymous: 401, outsider: 404, member: 403, otherAdmin: 404, admin: 200 },
  },
  {
    method: 'get',
    path: (c) => `/api/clubs/${c}/occupancy`,
    expect: { anonymous: 401, outsider: 404, member: 403, otherAdmin: 404, admin: 200 },
  },
  {
    method: 'get',
    path: (c) => `/api/clubs/${c}/invitations`,
    expect: { anonymous: 401, outsider: 404, member: 403, otherAdmin: 404, admin: 200 },
  },
  {
    method: 'post',
    path: (c) => `/api/clubs/${c}/invitations`,
    body: { email: 'new@test.faintline.example' },
    expect: { anonymous: 401, outsider: 404, member: 403, otherAdmin: 404, admin: 201 },
  },
  {
    method: 'get',
    path: (c) => `/api/clubs/${c}/audit`,
    expect: { anonymous: 401, outsider: 404, member: 403, otherAdmin: 404, admin: 200 },
  },
  {
    method: 'post',
    path: (c) => `/api/clubs/${c}/offset-proposals`,
    body: { stationId: 0, proposedOffsetHz: 1480 },
    expect: { anonymous: 401, outsider: 404, member: 403, otherAdmin: 404, admin: 201 },
  },
  {
    method: 'post',
    path: (c, s) => `/api/clubs/${c}/stations/${s}/suspension`,
    body: { reason: 'Testing the rules' },
    expect: { anonymous: 401, outsider: 404, member: 403, otherAdmin: 404, admin: 201 },
  },
  {
    method: 'delete',
    path: (c, s) => `/api/clubs/${c}/stations/${s}/suspension`,
    expect: { anonymous: 401, outsider: 404, member: 403, otherAdmin: 404, admin: 204 },
  },
];

describe('club routes: who may do what', () => {
  for (const persona of ['anonymous', 'outsider', 'member', 'otherAdmin', 'admin'] as Persona[]) {
    it(`when ${persona} walks every club route, gets the expected status and sees no other club's data`, async () => {
      const { clubId, station, agents } = await scenario();
      for (const route of routes) {
        const body = route.body && 'stationId' in route.body ? { ...route.body, stationId: station.id } : route.body;
        const agent = agents[persona] as request.Agent;
        const res = await agent[route.method](route.path(clubId, station.id)).send(body ?? {});
        expect({ route: `${route.method} ${route.path(clubId, station.id)}`, status: res.status }).toEqual({
          route: `${route.method} ${route.path(clubId, station.id)}`,
          status: route.expect[persona],
        });
        if (res.status >= 400) expect(JSON.stringify(res.body)).not.toMatch(/Member beacon|Q9ZZT|Club Member/);
      }
    });
  }
});

describe('membership rules', () => {
  it('when the last admin tries to leave, responds 409; after promoting a member, leaving works', async () => {
    const { admin, member, clubId } = await scenario();
    const leave = await admin.agent.delete(`/api/clubs/${clubId}/members/${admin.user.id}`);
    expect(leave.status).toBe(409);
    expect(leave.body.error.message).toMatch(/another member an admin first/);
    expect((await admin.agent.patch(`/api/clubs/${clubId}/members/${member.user.id}`).send({ role: 'admin' })).status).toBe(200);
    expect((await admin.agent.delete(`/api/clubs/${clubId}/members/${admin.user.id}`)).status).toBe(204);
    const detail = await member.agent.get(`/api/clubs/${clubId}`);
    expect(detail.body.members.map((m: { userId: number; role: string }) => [m.userId, m.role])).toEqual([[member.user.id, 'admin']]);
  });

  it('when an operator creates a club, they become its admin', async () => {
    const { agent } = await signedInAgent(server.app);
    const res = await agent.post('/api/clubs').send({ name: 'Fresh Circle' });
    expect(res.status).toBe(201);
    expect(res.body).toMatchObject({ name: 'Fresh Circle', myRole: 'admin', maxPowerDbm: 30 });
    const me = await agent.get('/api/auth/me');
    expect(me.body.adminOfClubIds).toEqual([res.body.id]);
  });

  it('when the admin removes a member, the member loses access to the club', async () => {
    const { admin, member, clubId } = await scenario();
    expect((await admin.agent.delete(`/api/clubs/${clubId}/members/${member.user.id}`)).status).toBe(204);
    expect((await member.agent.get(`/api/clubs/${clubId}`)).status).toBe(404);
  });
});

describe('invitations by e-mail', () => {
  it('when invited, the mail arrives; its link joins once; a second use and an expired link are refused', async () => {
    const { admin, clubId } = await scenario();
    const guest = await signedInAgent(server.app, { displayName: 'Guest' });
    expect((await admin.agent.post(`/api/clubs/${clubId}/invitations`).send({ email: guest.email })).status).toBe(201);
    const mail = await server.smtp.waitFor((m) => m.to.includes(guest.email));
    expect(mail.subject).toBe('You are invited to Harbour Circle on Faintline');
    const token = decodeURIComponent(mail.text.match(/join\?token=([^\s]+)/)![1]);
    const joined = await guest.agent.post('/api/invitations/accept').send({ token });
    expect(joined.status).toBe(200);
    expect((await guest.agent.get(`/api/clubs/${clubId}`)).status).toBe(200);
    const again = await guest.agent.post('/api/invitations/accept').send({ token });
    expect(again.status).toBe(400);
    expect(again.body.error.fields.token).toMatch(/already used/);

    const late = await signedInAgent(server.app, { displayName: 'Late' });
    const { invite } = await import('@/server/features/clubs/invitations.service');
    const { findSessionUser } = await import('@/server/features/auth/users.repo');
    const adminUser = (await findSessionUser(admin.user.id))!;
    const old = await invite(server.sequelize, adminUser, clubId, late.email, 'http://x', new Date(Date.now() - 8 * 86_400_000));
    const oldToken = decodeURIComponent(old.mail.text.match(/join\?token=([^\s]+)/)![1]);
    const expired = await late.agent.post('/api/invitations/accept').send({ token: oldToken });
    expect(expired.status).toBe(400);
    expect(expired.body.error.fields.token).toMatch(/expired/);
  });

  it('when someone else opens the link, responds 403 and does not join', async () => {
    const { admin, clubId, outsider } = await scenario();
    await admin.agent.post(`/api/clubs/${clubId}/invitations`).send({ email: 'someone@test.faintline.example' });
    const mail = await server.smtp.waitFor((m) => m.to.includes('someone@test.faintline.example'));
    const token = decodeURIComponent(mail.text.match(/join\?token=([^\s]+)/)![1]);
    expect((await outsider.agent.post('/api/invitations/accept').send({ token })).status).toBe(403);
    expect((await outsider.agent.get(`/api/clubs/${clubId}`)).status).toBe(404);
  });

  it('an admin can send a pending invitation again (the old link stops working) and withdraw one (its link stops working)', async () => {
    const { admin, member, clubId } = await scenario();
    const guest = await signedInAgent(server.app, { displayName: 'Guest Twice' });
    const { body: invitation } = await admin.agent.post(`/api/clubs/${clubId}/invitations`).send({ email: guest.email });
    const first = await server.smtp.waitFor((m) => m.to.includes(guest.email));
    const firstToken = decodeURIComponent(first.text.match(/join\?token=([^\s]+)/)![1]);

    expect((await member.agent.post(`/api/clubs/${clubId}/invitations/${invitation.id}/resend`)).status).toBe(403);
    expect((await admin.agent.post(`/api/clubs/${clubId}/invitations/${invitation.id}/resend`)).status).toBe(204);
    const second = await server.smtp.waitFor((m) => m.to.includes(guest.email) && !m.text.includes(encodeURIComponent(firstToken)));
    const secondToken = decodeURIComponent(second.text.match(/join\?token=([^\s]+)/)![1]);
    expect(secondToken).not.toBe(firstToken);
    expect((await guest.agent.post('/api/invitations/accept').send({ token: firstToken })).status).toBe(400);

    expect((await member.agent.delete(`/api/clubs/${clubId}/invitations/${invitation.id}`)).status).toBe(403);
    expect((await admin.agent.delete(`/api/clubs/${clubId}/invitations/${invitation.id}`)).status).toBe(204);
    expect((await admin.agent.get(`/api/clubs/${clubId}/invitations`)).body).toEqual([]);
    expect((await guest.agent.post('/api/invitations/accept').send({ token: secondToken })).status).toBe(400);
    expect((await admin.agent.delete(`/api/clubs/${clubId}/invitations/${invitation.id}`)).status).toBe(404);
    const log = await admin.agent.get(`/api/clubs/${clubId}/audit`);
    expect(JSON.stringify(log.body)).toMatch(/Withdrew the invitation/);
  });
});

describe('suspension', () => {
  it('when the admin suspends a station, its plan and config say suspended, the owner gets mail and a notice; lifting restores it', async () => {
    const { admin, member, clubId, station } = await scenario();
    await member.agent.put(`/api/stations/${station.id}/bands/20m`).send({ enabled: true, calibrationOffsetHz: 0 });
    await member.agent
      .post(`/api/stations/${station.id}/schedule`)
      .send({ steps: [{ bandId: '20m', slots: 1 }], cadence: { kind: 'every-nth', nth: 5 }, startDate: '2026-01-01' });
    const res = await admin.agent
      .post(`/api/clubs/${clubId}/stations/${station.id}/suspension`)
      .send({ reason: 'Harmonics on 40 m reported by two members' });
    expect(res.status).toBe(201);
    const mail = await server.smtp.waitFor((m) => m.to.includes(member.email) && /suspended/.test(m.subject));
    expect(mail.text).toMatch(/Harmonics on 40 m/);
    const plan = await member.agent.get(`/api/stations/${station.id}/plan`);
    expect(plan.body.transmissions).toEqual([]);
    expect(plan.body.quiet.map((q: { code: string }) => q.code)).toContain('suspended');
    const config = await member.agent.get(`/api/stations/${station.id}/config`);
    expect(config.body.station).toMatchObject({ suspended: true, transmitEnabled: false });
    const notices = await member.agent.get('/api/notifications');
    expect(notices.body[0].message).toMatch(/suspended Member beacon/);
    const unreadBefore = notices.body.filter((n: { readAt: string | null }) => !n.readAt).length;
    expect(unreadBefore).toBeGreaterThan(0);
    const all = await member.agent.post('/api/notifications/read-all');
    expect(all.body).toEqual({ marked: unreadBefore });
    const after = await member.agent.get('/api/notifications');
    expect(after.body.every((n: { readAt: string | null }) => n.readAt !== null)).toBe(true);
    // another person's notices are not touched
    expect((await admin.agent.post('/api/notifications/read-all')).body.marked).toBeGreaterThanOrEqual(0);

    expect((await admin.agent.delete(`/api/clubs/${clubId}/stations/${station.id}/suspension`)).status).toBe(204);
    expect((await member.agent.get(`/api/stations/${station.id}/plan`)).body.transmissions.length).toBeGreaterThan(0);
  });
});

describe('review, conflicts and proposals', () => {
  it('when a member enables an unfiltered band in their schedule or power exceeds the limit, the review says so', async () => {
    const { admin, member, clubId, station } = await scenario();
    await admin.agent.patch(`/api/clubs/${clubId}`).send({ maxPowerDbm: 5 });
    await member.agent.put(`/api/stations/${station.id}/bands/20m`).send({ enabled: true });
    const review = await admin.agent.get(`/api/clubs/${clubId}/review`);
    const row = review.body.find((r: { stationId: number }) => r.stationId === station.id);
    expect(row.status).toBe('attention');
    const codes = row.findings.map((f: { code: string }) => f.code);
    expect(codes).toEqual(expect.arrayContaining(['power-over-limit', 'not-calibrated']));
  });

  it('when two stations collide, the admin sees the pair, proposes an offset, the owner is mailed, and accepting changes the station', async () => {
    const { admin, member, clubId, station } = await scenario();
    const second = await signedInAgent(server.app, { displayName: 'Second Member' });
    const { MembershipModel } = await import('@/server/db/models/membership.model');
    await MembershipModel.create({ clubId, userId: second.user.id, role: 'member' });
    const { body: unit2 } = await second.agent.post('/api/units').send(validUnit);
    const { body: station2 } = await second.agent
      .post('/api/stations')
      .send({ name: 'Twin beacon', callsign: 'Q9ZZU', locator: 'JO22', unitId: unit2.id, transmitEnabled: true });
    const rules = { steps: [{ bandId: '20m', slots: 1 }], cadence: { kind: 'every-nth', nth: 5 }, startDate: '2026-01-01' };
    for (const [agent, s] of [
      [member.agent, station],
      [second.agent, station2],
    ] as const) {
      await agent.put(`/api/stations/${s.id}/bands/20m`).send({ enabled: true, calibrationOffsetHz: 0 });
      await agent.post(`/api/stations/${s.id}/schedule`).send(rules);
    }
    const conflicts = await admin.agent.get(`/api/clubs/${clubId}/conflicts`);
    expect(conflicts.status).toBe(200);
    expect(conflicts.body.conflicts).toHaveLength(1);
    expect(conflicts.body.conflicts[0].bandId).toBe('20m');
    // every 5th of the 720 slots in 24 hours, the same slots for both
    expect(conflicts.body.conflicts[0].slotCount).toBe(144);
    const proposal = conflicts.body.proposals[0];
    expect(Math.abs(proposal.proposedOffsetHz - proposal.currentOffsetHz)).toBeGreaterThanOrEqual(6);

    const owner = proposal.stationId === station.id ? member : second;
    const created = await admin.agent
      .post(`/api/clubs/${clubId}/offset-proposals`)
      .send({ stationId: proposal.stationId, proposedOffsetHz: proposal.proposedOffsetHz });
    expect(created.status).toBe(201);
    const mail = await server.smtp.waitFor((m) => m.to.includes(owner.email) && /audio offset/.test(m.subject));
    expect(mail.text).toMatch(/Nothing changes until you accept/);
    expect((await owner.agent.get(`/api/stations/${proposal.stationId}`)).body.audioOffsetHz).toBe(1500);
    const mine = await owner.agent.get('/api/offset-proposals');
    expect(mine.body[0].status).toBe('pending');
    const accepted = await owner.agent.post(`/api/offset-proposals/${created.body.id}/accept`);
    expect(accepted.status).toBe(200);
    expect((await owner.agent.get(`/api/stations/${proposal.stationId}`)).body.audioOffsetHz).toBe(proposal.proposedOffsetHz);
    expect((await admin.agent.get(`/api/clubs/${clubId}/conflicts`)).body.conflicts).toEqual([]);
  });
});

describe('audit log', () => {
  it('when things change, admins see the club log and operators their own, both as CSV too', async () => {
    const { admin, member, clubId, station } = await scenario();
    await member.agent.patch(`/api/stations/${station.id}`).send({ audioOffsetHz: 1490 });
    await admin.agent.post(`/api/clubs/${clubId}/stations/${station.id}/suspension`).send({ reason: 'Checking the filter' });
    const own = await member.agent.get('/api/audit');
    const actions = own.body.map((e: { action: string }) => e.action);
    expect(actions).toEqual(expect.arrayContaining(['unit.create', 'station.create', 'station.update', 'station.suspend']));
    const update = own.body.find((e: { action: string }) => e.action === 'station.update');
    expect(update.before.audioOffsetHz).toBe(1500);
    expect(update.after.audioOffsetHz).toBe(1490);
    expect(update.atUtc).toMatch(/Z$/);
    const club = await admin.agent.get(`/api/clubs/${clubId}/audit`);
    expect(club.body.map((e: { action: string }) => e.action)).toEqual(expect.arrayContaining(['station.update', 'station.suspend']));
    const csv = await admin.agent.get(`/api/clubs/${clubId}/audit?format=csv`);
    expect(csv.headers['content-type']).toMatch(/text\/csv/);
    expect(csv.text.split('\r\n')[0]).toBe('time_utc,who,action,what,id,summary,before,after');
    expect(csv.text).toMatch(/station\.suspend/);
  });
});
