import request from 'supertest';
import { createHttpHandler } from '@/server/app';
import { createLogger } from '@/server/lib/logger';
import { makeClub, signedInAgent, startTestServer, truncateAll, validUnit, type TestServer } from './helpers/test-app';

let server: TestServer;
let handler: ReturnType<typeof createHttpHandler>;
beforeAll(async () => {
  server = await startTestServer({ DEVICE_RATE_LIMIT: '60' });
  handler = createHttpHandler(server.app, createLogger('silent'));
});
afterAll(() => server.close());
beforeEach(() => truncateAll(server.sequelize));

// validUnit's filters: index 0 serves 20 m, index 1 serves 40 m
const handSwapped = { ...validUnit, filterSelection: 'hand' };

const twoBands = {
  name: 'Two-band tour',
  steps: [
    { bandId: '20m', slots: 1 },
    { bandId: '40m', slots: 1 },
  ],
  cadence: { kind: 'every-nth', nth: 5 },
  startDate: '2026-01-01',
};
const only = (bandId: string) => ({ ...twoBands, name: `${bandId} only`, steps: [{ bandId, slots: 1 }] });

async function bench(unitValues: object) {
  const owner = await signedInAgent(server.app);
  const { body: unit } = await owner.agent.post('/api/units').send(unitValues);
  const { body: station } = await owner.agent
    .post('/api/stations')
    .send({ name: 'Bench station', callsign: 'Q9ZZT', locator: 'JO22', unitId: unit.id, transmitEnabled: true });
  for (const band of ['20m', '40m'])
    await owner.agent.put(`/api/stations/${station.id}/bands/${band}`).send({ enabled: true, calibrationOffsetHz: 0 });
  return { ...owner, unit, station };
}

const deviceConfig = (token: string, etag?: string) => {
  const req = request(handler).get('/api/device/v1/config').set('Authorization', `Bearer ${token}`);
  return etag ? req.set('If-None-Match', etag) : req;
};

const bandsOf = (txs: { bandId: string }[]) => [...new Set(txs.map((t) => t.bandId))].sort();

describe('filter selection', () => {
  it('when a unit swaps filters by hand, a two-band rotation is refused; once it says the controller switches them, it is accepted', async () => {
    const { agent, unit, station } = await bench(handSwapped);
    expect(unit.filterSelection).toBe('hand');
    expect(unit.fittedFilter).toBeNull();
    await agent.post(`/api/units/${unit.id}/fitted-filter`).send({ filterIndex: 1 }).expect(200);

    const refused = await agent.post(`/api/stations/${station.id}/schedule`).send(twoBands);
    expect(refused.status).toBe(400);
    expect(refused.body.error.message).toMatch(/needs filters the controller switches/);
    expect(refused.body.error.fields['steps.0']).toMatch(/40 m filter is fitted .* fit the 20 m filter and record it/);

    const switched = await agent
      .patch(`/api/units/${unit.id}`)
      .send({ filterSelection: 'switched', filters: validUnit.filters.map((f, i) => ({ ...f, controlCode: `relay-${i + 1}` })) });
    expect(switched.status).toBe(200);
    expect(switched.body.filterSelection).toBe('switched');

    const accepted = await agent.post(`/api/stations/${station.id}/schedule`).send(twoBands);
    expect(accepted.status).toBe(201);
    const plan = await agent.get(`/api/stations/${station.id}/plan?from=2026-12-02T00:00:00Z&to=2026-12-02T06:00:00Z`);
    expect(bandsOf(plan.body.transmissions)).toEqual(['20m', '40m']);

    // each planned transmission names the relay to close
    const { body: token } = await agent.post(`/api/stations/${station.id}/device-token`);
    const config = await deviceConfig(token.token);
    const txs = config.body.plan.transmissions as { bandId: string; filter: { index: number; controlCode: string; mode: string } }[];
    expect(txs.length).toBeGreaterThan(0);
    for (const tx of txs)
      expect(tx.filter).toEqual(
        tx.bandId === '20m'
          ? { mode: 'switched', index: 0, bands: ['20m'], controlCode: 'relay-1' }
          : { mode: 'switched', index: 1, bands: ['40m'], controlCode: 'relay-2' },
      );
  });

  it('when the owner records "I fitted the 40 m filter", it is audited with its UTC time and changes the plan, the review and the device configuration', async () => {
    const { agent, unit, station, user } = await bench(handSwapped);
    const admin = await signedInAgent(server.app);
    const clubId = await makeClub('Filter Circle', admin.user.id, [user.id]);
    await agent.post(`/api/units/${unit.id}/fitted-filter`).send({ filterIndex: 0 }).expect(200);
    await agent.post(`/api/stations/${station.id}/schedule`).send(only('20m')).expect(201);
    const { body: token } = await agent.post(`/api/stations/${station.id}/device-token`);

    const before = await deviceConfig(token.token);
    expect(before.status).toBe(200);
    expect(bandsOf(before.body.plan.transmissions)).toEqual(['20m']);
    expect(before.body.plan.transmissions[0].filter).toMatchObject({ mode: 'hand', index: 0, bands: ['20m'] });
    expect(before.body.filters).toMatchObject({ selection: 'hand', fitted: { index: 0 } });
    const etag = before.headers.etag;

    await new Promise((r) => setTimeout(r, 5)); // change stamps are kept to the millisecond
    const t0 = Date.now();
    const fitted = await agent.post(`/api/units/${unit.id}/fitted-filter`).send({ filterIndex: 1 });
    expect(fitted.status).toBe(200);
    expect(fitted.body.fittedFilter.index).toBe(1);
    const at = Date.parse(fitted.body.fittedFilter.atUtc);
    expect(fitted.body.fittedFilter.atUtc).toMatch(/Z$/);
    expect(at).toBeGreaterThanOrEqual(t0 - 1000);
    expect(at).toBeLessThanOrEqual(Date.now() + 1000);

    // the device sees the change: a new ETag, and the 20 m step no longer goes out
    const after = await deviceConfig(token.token, etag);
    expect(after.status).toBe(200);
    expect(after.headers.etag).not.toBe(etag);
    expect(after.body.plan.transmissions).toEqual([]);
    expect(after.body.filters.fitted.index).toBe(1);

    // the plan: 20 m is skipped with the reason, a 40 m schedule is now accepted and a 20 m one refused
    const plan = await agent.get(`/api/stations/${station.id}/plan?from=2026-12-02T00:00:00Z&to=2026-12-02T06:00:00Z`);
    expect(plan.body.transmissions).toEqual([]);
    expect(JSON.stringify(plan.body.skippedSteps)).toMatch(/40 m filter is fitted/);
    expect((await agent.patch(`/api/stations/${station.id}/schedule`).send({ steps: [{ bandId: '20m', slots: 2 }] })).status).toBe(400);
    expect((await agent.patch(`/api/stations/${station.id}/schedule`).send({ steps: [{ bandId: '40m', slots: 1 }] })).status).toBe(200);
    const later = await deviceConfig(token.token);
    expect(bandsOf(later.body.plan.transmissions)).toEqual(['40m']);
    expect(later.body.plan.transmissions[0].filter).toMatchObject({ mode: 'hand', index: 1, bands: ['40m'], controlCode: null });

    // the club review applies the same rule: a 20 m+40 m rotation on this unit would be flagged
    await agent.patch(`/api/units/${unit.id}`).send({ filterSelection: 'switched' }).expect(200);
    await agent.patch(`/api/stations/${station.id}/schedule`).send({ steps: twoBands.steps }).expect(200);
    await agent.patch(`/api/units/${unit.id}`).send({ filterSelection: 'hand' }).expect(200);
    const review = await admin.agent.get(`/api/clubs/${clubId}/review`);
    const row = review.body.find((r: { stationId: number }) => r.stationId === station.id);
    expect(row.findings.map((f: { code: string }) => f.code)).toEqual(expect.arrayContaining(['filter-selection', 'unfiltered-band']));

    const log = await agent.get('/api/audit');
    const entry = log.body.find((e: { action: string; summary: string }) => e.action === 'unit.filter-fitted' && /40 m/.test(e.summary));
    expect(entry.summary).toMatch(/Fitted the 40 m filter in unit Bench board at \d{4}-\d{2}-\d{2} \d{2}:\d{2} UTC/);
  });

  it.each([
    [{ filterIndex: 7 }, 400, /no filter 8/],
    [{ filterIndex: -1 }, 400, /Choose one of/],
    [{}, 400, /Choose the filter/],
  ])('when the fitted filter %j is not one of the unit’s, answers %i and says what to fix', async (body, status, message) => {
    const { agent, unit } = await bench(handSwapped);
    const res = await agent.post(`/api/units/${unit.id}/fitted-filter`).send(body);
    expect(res.status).toBe(status);
    expect(JSON.stringify(res.body.error)).toMatch(message);
  });

  it('when the unit’s filters are switched or the caller is not the owner, refuses the fitted-filter record', async () => {
    const { agent, unit } = await bench(validUnit);
    expect((await agent.post(`/api/units/${unit.id}/fitted-filter`).send({ filterIndex: 0 })).status).toBe(409);
    const other = await signedInAgent(server.app);
    expect((await other.agent.post(`/api/units/${unit.id}/fitted-filter`).send({ filterIndex: 0 })).status).toBe(404);
  });
});
