import request from 'supertest';
import { expectedHeardHz } from '@/shared/domain/reception';
import { signedInAgent, startTestServer, truncateAll, validUnit, type TestServer } from './helpers/test-app';

let server: TestServer;
beforeAll(async () => {
  server = await startTestServer();
});
afterAll(() => server.close());
beforeEach(() => truncateAll(server.sequelize));

type Agent = Awaited<ReturnType<typeof signedInAgent>>['agent'];
const HOUR_MS = 3_600_000;

/** A 20 m beacon every fifth slot with a device token, backdated so reports of recent slots match it. */
async function beaconWithDevice(agent: Agent, audioOffsetHz: number) {
  const { body: unit } = await agent.post('/api/units').send(validUnit);
  const { body: station } = await agent
    .post('/api/stations')
    .send({ name: 'Hill beacon', callsign: 'Q9ZZT', locator: 'JO22ab', unitId: unit.id, audioOffsetHz, transmitEnabled: true });
  await agent.put(`/api/stations/${station.id}/bands/20m`).send({ enabled: true });
  await agent
    .post(`/api/stations/${station.id}/schedule`)
    .send({ steps: [{ bandId: '20m', slots: 1 }], cadence: { kind: 'every-nth', nth: 5 }, startDate: '2026-01-01' });
  await server.sequelize.query("UPDATE stations SET createdAt = '2025-12-01 00:00:00' WHERE id = ?", { replacements: [station.id] });
  await agent.post(`/api/stations/${station.id}/device-token`);
  return station as { id: number };
}

async function postToken(agent: Agent, callsign: string) {
  const post = await agent.post('/api/listening-posts').send({ name: `Receiver ${callsign}`, callsign, locator: 'IO91wm' });
  return (await agent.post(`/api/listening-posts/${post.body.id}/token`)).body.token as string;
}

const sendReports = async (token: string, reports: object[]) => {
  const res = await request(server.app).post('/api/device/v1/receptions').set('Authorization', `Bearer ${token}`).send({ reports });
  expect(res.status).toBe(202);
};

const report = (slotMs: number, txCallsign: string, frequencyHz: number) => ({
  slotUtc: new Date(slotMs).toISOString(),
  bandId: '20m',
  txCallsign,
  txLocator: 'JO22ab',
  txPowerDbm: 23,
  snrDb: -18,
  frequencyHz,
  driftHz: 0,
});

const subjects = (mails: { subject: string }[] | null) =>
  (mails ?? []).map((m) => m.subject).filter((s) => !/silent while scheduled/.test(s));

describe('alerts from reports', () => {
  it('"transmitting but unheard" opens when the device sends, nobody hears it and others are heard; mails once; resolves when heard', async () => {
    const { evaluateAlerts } = await import('@/server/features/devices/alerts.service');
    const { DeviceTransmissionModel, AlertModel } = await import('@/server/db/models/device.model');
    const { agent } = await signedInAgent(server.app);
    const station = await beaconWithDevice(agent, 1500);
    const nowMs = Date.now() + 60_000;
    // the device reports transmissions all through the last six hours
    for (const ago of [5.8, 4, 2, 0.5]) {
      const at = new Date(nowMs - ago * HOUR_MS);
      await DeviceTransmissionModel.create({
        stationId: station.id,
        startedAt: at,
        bandId: '20m',
        frequencyHz: 14_097_100,
        messageText: 'Q9ZZT JO22 23',
        receivedAt: at,
      });
    }
    // nobody hears anyone yet: no alert (the band may simply be closed)
    expect(subjects(await evaluateAlerts(server.sequelize, nowMs))).toEqual([]);

    // others on 20 m are heard
    const token = await postToken(agent, 'Q2RXA');
    await sendReports(token, [report(Math.floor((nowMs - HOUR_MS) / 120_000) * 120_000, 'Q8OTH', 14_097_050)]);
    const mails = await evaluateAlerts(server.sequelize, nowMs + 1000);
    expect(subjects(mails)).toEqual([expect.stringMatching(/Hill beacon — transmitting but unheard/)]);
    expect(mails!.find((m) => /unheard/.test(m.subject))!.text).toMatch(/antenna, the filter and any amplifier/);
    // de-duplicated and mailed once
    expect(subjects(await evaluateAlerts(server.sequelize, nowMs + 2000))).toEqual([]);
    expect(await AlertModel.count({ where: { stationId: station.id, rule: 'unheard-while-transmitting' } })).toBe(1);

    // a receiver hears the beacon in one of its planned slots: the alert resolves
    const { body: plan } = await agent.get(
      `/api/stations/${station.id}/plan?from=${new Date(nowMs - 3 * HOUR_MS).toISOString()}&to=${new Date(nowMs - HOUR_MS).toISOString()}`,
    );
    const slot = plan.transmissions[0] as { startMs: number; carrierHz: number };
    await sendReports(token, [report(Math.floor(slot.startMs / 120_000) * 120_000, 'Q9ZZT', Math.round(expectedHeardHz(slot.carrierHz)))]);
    await evaluateAlerts(server.sequelize, nowMs + 3000);
    const alert = await AlertModel.findOne({ where: { stationId: station.id, rule: 'unheard-while-transmitting' } });
    expect(alert!.resolvedAt).not.toBeNull();
  });

  it('"heard off frequency" opens when the median heard error puts a tone within 10 Hz of the window edge, and resolves after calibrating', async () => {
    const { evaluateAlerts } = await import('@/server/features/devices/alerts.service');
    const { AlertModel } = await import('@/server/db/models/device.model');
    const { agent } = await signedInAgent(server.app);
    // tones at dial + 1580 … 1584.4 Hz: 15.6 Hz below the window's upper edge (dial + 1600 Hz)
    const station = await beaconWithDevice(agent, 1580);
    const nowMs = Date.now() + 60_000;
    const { body: plan } = await agent.get(
      `/api/stations/${station.id}/plan?from=${new Date(nowMs - 20 * HOUR_MS).toISOString()}&to=${new Date(nowMs - HOUR_MS).toISOString()}`,
    );
    const slots = (plan.transmissions as { startMs: number; carrierHz: number }[]).slice(0, 4);
    expect(slots).toHaveLength(4);
    // four receivers each hear four slots 8 Hz high, rounded to whole hertz as decoders report: the centre (tone 0 + 2.197 Hz)
    // is heard 7.80 Hz high, and the highest tone (tone 0 + 4.39 Hz) lands 1600 − 1580 − 4.39 − 7.80 = 7.8 Hz from the edge
    for (const rx of ['Q2RXA', 'Q3RXB', 'Q4RXC', 'Q5RXD']) {
      const token = await postToken(agent, rx);
      await sendReports(
        token,
        slots.map((s) => report(Math.floor(s.startMs / 120_000) * 120_000, 'Q9ZZT', Math.round(expectedHeardHz(s.carrierHz) + 8))),
      );
    }
    const mails = await evaluateAlerts(server.sequelize, nowMs);
    expect(subjects(mails)).toEqual([expect.stringMatching(/heard off frequency/)]);
    const open = await AlertModel.findOne({ where: { stationId: station.id, rule: 'heard-off-frequency' } });
    expect(open!.message).toMatch(/20 m 7\.8 Hz high \(median of 16 reports\): a tone is only 7\.8 Hz from the window edge/);

    // applying the proposal from reports: the older reports measured the old correction, so the alert resolves
    const proposal = (await agent.get(`/api/stations/${station.id}/calibration/from-reports`)).body.bands[0];
    expect(proposal.proposedOffsetHz).toBeCloseTo(7.8, 1);
    await agent
      .post(`/api/stations/${station.id}/calibration`)
      .send({ source: 'reports', offsets: [{ bandId: '20m', calibrationOffsetHz: proposal.proposedOffsetHz }] });
    expect(subjects(await evaluateAlerts(server.sequelize, nowMs + 1000))).toEqual([]);
    const resolved = await AlertModel.findOne({ where: { stationId: station.id, rule: 'heard-off-frequency' } });
    expect(resolved!.resolvedAt).not.toBeNull();
  });
});
