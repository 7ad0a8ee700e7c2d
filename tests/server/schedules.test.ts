import { makeClub, signedInAgent, startTestServer, truncateAll, validUnit, type TestServer } from './helpers/test-app';

let server: TestServer;
beforeAll(async () => {
  server = await startTestServer();
});
afterAll(() => server.close());
beforeEach(() => truncateAll(server.sequelize));

const threeBandUnit = {
  ...validUnit,
  filters: [...validUnit.filters, { bands: ['80m'], type: 'chebyshev-0.5', order: 5, cutoffHz: 4.2e6 }],
};

async function stationReady() {
  const owner = await signedInAgent(server.app);
  const { body: unit } = await owner.agent.post('/api/units').send(threeBandUnit);
  const { body: station } = await owner.agent
    .post('/api/stations')
    .send({ name: 'Rotator', callsign: 'Q9ZZT', locator: 'JO22', unitId: unit.id });
  for (const band of ['80m', '40m', '20m']) {
    await owner.agent.put(`/api/stations/${station.id}/bands/${band}`).send({ enabled: true, calibrationOffsetHz: 0 });
  }
  return { ...owner, station };
}

const rotation = {
  name: 'Three-band tour',
  steps: [
    { bandId: '20m', slots: 1 },
    { bandId: '40m', slots: 1 },
    { bandId: '80m', slots: 1, activeHoursUtc: { fromHour: 20, toHour: 6 } },
  ],
  cadence: { kind: 'every-nth', nth: 5 },
  stagger: { stepHz: 2, spanHz: 10 },
  startDate: '2026-12-01',
};

describe('schedules API', () => {
  it('when the owner creates a rotation, responds 201 and the plan has only even-minute starts on its bands', async () => {
    const { agent, station } = await stationReady();
    const created = await agent.post(`/api/stations/${station.id}/schedule`).send(rotation);
    expect(created.status).toBe(201);
    const plan = await agent.get(`/api/stations/${station.id}/plan?from=2026-12-02T00:00:00Z&to=2026-12-03T00:00:00Z`);
    expect(plan.status).toBe(200);
    expect(plan.body.transmissions.length).toBeGreaterThan(0);
    for (const tx of plan.body.transmissions) {
      // WSPR protocol description: transmissions begin one second into an even UTC minute.
      expect(new Date(tx.startMs).getUTCSeconds()).toBe(1);
      expect(new Date(tx.startMs).getUTCMinutes() % 2).toBe(0);
      expect(['20m', '40m', '80m']).toContain(tx.bandId);
      if (tx.bandId === '80m') {
        const hour = new Date(tx.startMs).getUTCHours();
        expect(hour >= 20 || hour < 6).toBe(true);
      }
    }
  });

  it('when a step uses a band no filter covers, responds 400 saying why and saves nothing', async () => {
    const { agent, station } = await stationReady();
    const res = await agent
      .post(`/api/stations/${station.id}/schedule`)
      .send({ ...rotation, steps: [...rotation.steps, { bandId: '10m', slots: 1 }] });
    expect(res.status).toBe(400);
    expect(res.body.error.fields['steps.3']).toMatch(/10 m/);
    expect((await agent.get(`/api/stations/${station.id}/schedule`)).status).toBe(404);
  });

  it('when the duty cycle is above 50 %, responds 400', async () => {
    const { agent, station } = await stationReady();
    const res = await agent.post(`/api/stations/${station.id}/schedule`).send({ ...rotation, cadence: { kind: 'duty', dutyPercent: 60 } });
    expect(res.status).toBe(400);
    expect(res.body.error.message).toMatch(/50 %/);
  });

  it('when paused, the plan is empty with the reason; when resumed, it transmits again', async () => {
    const { agent, station } = await stationReady();
    await agent.post(`/api/stations/${station.id}/schedule`).send(rotation);
    const paused = await agent.patch(`/api/stations/${station.id}/schedule`).send({ paused: true });
    expect(paused.status).toBe(200);
    expect(paused.body.paused).toBe(true);
    expect(paused.body.steps).toHaveLength(3);
    const quiet = await agent.get(`/api/stations/${station.id}/plan?from=2026-12-02T00:00:00Z&to=2026-12-02T06:00:00Z`);
    expect(quiet.body.transmissions).toEqual([]);
    expect(quiet.body.quiet.map((q: { code: string }) => q.code)).toContain('paused');
    await agent.patch(`/api/stations/${station.id}/schedule`).send({ paused: false });
    const live = await agent.get(`/api/stations/${station.id}/plan?from=2026-12-02T00:00:00Z&to=2026-12-02T06:00:00Z`);
    expect(live.body.transmissions.length).toBeGreaterThan(0);
  });

  it('when a second schedule is created, responds 409', async () => {
    const { agent, station } = await stationReady();
    await agent.post(`/api/stations/${station.id}/schedule`).send(rotation);
    expect((await agent.post(`/api/stations/${station.id}/schedule`).send(rotation)).status).toBe(409);
  });

  it('when the plan range is malformed or too long, responds 400 naming from or to', async () => {
    const { agent, station } = await stationReady();
    await agent.post(`/api/stations/${station.id}/schedule`).send(rotation);
    const bad = await agent.get(`/api/stations/${station.id}/plan?from=yesterday`);
    expect(bad.status).toBe(400);
    expect(bad.body.error.fields.from).toMatch(/ISO 8601/);
    const long = await agent.get(`/api/stations/${station.id}/plan?from=2026-12-01T00:00:00Z&to=2026-12-20T00:00:00Z`);
    expect(long.status).toBe(400);
    expect(long.body.error.fields.to).toMatch(/8 days/);
  });

  it('when a stranger asks, 404; the club admin reads the schedule and plan but cannot change them', async () => {
    const { agent, station, user } = await stationReady();
    await agent.post(`/api/stations/${station.id}/schedule`).send(rotation);
    const stranger = await signedInAgent(server.app);
    expect((await stranger.agent.get(`/api/stations/${station.id}/schedule`)).status).toBe(404);
    expect((await stranger.agent.get(`/api/stations/${station.id}/plan`)).status).toBe(404);
    const admin = await signedInAgent(server.app);
    await makeClub('Plan Circle', admin.user.id, [user.id]);
    expect((await admin.agent.get(`/api/stations/${station.id}/schedule`)).status).toBe(200);
    expect((await admin.agent.get(`/api/stations/${station.id}/plan`)).status).toBe(200);
    expect((await admin.agent.patch(`/api/stations/${station.id}/schedule`).send({ paused: true })).status).toBe(403);
    expect((await admin.agent.delete(`/api/stations/${station.id}/schedule`)).status).toBe(403);
  });
});
