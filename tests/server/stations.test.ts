import request from 'supertest';
import { makeClub, signedInAgent, startTestServer, truncateAll, validStation, type TestServer } from './helpers/test-app';

let server: TestServer;
beforeAll(async () => {
  server = await startTestServer();
});
afterAll(() => server.close());
beforeEach(() => truncateAll(server.sequelize));

describe('stations: anonymous access', () => {
  it.each([
    ['GET', '/api/stations'],
    ['POST', '/api/stations'],
    ['GET', '/api/stations/1'],
    ['PATCH', '/api/stations/1'],
    ['DELETE', '/api/stations/1'],
    ['GET', '/api/clubs/1/stations'],
  ])('when anonymous, %s %s responds 401', async (method, path) => {
    const res = await request(server.app)[method.toLowerCase() as 'get'](path).send({});
    expect(res.status).toBe(401);
    expect(res.body.error.code).toBe('unauthenticated');
  });
});

describe('POST /api/stations', () => {
  it('when an operator sends a valid station, responds 201 and lists it', async () => {
    const { agent, user } = await signedInAgent(server.app);
    const res = await agent.post('/api/stations').send({ ...validStation, callsign: 'q9zzt' });
    expect(res.status).toBe(201);
    expect(res.body).toMatchObject({ name: 'Loft beacon', callsign: 'Q9ZZT', locator: 'JO22AB', ownerId: user.id });
    const list = await agent.get('/api/stations');
    expect(list.body.map((s: { id: number }) => s.id)).toEqual([res.body.id]);
  });

  it.each([
    ['callsign', { callsign: 'ABCDEF' }, /digit/],
    ['callsign', { callsign: 'Q9/ZZ/T' }, /one "\/"/],
    ['locator', { locator: 'ZZ99' }, /Maidenhead/],
    ['locator', { locator: 'JO2' }, /Maidenhead/],
    ['name', { name: '' }, /name/],
  ])('when the %s is bad (%j), responds 400 naming it', async (field, change, message) => {
    const { agent } = await signedInAgent(server.app);
    const res = await agent.post('/api/stations').send({ ...validStation, ...change });
    expect(res.status).toBe(400);
    expect(res.body.error.fields[field]).toMatch(message);
    expect((await agent.get('/api/stations')).body).toEqual([]);
  });
});

describe('one operator and another operator’s station', () => {
  it('when a stranger reads, edits or deletes it, responds 404 and changes nothing', async () => {
    const owner = await signedInAgent(server.app);
    const { body: station } = await owner.agent.post('/api/stations').send(validStation);
    const stranger = await signedInAgent(server.app);
    expect((await stranger.agent.get(`/api/stations/${station.id}`)).status).toBe(404);
    expect((await stranger.agent.patch(`/api/stations/${station.id}`).send({ name: 'Mine now' })).status).toBe(404);
    expect((await stranger.agent.delete(`/api/stations/${station.id}`)).status).toBe(404);
    const after = await owner.agent.get(`/api/stations/${station.id}`);
    expect(after.status).toBe(200);
    expect(after.body.name).toBe('Loft beacon');
  });

  it('when the owner edits and deletes it, responds 200 then 204 and it is gone', async () => {
    const owner = await signedInAgent(server.app);
    const { body: station } = await owner.agent.post('/api/stations').send(validStation);
    const patched = await owner.agent.patch(`/api/stations/${station.id}`).send({ locator: 'io91wm' });
    expect(patched.status).toBe(200);
    expect(patched.body.locator).toBe('IO91WM');
    expect((await owner.agent.delete(`/api/stations/${station.id}`)).status).toBe(204);
    expect((await owner.agent.get(`/api/stations/${station.id}`)).status).toBe(404);
  });

  it('when the id is not a number, responds 404', async () => {
    const owner = await signedInAgent(server.app);
    expect((await owner.agent.get('/api/stations/abc')).status).toBe(404);
  });
});

describe('club admins and members’ stations', () => {
  it('when the club admin reads a member’s station, responds 200, but editing it responds 403', async () => {
    const member = await signedInAgent(server.app, { displayName: 'Oda Member' });
    const admin = await signedInAgent(server.app, { displayName: 'Ansel Admin' });
    await makeClub('Test Circle', admin.user.id, [member.user.id]);
    const { body: station } = await member.agent.post('/api/stations').send(validStation);

    const read = await admin.agent.get(`/api/stations/${station.id}`);
    expect(read.status).toBe(200);
    expect(read.body.ownerName).toBe('Oda Member');
    const edit = await admin.agent.patch(`/api/stations/${station.id}`).send({ name: 'Changed' });
    expect(edit.status).toBe(403);
    expect(edit.body.error.code).toBe('forbidden');
  });

  it('when the admin lists the club’s stations, sees members’ stations only; a member gets 403, an outsider 404', async () => {
    const member = await signedInAgent(server.app);
    const admin = await signedInAgent(server.app);
    const outsider = await signedInAgent(server.app);
    const clubId = await makeClub('Test Circle', admin.user.id, [member.user.id]);
    await member.agent.post('/api/stations').send(validStation);
    await outsider.agent.post('/api/stations').send({ ...validStation, name: 'Not in the club' });

    const list = await admin.agent.get(`/api/clubs/${clubId}/stations`);
    expect(list.status).toBe(200);
    expect(list.body.map((s: { name: string }) => s.name)).toEqual(['Loft beacon']);
    expect((await member.agent.get(`/api/clubs/${clubId}/stations`)).status).toBe(403);
    expect((await outsider.agent.get(`/api/clubs/${clubId}/stations`)).status).toBe(404);
  });

  it('when an admin of another club reads a station, responds 404', async () => {
    const member = await signedInAgent(server.app);
    const otherAdmin = await signedInAgent(server.app);
    await makeClub('Other Circle', otherAdmin.user.id, []);
    const { body: station } = await member.agent.post('/api/stations').send(validStation);
    expect((await otherAdmin.agent.get(`/api/stations/${station.id}`)).status).toBe(404);
  });
});
