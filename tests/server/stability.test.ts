import request from 'supertest';
import { expectedHeardHz } from '@/shared/domain/reception';
import { makeClub, signedInAgent, startTestServer, truncateAll, validUnit, type TestServer } from './helpers/test-app';

let server: TestServer;
beforeAll(async () => {
  server = await startTestServer();
});
afterAll(() => server.close());
beforeEach(() => truncateAll(server.sequelize));

const FROM = '2026-11-01T00:00:00Z';
const TO = '2026-11-03T00:00:00Z';

describe('stability from reports', () => {
  it('estimates the warm-up drift beside heartbeat temperatures for the owner and club admin (others 404); the coefficient saves to the unit, audited', async () => {
    const { HeartbeatModel } = await import('@/server/db/models/device.model');
    const owner = await signedInAgent(server.app);
    const { body: unit } = await owner.agent.post('/api/units').send(validUnit);
    const { body: station } = await owner.agent
      .post('/api/stations')
      .send({ name: 'Porch beacon', callsign: 'Q9ZZT', locator: 'JO22ab', unitId: unit.id, audioOffsetHz: 1500, transmitEnabled: true });
    await owner.agent.put(`/api/stations/${station.id}/bands/20m`).send({ enabled: true });
    await owner.agent
      .post(`/api/stations/${station.id}/schedule`)
      .send({ steps: [{ bandId: '20m', slots: 1 }], cadence: { kind: 'every-nth', nth: 2 }, startDate: '2026-01-01' });
    await server.sequelize.query("UPDATE stations SET createdAt = '2025-12-01 00:00:00' WHERE id = ?", { replacements: [station.id] });
    const { body: plan } = await owner.agent.get(`/api/stations/${station.id}/plan?from=${FROM}&to=${TO}`);
    const slots = (plan.transmissions as { startMs: number; carrierHz: number }[]).slice(0, 12);

    // the unit warms by 1 °C per transmission, 15 → 26 °C, and its signal rises 0.5 Hz per °C (5 Hz per 10 °C)
    for (const [i, s] of slots.entries()) {
      await HeartbeatModel.create({
        stationId: station.id,
        receivedAt: new Date(s.startMs + 30_000),
        report: '{}',
        clockOffsetMs: 3,
        temperatureC: 15 + i,
      });
    }
    for (const rx of ['Q2RXA', 'Q3RXB', 'Q4RXC']) {
      const post = await owner.agent.post('/api/listening-posts').send({ name: `Receiver ${rx}`, callsign: rx, locator: 'IO91wm' });
      const { body } = await owner.agent.post(`/api/listening-posts/${post.body.id}/token`);
      const reports = slots.map((s, i) => ({
        slotUtc: new Date(Math.floor(s.startMs / 120_000) * 120_000).toISOString(),
        bandId: '20m',
        txCallsign: 'Q9ZZT',
        snrDb: -14,
        frequencyHz: Math.round(expectedHeardHz(s.carrierHz) + 0.5 * (15 + i - 20)),
        driftHz: i % 4 === 0 ? 1 : 0,
      }));
      const sent = await request(server.app)
        .post('/api/device/v1/receptions')
        .set('Authorization', `Bearer ${body.token}`)
        .send({ reports });
      expect(sent.status).toBe(202);
    }

    const url = `/api/stations/${station.id}/stability?band=20m&from=${FROM}&to=${TO}`;
    const res = await owner.agent.get(url);
    expect(res.status).toBe(200);
    expect(res.body.points).toHaveLength(12);
    expect(res.body.points[0]).toMatchObject({ reports: 3, temperatureC: 15, medianDriftHz: 1 });
    expect(res.body.verdict.kind).toBe('drifts');
    // whole-hertz rounding of the heard frequency moves the slope a little; truth is 5 Hz per 10 °C
    expect(Math.abs(res.body.verdict.hzPer10C - 5)).toBeLessThan(0.8);
    expect(res.body.verdict.words).toMatch(/^drifts as it warms: about \d\.\d Hz higher per 10 °C$/);
    expect(res.body.unitId).toBe(unit.id);

    const admin = await signedInAgent(server.app);
    const member = await signedInAgent(server.app);
    const stranger = await signedInAgent(server.app);
    await makeClub('Stability Circle', admin.user.id, [owner.user.id, member.user.id]);
    expect((await admin.agent.get(url)).status).toBe(200);
    expect((await member.agent.get(url)).status).toBe(404);
    expect((await stranger.agent.get(url)).status).toBe(404);

    // saving the estimate to the unit goes through the audited unit change
    const saved = await owner.agent.patch(`/api/units/${unit.id}`).send({ tempCoPpmPerC: res.body.verdict.tempCoPpmPerC });
    expect(saved.status).toBe(200);
    expect(saved.body.tempCoPpmPerC).toBe(res.body.verdict.tempCoPpmPerC);
    const log = (await owner.agent.get('/api/audit')).body as { action: string }[];
    expect(log.some((e) => e.action === 'unit.update')).toBe(true);
  });
});
