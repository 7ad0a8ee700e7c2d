import { makeClub, signedInAgent, startTestServer, truncateAll, validStation, validUnit, type TestServer } from './helpers/test-app';

let server: TestServer;
beforeAll(async () => {
  server = await startTestServer();
});
afterAll(() => server.close());
beforeEach(() => truncateAll(server.sequelize));

describe('authorization slips', () => {
  it("when a club admin copies a member's unit, responds 403 and no unit is created; the owner may copy it", async () => {
    const admin = await signedInAgent(server.app, { displayName: 'Club Admin' });
    const member = await signedInAgent(server.app, { displayName: 'Club Member' });
    await makeClub('Harbour Circle', admin.user.id, [member.user.id]);
    const { body: unit } = await member.agent.post('/api/units').send(validUnit);
    expect((await admin.agent.get(`/api/units/${unit.id}`)).status).toBe(200);
    const res = await admin.agent.post(`/api/units/${unit.id}/copy`);
    expect(res.status).toBe(403);
    expect(res.body.error.code).toBe('forbidden');
    expect((await admin.agent.get('/api/units')).body).toEqual([]);
    expect((await member.agent.post(`/api/units/${unit.id}/copy`)).status).toBe(201);
  });

  it('when the owner of a suspended station leaves the club, that club’s admins can still lift it; the owner sees who suspended it and why', async () => {
    const admin = await signedInAgent(server.app, { displayName: 'Club Admin' });
    const member = await signedInAgent(server.app, { displayName: 'Club Member' });
    const otherAdmin = await signedInAgent(server.app, { displayName: 'Other Admin' });
    const clubId = await makeClub('Harbour Circle', admin.user.id, [member.user.id]);
    const otherClub = await makeClub('Other Circle', otherAdmin.user.id, [member.user.id]);
    const { body: station } = await member.agent.post('/api/stations').send(validStation);
    const reason = 'Spurious output on 40 m, fit the filter';
    expect((await admin.agent.post(`/api/clubs/${clubId}/stations/${station.id}/suspension`).send({ reason })).status).toBe(201);
    const seen = (await member.agent.get(`/api/stations/${station.id}`)).body.suspension;
    expect(seen).toMatchObject({ reason, clubId, clubName: 'Harbour Circle', byName: 'Club Admin' });

    expect((await member.agent.delete(`/api/clubs/${clubId}/members/${member.user.id}`)).status).toBe(204);
    // Another club's admin still cannot touch it, even though the owner is their member.
    expect((await otherAdmin.agent.delete(`/api/clubs/${otherClub}/stations/${station.id}/suspension`)).status).toBe(403);
    const lifted = await admin.agent.delete(`/api/clubs/${clubId}/stations/${station.id}/suspension`);
    expect(lifted.status).toBe(204);
    expect((await member.agent.get(`/api/stations/${station.id}`)).body.suspension).toBeNull();
    // Once lifted, the old club can no longer reach the station.
    expect((await admin.agent.post(`/api/clubs/${clubId}/stations/${station.id}/suspension`).send({ reason })).status).toBe(404);
  });
});
