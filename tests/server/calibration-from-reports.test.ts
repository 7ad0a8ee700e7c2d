import request from 'supertest';
import { expectedHeardHz } from '@/shared/domain/reception';
import { seededRandom } from '@/shared/domain/schedule/prng';
import { makeClub, signedInAgent, startTestServer, truncateAll, validUnit, type TestServer } from './helpers/test-app';

let server: TestServer;
beforeAll(async () => {
  server = await startTestServer();
});
afterAll(() => server.close());
beforeEach(() => truncateAll(server.sequelize));

type Agent = Awaited<ReturnType<typeof signedInAgent>>['agent'];
const FROM = '2026-11-01T00:00:00Z';
const TO = '2026-11-03T00:00:00Z';
const TRUE_ERROR_HZ = 21;

/** A 20 m beacon every other slot since 2026-01-01 (band enabled, not calibrated), backdated so November reports match it. */
async function beacon(agent: Agent) {
  const { body: unit } = await agent.post('/api/units').send(validUnit);
  const { body: station } = await agent
    .post('/api/stations')
    .send({ name: 'Shed beacon', callsign: 'Q9ZZT', locator: 'JO22ab', unitId: unit.id, audioOffsetHz: 1500, transmitEnabled: true });
  await agent.put(`/api/stations/${station.id}/bands/20m`).send({ enabled: true });
  const schedule = await agent
    .post(`/api/stations/${station.id}/schedule`)
    .send({ steps: [{ bandId: '20m', slots: 1 }], cadence: { kind: 'every-nth', nth: 2 }, startDate: '2026-01-01' });
  expect(schedule.status).toBe(201);
  await server.sequelize.query("UPDATE stations SET createdAt = '2025-12-01 00:00:00' WHERE id = ?", { replacements: [station.id] });
  return station as { id: number };
}

/** Reports through the listening-post API: `receivers` posts each hear `perReceiver` planned slots, TRUE_ERROR_HZ high with ±2 Hz noise. */
async function hear(agent: Agent, stationId: number, receivers: number, perReceiver: number) {
  const { body: plan } = await agent.get(`/api/stations/${stationId}/plan?from=${FROM}&to=${TO}`);
  const slots = (plan.transmissions as { startMs: number; carrierHz: number }[]).slice(0, perReceiver);
  expect(slots).toHaveLength(perReceiver);
  const random = seededRandom(14);
  for (let i = 0; i < receivers; i++) {
    const post = await agent.post('/api/listening-posts').send({ name: `Receiver ${i}`, callsign: `Q${i + 1}RXC`, locator: 'IO91wm' });
    const { body } = await agent.post(`/api/listening-posts/${post.body.id}/token`);
    const reports = slots.map((s) => ({
      slotUtc: new Date(Math.floor(s.startMs / 120_000) * 120_000).toISOString(),
      bandId: '20m',
      txCallsign: 'Q9ZZT',
      txLocator: 'JO22ab',
      txPowerDbm: 23,
      snrDb: -15,
      frequencyHz: Math.round(expectedHeardHz(s.carrierHz) + TRUE_ERROR_HZ + (random() * 4 - 2)),
      driftHz: 0,
    }));
    const sent = await request(server.app).post('/api/device/v1/receptions').set('Authorization', `Bearer ${body.token}`).send({ reports });
    expect([sent.status, sent.body.accepted]).toEqual([202, perReceiver]);
  }
}

const fromReports = (agent: Agent, stationId: number) =>
  agent.get(`/api/stations/${stationId}/calibration/from-reports?from=${FROM}&to=${TO}`);

describe('calibration from reports', () => {
  it('shows the owner and the owner’s club admin a proposal; another user and a plain club member get 404', async () => {
    const owner = await signedInAgent(server.app, { displayName: 'Beacon Owner' });
    const station = await beacon(owner.agent);
    await hear(owner.agent, station.id, 4, 4);
    const mine = await fromReports(owner.agent, station.id);
    expect(mine.status).toBe(200);
    const band = mine.body.bands.find((b: { bandId: string }) => b.bandId === '20m');
    expect(band).toMatchObject({ reports: 16, receivers: 4, currentOffsetHz: null, enough: true });
    // rounding the heard frequency to whole hertz moves each report by at most 0.5 Hz
    expect(Math.abs(band.medianErrorHz - TRUE_ERROR_HZ)).toBeLessThan(2.5);
    expect(band.proposedOffsetHz).toBe(band.medianErrorHz);
    expect(band.spreadHz).toBeGreaterThanOrEqual(0);

    const admin = await signedInAgent(server.app, { displayName: 'Circle Admin' });
    const member = await signedInAgent(server.app, { displayName: 'Plain Member' });
    const stranger = await signedInAgent(server.app, { displayName: 'Someone Else' });
    await makeClub('Calibration Circle', admin.user.id, [owner.user.id, member.user.id]);
    expect((await fromReports(admin.agent, station.id)).body).toEqual(mine.body);
    expect((await fromReports(member.agent, station.id)).status).toBe(404);
    expect((await fromReports(stranger.agent, station.id)).status).toBe(404);
    // a bad period is the client's mistake, with the field named
    const bad = await owner.agent.get(`/api/stations/${station.id}/calibration/from-reports?from=${TO}&to=${FROM}`);
    expect(bad.status).toBe(400);
    expect(bad.body.error.fields.from).toBeDefined();
  });

  it('says "too few" without a number below 10 reports from 3 receivers', async () => {
    const owner = await signedInAgent(server.app);
    const station = await beacon(owner.agent);
    await hear(owner.agent, station.id, 2, 3);
    const band = (await fromReports(owner.agent, station.id)).body.bands[0];
    expect(band).toMatchObject({ bandId: '20m', reports: 6, receivers: 2, medianErrorHz: null, proposedOffsetHz: null, enough: false });
    expect(band.reason).toMatch(/^too few reports: 6 of 10 from 2 of 3 receivers/);
  });

  it('applies in one audited transaction: the device configuration and its ETag change, and older reports stop counting', async () => {
    const owner = await signedInAgent(server.app);
    const station = await beacon(owner.agent);
    await hear(owner.agent, station.id, 4, 3);
    const { body: token } = await owner.agent.post(`/api/stations/${station.id}/device-token`);
    const config = (etag?: string) => {
      const req = request(server.app).get('/api/device/v1/config').set('Authorization', `Bearer ${token.token}`);
      return etag ? req.set('If-None-Match', etag) : req;
    };
    const before = await config();
    expect(before.status).toBe(200);
    const proposal = (await fromReports(owner.agent, station.id)).body.bands[0];

    // refused as a whole: one good band and one impossible offset change nothing
    const refused = await owner.agent.post(`/api/stations/${station.id}/calibration`).send({
      source: 'reports',
      offsets: [
        { bandId: '20m', calibrationOffsetHz: proposal.proposedOffsetHz },
        { bandId: '40m', calibrationOffsetHz: 9000 },
      ],
    });
    expect(refused.status).toBe(400);
    expect((await owner.agent.get(`/api/stations/${station.id}`)).body.bands[0].calibrationOffsetHz).toBeNull();

    await new Promise((r) => setTimeout(r, 5)); // change stamps are kept to the millisecond
    const applied = await owner.agent
      .post(`/api/stations/${station.id}/calibration`)
      .send({ source: 'reports', offsets: [{ bandId: '20m', calibrationOffsetHz: proposal.proposedOffsetHz }] });
    expect(applied.status).toBe(200);
    expect(applied.body.bands[0]).toMatchObject({ calibrationOffsetHz: proposal.proposedOffsetHz, calibrationSource: 'reports' });

    const log = (await owner.agent.get('/api/audit')).body as { action: string; summary: string }[];
    expect(log.filter((e) => e.action === 'calibration.save')).toHaveLength(1);
    expect(log.find((e) => e.action === 'calibration.save')!.summary).toMatch(/from-reports calibration for 20m/);

    const after = await config(before.headers.etag);
    expect(after.status).toBe(200);
    expect(after.headers.etag).not.toBe(before.headers.etag);
    const tx = after.body.plan.transmissions[0];
    // the device is now told to send the proposal lower than the carrier it means
    expect(tx.commandTonesHz[0]).toBeCloseTo(tx.carrierHz - proposal.proposedOffsetHz, 3);

    // the reports measured the old correction, so they no longer propose anything
    const next = (await fromReports(owner.agent, station.id)).body.bands[0];
    expect(next).toMatchObject({ reports: 0, currentOffsetHz: proposal.proposedOffsetHz, proposedOffsetHz: null });
  });
});
