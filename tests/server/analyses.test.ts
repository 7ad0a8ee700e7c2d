import request from 'supertest';
import { makeClub, signedInAgent, startTestServer, truncateAll, validUnit, type TestServer } from './helpers/test-app';

let server: TestServer;
beforeAll(async () => {
  server = await startTestServer();
});
afterAll(() => server.close());
beforeEach(() => truncateAll(server.sequelize));

type Agent = Awaited<ReturnType<typeof signedInAgent>>['agent'];
const app = () => server.app;

/** A 20 m station backdated so reports of any 2026 slot match it (as in receptions.test.ts). */
async function beacon(agent: Agent, fields: { name: string; callsign: string; locator: string }) {
  const { body: unit } = await agent.post('/api/units').send(validUnit);
  const { body: station } = await agent
    .post('/api/stations')
    .send({ ...fields, unitId: unit.id, audioOffsetHz: 1500, transmitEnabled: true });
  expect(station.id).toEqual(expect.any(Number));
  await agent.put(`/api/stations/${station.id}/bands/20m`).send({ enabled: true, calibrationOffsetHz: 0 });
  await server.sequelize.query("UPDATE stations SET createdAt = '2025-12-01 00:00:00' WHERE id = ?", { replacements: [station.id] });
  return station as { id: number };
}

/** A listening post of `agent` with a device token: it plays one receiver. */
async function receiver(agent: Agent, callsign: string, locator: string) {
  const created = await agent.post('/api/listening-posts').send({ name: `Receiver ${callsign}`, callsign, locator });
  expect(created.status).toBe(201);
  const issued = await agent.post(`/api/listening-posts/${created.body.id}/token`);
  return { id: created.body.id as number, token: issued.body.token as string };
}

const report = (txCallsign: string, slotUtc: string, snrDb: number, txPowerDbm = 23) => ({
  slotUtc,
  bandId: '20m',
  txCallsign,
  txLocator: 'JO22',
  txPowerDbm,
  snrDb,
  frequencyHz: 14_097_100,
  driftHz: 0,
});

/**
 * An owner with two stations (A: Q1CMA, B: Q1CMB) heard by two receivers in six hours of 2026-11-30: in each hour B is
 * heard 3 dB stronger per watt, ±1 dB (B at 20 dBm, so its SNR is 3 dB lower than the per-watt figure).
 */
async function scenario() {
  const owner = await signedInAgent(app(), { displayName: 'Compare Owner' });
  const a = await beacon(owner.agent, { name: 'Roof vertical', callsign: 'Q1CMA', locator: 'JO22ab' });
  const b = await beacon(owner.agent, { name: 'Garden loop', callsign: 'Q1CMB', locator: 'JO22ab' });
  const wobble = [-1, -0.5, 0, 0.5, 1, 0];
  for (const [callsign, locator] of [
    ['Q7RXW', 'IO91wm'],
    ['Q7RXE', 'KO85ts'],
  ]) {
    const post = await receiver(owner.agent, callsign, locator);
    const reports = wobble.flatMap((w, hour) => {
      const slot = (minute: number) => `2026-11-30T${String(hour + 8).padStart(2, '0')}:${minute}:00Z`;
      return [report('Q1CMA', slot(10), -15), report('Q1CMB', slot(12), -15 + 3 + w - 3, 20)];
    });
    const sent = await request(app()).post('/api/device/v1/receptions').set('Authorization', `Bearer ${post.token}`).send({ reports });
    expect([sent.status, sent.body.accepted]).toEqual([202, 12]);
  }
  return { owner, a, b };
}

const SAME_DAY = 'band=20m&from=2026-11-30T00:00:00Z&to=2026-12-01T00:00:00Z';

describe('GET /api/comparisons', () => {
  it('when the owner compares two stations, pairs each receiver-hour and finds B about 3 dB stronger per watt', async () => {
    const { owner, a, b } = await scenario();
    const res = await owner.agent.get(`/api/comparisons?a=${a.id}&b=${b.id}&${SAME_DAY}`);
    expect(res.status).toBe(200);
    expect(res.body).toMatchObject({ mode: 'same-time', bandId: '20m', commonReceivers: 2, pairs: 12, commonReports: 24, enough: true });
    expect(res.body.medianDeltaDb).toBeCloseTo(3, 5);
    expect(res.body.ci95[0]).toBeLessThan(3);
    expect(res.body.ci95[1]).toBeGreaterThan(3);
    expect(res.body.ci95[0]).toBeGreaterThan(0);
    expect(res.body.verdict).toMatch(/^B is 3\.0 dB stronger \(\d\.\d to \d\.\d dB\), from 24 common reports\./);
    expect(res.body.a).toMatchObject({ stationId: a.id, callsign: 'Q1CMA', name: 'Roof vertical' });
    expect(res.body.bySector).toHaveLength(8);
    expect(res.body.onlyA).toEqual([]);
  });

  it('when one station is compared in two periods, pairs by UTC hour of day', async () => {
    const { owner, a } = await scenario();
    const periods = 'aFrom=2026-11-30T08:00:00Z&aTo=2026-11-30T11:00:00Z&bFrom=2026-11-30T11:00:00Z&bTo=2026-11-30T14:00:00Z';
    const res = await owner.agent.get(`/api/comparisons?a=${a.id}&b=${a.id}&band=20m&${periods}`);
    expect(res.status).toBe(200);
    // 08–10 UTC against 11–13 UTC: no hour of day in common, so nothing is paired and nothing is claimed
    expect(res.body).toMatchObject({ mode: 'two-periods', pairs: 0, medianDeltaDb: null, ci95: null });
    expect(res.body.verdict).toMatch(/^Too few to say/);
  });

  it('when a club admin of the owner compares, responds 200; a stranger or a station of someone else gets 404', async () => {
    const { owner, a, b } = await scenario();
    const admin = await signedInAgent(app(), { displayName: 'Club Admin' });
    await makeClub('Comparing Circle', admin.user.id, [owner.user.id]);
    expect((await admin.agent.get(`/api/comparisons?a=${a.id}&b=${b.id}&${SAME_DAY}`)).status).toBe(200);

    const stranger = await signedInAgent(app(), { displayName: 'Stranger' });
    const refused = await stranger.agent.get(`/api/comparisons?a=${a.id}&b=${b.id}&${SAME_DAY}`);
    expect([refused.status, refused.body.error.code]).toEqual([404, 'not-found']);
    const own = await beacon(stranger.agent, { name: 'Stranger beacon', callsign: 'Q1STR', locator: 'JO22ab' });
    expect((await stranger.agent.get(`/api/comparisons?a=${own.id}&b=${b.id}&${SAME_DAY}`)).status).toBe(404);
    expect((await owner.agent.get(`/api/comparisons?a=${a.id}&b=${own.id}&${SAME_DAY}`)).status).toBe(404);
    expect((await owner.agent.get(`/api/comparisons?a=${a.id}&b=999999&${SAME_DAY}`)).status).toBe(404);
    expect((await request(app()).get(`/api/comparisons?a=${a.id}&b=${b.id}&${SAME_DAY}`)).status).toBe(401);
  });

  it('when the input is wrong, responds 400 naming each field to fix', async () => {
    const { owner, a, b } = await scenario();
    const fieldsOf = async (query: string) => {
      const res = await owner.agent.get(`/api/comparisons?${query}`);
      expect(res.status).toBe(400);
      return res.body.error.fields as Record<string, string>;
    };
    expect(Object.keys(await fieldsOf(`a=${a.id}&b=${b.id}`))).toEqual(['band']);
    expect(await fieldsOf(`a=x&b=${b.id}&band=20m`)).toHaveProperty('a');
    expect(await fieldsOf(`a=${a.id}&b=${a.id}&band=20m`)).toHaveProperty('b', expect.stringMatching(/two different stations/));
    expect(await fieldsOf(`a=${a.id}&b=${b.id}&band=21m`)).toHaveProperty('band');
    expect(await fieldsOf(`a=${a.id}&b=${b.id}&band=20m&from=2026-12-01T00:00:00Z&to=2026-11-30T00:00:00Z`)).toHaveProperty('from');
    expect(await fieldsOf(`a=${a.id}&b=${b.id}&band=20m&from=2026-01-01T00:00:00Z&to=2026-11-30T00:00:00Z`)).toHaveProperty(
      'from',
      expect.stringMatching(/at most 92 days/),
    );
    expect(Object.keys(await fieldsOf(`a=${a.id}&b=${a.id}&band=20m&aFrom=2026-11-30T08:00:00Z`)).sort()).toEqual(['aTo', 'bFrom', 'bTo']);
    expect(await fieldsOf(`a=${a.id}&b=${b.id}&band=20m&from=yesterday`)).toHaveProperty('from');
  });
});

describe('GET /api/clubs/:clubId/reach', () => {
  it('when a club admin asks, answers the members’ stations, the posts and what they heard, the map and the open bands by UTC hour', async () => {
    const { owner, a, b } = await scenario();
    const admin = await signedInAgent(app(), { displayName: 'Reach Admin' });
    const clubId = await makeClub('Reaching Circle', admin.user.id, [owner.user.id]);
    const res = await admin.agent.get(`/api/clubs/${clubId}/reach?from=2026-11-30T00:00:00Z&to=2026-12-01T00:00:00Z`);
    expect(res.status).toBe(200);
    expect(res.body).toMatchObject({ clubId, clubName: 'Reaching Circle', reports: 24, receivers: 2 });
    expect(res.body.stations).toEqual(
      expect.arrayContaining([
        expect.objectContaining({ stationId: a.id, callsign: 'Q1CMA', ownerName: 'Compare Owner', reports: 12, receivers: 2 }),
        expect.objectContaining({ stationId: b.id, callsign: 'Q1CMB', reports: 12, receivers: 2 }),
      ]),
    );
    expect(res.body.posts).toHaveLength(2);
    expect(res.body.posts[0]).toMatchObject({ reports: 12, transmitters: 2, bands: ['20m'] });
    expect(res.body.mapReceivers.map((r: { callsign: string }) => r.callsign).sort()).toEqual(['Q7RXE', 'Q7RXW']);
    // 24 reports in hours 08–13 UTC, 4 an hour (two stations × two receivers), all on 20 m
    expect(res.body.hourBand).toEqual([8, 9, 10, 11, 12, 13].map((hour) => ({ hour, bandId: '20m', reports: 4 })));
    expect(res.body.furthestKm).toBeGreaterThan(0);
  });

  it('when a plain member asks, responds 403; an outsider gets 404; a period outside the rules gets 400', async () => {
    const { owner } = await scenario();
    const admin = await signedInAgent(app(), { displayName: 'Reach Admin' });
    const clubId = await makeClub('Reaching Circle', admin.user.id, [owner.user.id]);
    expect((await owner.agent.get(`/api/clubs/${clubId}/reach`)).status).toBe(403);
    const outsider = await signedInAgent(app(), { displayName: 'Outsider' });
    expect((await outsider.agent.get(`/api/clubs/${clubId}/reach`)).status).toBe(404);
    const bad = await admin.agent.get(`/api/clubs/${clubId}/reach?from=2026-12-01T00:00:00Z&to=2026-11-01T00:00:00Z`);
    expect([bad.status, Object.keys(bad.body.error.fields)]).toEqual([400, ['from']]);
    expect((await admin.agent.get(`/api/clubs/${clubId}/reach?from=soon`)).status).toBe(400);
  });
});
