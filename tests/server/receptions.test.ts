import { Geodesic } from 'geographiclib-geodesic';
import request from 'supertest';
import { pathBetween } from '@/shared/domain/path';
import { locatorToLatLon } from '@/shared/domain/locator';
import { REPORTED_CENTRE_ABOVE_TONE0_HZ } from '@/shared/domain/reception';
import { makeClub, signedInAgent, startTestServer, truncateAll, validUnit, type TestServer } from './helpers/test-app';

let server: TestServer;
beforeAll(async () => {
  server = await startTestServer();
});
afterAll(() => server.close());
beforeEach(() => truncateAll(server.sequelize));

type Agent = Awaited<ReturnType<typeof signedInAgent>>['agent'];

const device = (token: string, body: unknown) =>
  request(server.app)
    .post('/api/device/v1/receptions')
    .set('Authorization', `Bearer ${token}`)
    .send(body as object);

/** A station on 20 m transmitting every other opportunity since 2026-01-01, backdated so reports of any 2026 slot may match it. */
async function beacon(agent: Agent, fields: { name: string; callsign: string; locator?: string; audioOffsetHz?: number }) {
  const { body: unit } = await agent.post('/api/units').send(validUnit);
  const { body: station } = await agent.post('/api/stations').send({
    name: fields.name,
    callsign: fields.callsign,
    locator: fields.locator ?? 'JO22ab',
    unitId: unit.id,
    audioOffsetHz: fields.audioOffsetHz ?? 1500,
    transmitEnabled: true,
  });
  expect(station.id).toEqual(expect.any(Number));
  await agent.put(`/api/stations/${station.id}/bands/20m`).send({ enabled: true, calibrationOffsetHz: 0 });
  const schedule = await agent
    .post(`/api/stations/${station.id}/schedule`)
    .send({ steps: [{ bandId: '20m', slots: 1 }], cadence: { kind: 'every-nth', nth: 2 }, startDate: '2026-01-01' });
  expect([schedule.status, schedule.body.error?.message]).toEqual([201, undefined]);
  await server.sequelize.query("UPDATE stations SET createdAt = '2025-12-01 00:00:00' WHERE id = ?", { replacements: [station.id] });
  return station as { id: number; callsign: string; locator: string };
}

/** The station's planned transmissions in a window, from its own plan API: the slot (UTC) and tone 0's frequency. */
async function planned(agent: Agent, stationId: number, from: string, to: string) {
  const { body } = await agent.get(`/api/stations/${stationId}/plan?from=${from}&to=${to}`);
  return (body.transmissions as { startMs: number; carrierHz: number }[]).map((t) => ({
    slotUtc: new Date(Math.floor(t.startMs / 120_000) * 120_000).toISOString(),
    carrierHz: t.carrierHz,
  }));
}

async function postWithToken(agent: Agent, fields = { name: 'Garden receiver', callsign: 'Q7RXA', locator: 'IO91wm' }) {
  const created = await agent.post('/api/listening-posts').send(fields);
  expect(created.status).toBe(201);
  const issued = await agent.post(`/api/listening-posts/${created.body.id}/token`);
  expect(issued.status).toBe(201);
  return { post: created.body as { id: number }, token: issued.body.token as string };
}

const report = (over: Record<string, unknown> = {}) => ({
  slotUtc: '2026-11-30T10:00:00Z',
  bandId: '20m',
  txCallsign: 'Q9ZZT',
  txLocator: 'JO22ab',
  txPowerDbm: 23,
  snrDb: -12,
  frequencyHz: 14_097_100,
  driftHz: 0,
  ...over,
});

const countRows = async (table: string) => {
  const [rows] = await server.sequelize.query(`SELECT COUNT(*) AS n FROM ${table}`);
  return Number((rows as { n: number }[])[0].n);
};

describe('listening posts', () => {
  it('when registered, lists it; a token posts reports; rotated, the old token stops at once; deleted, the new one stops too', async () => {
    const { agent } = await signedInAgent(app(), { displayName: 'Rx Owner' });
    const bad = await agent.post('/api/listening-posts').send({ name: '', callsign: 'Q7RXA', locator: 'ZZ99' });
    expect(bad.status).toBe(400);
    expect(Object.keys(bad.body.error.fields)).toEqual(expect.arrayContaining(['name', 'locator']));

    const { post, token } = await postWithToken(agent);
    expect(token).toMatch(/^flp_/);
    const listed = await agent.get('/api/listening-posts');
    expect(listed.body).toEqual([expect.objectContaining({ id: post.id, callsign: 'Q7RXA', locator: 'IO91WM', hasToken: true })]);

    expect((await device(token, { reports: [report()] })).status).toBe(202);
    const rotated = await agent.post(`/api/listening-posts/${post.id}/token`);
    expect(rotated.status).toBe(201);
    expect((await device(token, { reports: [report({ snrDb: -3 })] })).status).toBe(401);
    expect((await device(rotated.body.token, { reports: [report({ txCallsign: 'Q1ABC' })] })).status).toBe(202);

    const after = await agent.get('/api/listening-posts');
    expect(after.body[0]).toMatchObject({ reports: 2, lastReportAt: expect.any(String) });
    expect((await agent.delete(`/api/listening-posts/${post.id}`)).status).toBe(204);
    expect((await device(rotated.body.token, { reports: [report({ txCallsign: 'Q1ABD' })] })).status).toBe(401);
    expect((await agent.get('/api/listening-posts')).body).toEqual([]);
    const [audit] = await server.sequelize.query("SELECT action FROM audit_entries WHERE entityType = 'listening-post' ORDER BY id");
    expect((audit as { action: string }[]).map((a) => a.action)).toEqual([
      'listening-post.create',
      'listening-post.token',
      'listening-post.rotate',
      'listening-post.delete',
    ]);
  });

  it('when a stranger reads, rotates or deletes a post, responds 404; a club admin reads a member’s post but cannot rotate it', async () => {
    const owner = await signedInAgent(app(), { displayName: 'Post Owner' });
    const { post } = await postWithToken(owner.agent);
    const stranger = await signedInAgent(app());
    expect((await stranger.agent.get(`/api/listening-posts/${post.id}`)).status).toBe(404);
    expect((await stranger.agent.post(`/api/listening-posts/${post.id}/token`)).status).toBe(404);
    expect((await stranger.agent.delete(`/api/listening-posts/${post.id}`)).status).toBe(404);
    const admin = await signedInAgent(app(), { displayName: 'Circle Admin' });
    await makeClub('Listening Circle', admin.user.id, [owner.user.id]);
    expect((await admin.agent.get(`/api/listening-posts/${post.id}`)).status).toBe(200);
    expect((await admin.agent.get('/api/listening-posts?include=club')).body).toEqual([expect.objectContaining({ id: post.id })]);
    expect((await admin.agent.post(`/api/listening-posts/${post.id}/token`)).status).toBe(403);
  });
});

describe('device ingest', () => {
  it('when a batch mixes good and bad reports, stores the good ones, names each bad one by index and field, and stores repeats once', async () => {
    const { agent } = await signedInAgent(app());
    const { token } = await postWithToken(agent);
    const batch = [
      report(),
      report({ snrDb: 'loud' }),
      report({ txCallsign: 'Q1ABC' }),
      report({ slotUtc: 'yesterday' }),
      report({ txCallsign: 'Q2XYZ', bandId: '20m' }),
    ];
    const first = await device(token, { reports: batch });
    expect(first.status).toBe(202);
    expect(first.body).toEqual({
      accepted: 3,
      duplicates: 0,
      rejected: [
        { index: 1, field: 'snrDb', message: expect.any(String) },
        { index: 3, field: 'slotUtc', message: expect.stringMatching(/ISO 8601/) },
      ],
    });
    const again = await device(token, { reports: [report(), report({ txCallsign: 'Q1ABC' }), report({ txCallsign: 'Q3NEW' })] });
    expect(again.body).toEqual({ accepted: 1, duplicates: 2, rejected: [] });
    expect(await countRows('reception_reports')).toBe(4);
    const [stored] = await server.sequelize.query('SELECT rxCallsign, rxLocator FROM reception_reports GROUP BY rxCallsign, rxLocator');
    expect(stored).toEqual([{ rxCallsign: 'Q7RXA', rxLocator: 'IO91WM' }]);
  });

  it('when the body is not a batch of 1–500 reports or the token is missing, responds 400 with fields / 401 and stores nothing', async () => {
    const { agent } = await signedInAgent(app());
    const { token } = await postWithToken(agent);
    const empty = await device(token, { reports: [] });
    expect(empty.status).toBe(400);
    expect(empty.body.error.fields.reports).toMatch(/at least one/);
    const tooMany = await device(token, { reports: Array.from({ length: 501 }, () => report()) });
    expect(tooMany.status).toBe(400);
    expect(tooMany.body.error.fields.reports).toMatch(/at most 500/);
    expect((await device(token, { nothing: true })).status).toBe(400);
    expect(
      (
        await request(app())
          .post('/api/device/v1/receptions')
          .send({ reports: [report()] })
      ).status,
    ).toBe(401);
    expect((await device('flp_made-up', { reports: [report()] })).status).toBe(401);
    expect(await countRows('reception_reports')).toBe(0);
  });

  it('when a slot lies in the future, rejects that report', async () => {
    const { agent } = await signedInAgent(app());
    const { token } = await postWithToken(agent);
    const res = await device(token, { reports: [report({ slotUtc: new Date(Date.now() + 3_600_000).toISOString() })] });
    expect(res.body).toMatchObject({ accepted: 0, rejected: [{ index: 0, field: 'slotUtc', message: expect.stringMatching(/future/) }] });
  });
});

describe('matching reports to stations', () => {
  it('when one operator runs two stations with one callsign on one band, tells them apart by the heard frequency or marks it ambiguous', async () => {
    const { agent } = await signedInAgent(app());
    const low = await beacon(agent, { name: 'Low offset', callsign: 'Q9ZZT', audioOffsetHz: 1440 });
    const high = await beacon(agent, { name: 'High offset', callsign: 'Q9ZZT', audioOffsetHz: 1560 });
    const lows = await planned(agent, low.id, '2026-11-30T10:00:00Z', '2026-11-30T10:30:00Z');
    const highs = await planned(agent, high.id, '2026-11-30T10:00:00Z', '2026-11-30T10:30:00Z');
    expect(lows.length).toBeGreaterThanOrEqual(3);
    expect(highs.map((t) => t.slotUtc)).toEqual(lows.map((t) => t.slotUtc));
    const lowCarrier = lows[0].carrierHz;
    const highCarrier = highs[0].carrierHz;
    expect(highCarrier - lowCarrier).toBeCloseTo(120, 6);
    const { token } = await postWithToken(agent);
    // Decoders report the tones' centre, 1.5 tone spacings above tone 0 (common practice, from memory).
    const res = await device(token, {
      reports: [
        report({ slotUtc: lows[0].slotUtc, frequencyHz: lowCarrier + REPORTED_CENTRE_ABOVE_TONE0_HZ + 1 }),
        report({ slotUtc: lows[1].slotUtc, frequencyHz: highs[1].carrierHz + REPORTED_CENTRE_ABOVE_TONE0_HZ - 3 }),
        report({ slotUtc: lows[2].slotUtc, frequencyHz: (lows[2].carrierHz + highs[2].carrierHz) / 2 }),
      ],
    });
    expect(res.body).toMatchObject({ accepted: 3, rejected: [] });
    const [rows] = await server.sequelize.query(
      'SELECT slotStart, stationId, ambiguous, frequencyErrorHz FROM reception_reports ORDER BY slotStart',
    );
    const stored = rows as { stationId: number | null; ambiguous: number; frequencyErrorHz: number | null }[];
    expect(stored[0]).toMatchObject({ stationId: low.id, ambiguous: 0 });
    expect(stored[0].frequencyErrorHz).toBeCloseTo(1, 3);
    expect(stored[1]).toMatchObject({ stationId: high.id, ambiguous: 0 });
    expect(stored[1].frequencyErrorHz).toBeCloseTo(-3, 3);
    expect(stored[2]).toMatchObject({ stationId: null, ambiguous: 1, frequencyErrorHz: null });
    // Counted for neither: each station's aggregates hold exactly its own report.
    const [counts] = await server.sequelize.query(
      'SELECT stationId, SUM(reports) AS n FROM reception_slot_counts GROUP BY stationId ORDER BY stationId',
    );
    expect((counts as { stationId: number; n: number }[]).map((c) => [c.stationId, Number(c.n)])).toEqual([
      [low.id, 1],
      [high.id, 1],
    ]);
  });

  it('when a report is stored, its distance and bearing are the geodesic between the locator centres', async () => {
    const { agent } = await signedInAgent(app());
    const { token } = await postWithToken(agent, { name: 'Far receiver', callsign: 'Q7FAR', locator: 'IN80dw' });
    await device(token, { reports: [report({ txLocator: 'RE78ir' })] });
    const [rows] = await server.sequelize.query('SELECT distanceKm, bearingDeg FROM reception_reports');
    const { distanceKm, bearingDeg } = (rows as { distanceKm: number; bearingDeg: number }[])[0];
    const tx = locatorToLatLon('RE78ir');
    const rx = locatorToLatLon('IN80dw');
    if (!tx.ok || !rx.ok) throw new Error('locators');
    // The reference library itself (geographiclib-geodesic, C. F. F. Karney), called directly on the locator centres.
    const reference = Geodesic.WGS84.Inverse(tx.lat, tx.lon, rx.lat, rx.lon);
    expect(distanceKm).toBeCloseTo(reference.s12! / 1000, 1);
    expect(bearingDeg).toBeCloseTo((reference.azi1! + 360) % 360, 3);
    // The shared path code behind it gives geographiclib's published example: Wellington (41.32S, 174.81E) to
    // Salamanca (40.96N, 5.50W) is 19959679.267 m (geographiclib-geodesic README).
    expect(pathBetween({ lat: -41.32, lon: 174.81 }, { lat: 40.96, lon: -5.5 }).distanceKm).toBeCloseTo(19959.679267, 5);
    // GeodSolve0 in geographiclib's test suite: JFK (40.6N, 73.8W) to CDG (49.01666667N, 2.55E), azi1 53.47022°, s12 5853226 m.
    const jfkCdg = pathBetween({ lat: 40.6, lon: -73.8 }, { lat: 49.01666667, lon: 2.55 });
    expect(jfkCdg.bearingDeg).toBeCloseTo(53.47022, 4);
    expect(jfkCdg.distanceKm).toBeCloseTo(5853.226, 2);
  });
});

function app() {
  return server.app;
}

/** Three receivers hear one station in a 10-minute window: small enough to work out by hand. */
async function smallSet() {
  const owner = await signedInAgent(app(), { displayName: 'Beacon Owner' });
  const station = await beacon(owner.agent, { name: 'Reach beacon', callsign: 'Q9ZZT', locator: 'JO22ab' });
  const plan = await planned(owner.agent, station.id, '2026-11-30T10:00:00Z', '2026-11-30T10:10:00Z');
  const [p0, p1] = plan.map((t) => ({ slotUtc: t.slotUtc, centre: t.carrierHz + REPORTED_CENTRE_ABOVE_TONE0_HZ }));
  const posts = [
    await postWithToken(owner.agent, { name: 'Near', callsign: 'Q7NEA', locator: 'JO32aa' }),
    await postWithToken(owner.agent, { name: 'Mid', callsign: 'Q7MID', locator: 'IO91wm' }),
    await postWithToken(owner.agent, { name: 'Far', callsign: 'Q7FAR', locator: 'FN31pr' }),
  ];
  // 23 dBm = 0.2 W. Near hears the first two planned slots, Mid the first, Far the second; Near also hears another transmitter.
  await device(posts[0].token, {
    reports: [
      report({ slotUtc: p0.slotUtc, snrDb: -5, frequencyHz: p0.centre }),
      report({ slotUtc: p1.slotUtc, snrDb: -7, frequencyHz: p1.centre }),
      report({ txCallsign: 'Q1OTH', txLocator: 'JN58td', snrDb: -20 }),
    ],
  });
  await device(posts[1].token, { reports: [report({ slotUtc: p0.slotUtc, snrDb: -15, frequencyHz: p0.centre })] });
  await device(posts[2].token, { reports: [report({ slotUtc: p1.slotUtc, snrDb: -24, frequencyHz: p1.centre + 2 })] });
  const km = (locator: string) => {
    const a = locatorToLatLon('JO22ab');
    const b = locatorToLatLon(locator);
    if (!a.ok || !b.ok) throw new Error('locator');
    return Geodesic.WGS84.Inverse(a.lat, a.lon, b.lat, b.lon).s12! / 1000;
  };
  return { owner, station, plannedCount: plan.length, km: { near: km('JO32aa'), mid: km('IO91wm'), far: km('FN31pr') } };
}

const WINDOW = 'from=2026-11-30T10:00:00Z&to=2026-11-30T10:10:00Z';

describe('reach', () => {
  it('when three receivers heard the station, gives the hand-computed figures', async () => {
    const { owner, station, km, plannedCount } = await smallSet();
    const res = await owner.agent.get(`/api/stations/${station.id}/reach?${WINDOW}`);
    expect(res.status).toBe(200);
    const reach = res.body;
    expect(reach.reports).toBe(4);
    expect(reach.receivers).toBe(3);
    expect(reach.furthestKm).toBeCloseTo(km.far, 1);
    // The reports' distances sorted: [near, near, mid, far]; half of the four is reached at the second, so near.
    expect(reach.medianKm).toBeCloseTo(km.near, 1);
    // Heard in 2 of the transmissions the plan API lists for the window.
    expect(plannedCount).toBeGreaterThanOrEqual(2);
    expect(reach.plannedTransmissions).toBe(plannedCount);
    expect(reach.heardTransmissions).toBe(2);
    expect(reach.heardShare).toBeCloseTo(2 / plannedCount, 9);
    expect(reach.bestSnrDb).toBe(-5);
    // SNR referred to 1 W: −5 − (23 − 30) = +2 dB.
    expect(reach.bestSnrPerWattDb).toBeCloseTo(2, 6);
    // 23 dBm = 10^((23 − 30)/10) W ≈ 0.1995 W; the furthest receiver per watt.
    expect(reach.kmPerWatt).toBeCloseTo(km.far / 10 ** -0.7, 0);
    expect(reach.hourBand).toEqual([{ hour: 10, bandId: '20m', reports: 4 }]);
    expect(reach.mapReceivers.map((r: { callsign: string }) => r.callsign)).toEqual(['Q7FAR', 'Q7MID', 'Q7NEA']);
    const far = reach.mapReceivers[0];
    const farAt = locatorToLatLon('FN31pr');
    expect(farAt.ok && far.lat).toBeCloseTo(farAt.ok ? farAt.lat : NaN, 6);
    expect(far).toMatchObject({ reports: 1, bestSnrDb: -24, bands: ['20m'], locator: 'FN31PR' });
    expect(reach.snrByDistance).toHaveLength(3);
  });

  it('when a period covers whole hours (read from the hour roll-up) and part-hours (from the slot rows), the figures agree with the reports themselves', async () => {
    const { owner, station } = await smallSet();
    const direct = async (from: string, to: string) => {
      const [rows] = await server.sequelize.query(
        'SELECT COUNT(*) AS reports, COUNT(DISTINCT slotStart) AS slots FROM reception_reports WHERE stationId = ? AND slotStart >= ? AND slotStart < ?',
        { replacements: [station.id, from.replace('T', ' ').replace('Z', ''), to.replace('T', ' ').replace('Z', '')] },
      );
      const [row] = rows as { reports: number; slots: number }[];
      return { reports: Number(row.reports), slots: Number(row.slots) };
    };
    for (const [from, to] of [
      ['2026-11-30T09:00:00Z', '2026-11-30T12:00:00Z'], // whole hours only
      ['2026-11-30T09:30:00Z', '2026-11-30T11:30:00Z'], // part, whole, part
      ['2026-11-30T10:02:00Z', '2026-11-30T10:10:00Z'], // inside one hour
      ['2026-11-30T10:00:00Z', '2026-11-30T10:02:00Z'], // the first slot only
    ]) {
      const res = await owner.agent.get(`/api/stations/${station.id}/reach?from=${from}&to=${to}`);
      expect(res.status).toBe(200);
      const truth = await direct(from, to);
      expect({ from, reports: res.body.reports, heard: res.body.heardTransmissions }).toEqual({
        from,
        reports: truth.reports,
        heard: truth.slots,
      });
    }
    // The roll-up holds the four reports in the two heard slots.
    const before = await server.sequelize.query('SELECT reports, slots FROM reception_hour_counts WHERE stationId = ?', {
      replacements: [station.id],
    });
    expect((before[0] as { reports: number; slots: number }[])[0]).toEqual({ reports: 4, slots: 2 });
  });

  it('when the period is longer than a year or reversed, responds 400 with the field', async () => {
    const { owner, station } = await smallSet();
    const long = await owner.agent.get(`/api/stations/${station.id}/reach?from=2024-01-01T00:00:00Z&to=2026-01-01T00:00:00Z`);
    expect(long.status).toBe(400);
    expect(long.body.error.fields.from).toMatch(/366 days/);
    const reversed = await owner.agent.get(`/api/stations/${station.id}/reach?from=2026-11-30T10:00:00Z&to=2026-11-30T09:00:00Z`);
    expect(reversed.status).toBe(400);
  });
});

describe('reading reports', () => {
  it('when the owner or the owner’s club admin reads, responds 200; anyone else 404', async () => {
    const { owner, station } = await smallSet();
    const page = await owner.agent.get(`/api/stations/${station.id}/receptions?${WINDOW}&pageSize=2&sort=snr&order=desc`);
    expect(page.status).toBe(200);
    expect(page.body).toMatchObject({ total: 4, page: 1, pageSize: 2 });
    expect(page.body.reports.map((r: { snrDb: number }) => r.snrDb)).toEqual([-5, -7]);
    expect(page.body.reports[0]).toMatchObject({ rxCallsign: 'Q7NEA', source: { kind: 'listening-post', name: 'Near' } });

    const stranger = await signedInAgent(app());
    for (const path of ['receptions', 'reach']) {
      expect((await stranger.agent.get(`/api/stations/${station.id}/${path}?${WINDOW}`)).status).toBe(404);
    }
    expect((await stranger.agent.get(`/api/stations/${station.id}/receptions?${WINDOW}&format=csv`)).status).toBe(404);
    const admin = await signedInAgent(app());
    await makeClub('Reach Circle', admin.user.id, [owner.user.id]);
    expect((await admin.agent.get(`/api/stations/${station.id}/receptions?${WINDOW}`)).body.total).toBe(4);
    expect((await admin.agent.get(`/api/stations/${station.id}/reach?${WINDOW}`)).status).toBe(200);
  });

  it('when reports of other transmitters came in, only the importer and their clubs’ admins see them', async () => {
    const { owner } = await smallSet();
    const mine = await owner.agent.get(`/api/receptions?from=2026-11-30T00:00:00Z&to=2026-12-01T00:00:00Z`);
    expect(mine.status).toBe(200);
    expect(mine.body.total).toBe(5);
    expect(mine.body.reports.filter((r: { stationId: number | null }) => r.stationId === null)).toEqual([
      expect.objectContaining({ txCallsign: 'Q1OTH' }),
    ]);
    const stranger = await signedInAgent(app());
    expect((await stranger.agent.get(`/api/receptions?from=2026-11-30T00:00:00Z&to=2026-12-01T00:00:00Z`)).body.total).toBe(0);
    const ownerId = owner.user.id;
    expect((await stranger.agent.get(`/api/receptions?importerId=${ownerId}&from=2026-11-30T00:00:00Z`)).status).toBe(404);
    const admin = await signedInAgent(app());
    await makeClub('Import Circle', admin.user.id, [ownerId]);
    const seen = await admin.agent.get(`/api/receptions?importerId=${ownerId}&from=2026-11-30T00:00:00Z&to=2026-12-01T00:00:00Z`);
    expect(seen.body.total).toBe(5);
  });

  it('when exported as CSV, sends the documented header and one line per report, oldest first', async () => {
    const { owner, station, km } = await smallSet();
    const res = await owner.agent.get(`/api/stations/${station.id}/receptions?${WINDOW}&format=csv`);
    expect(res.status).toBe(200);
    expect(res.headers['content-type']).toMatch(/text\/csv/);
    expect(res.headers['content-disposition']).toMatch(/^attachment; filename="faintline-receptions-Q9ZZT-2026-11-30-2026-11-30\.csv"$/);
    const lines = res.text.trim().split('\n');
    expect(lines[0]).toBe(
      'slot_utc,band,tx_callsign,tx_locator,tx_power_dbm,rx_callsign,rx_locator,snr_db,frequency_hz,drift_hz,distance_km,bearing_deg,frequency_error_hz',
    );
    expect(lines).toHaveLength(5);
    const first = lines[1].split(',');
    expect(first[0]).toMatch(/^2026-11-30T10:0\d:00\.000Z$/);
    expect(first.slice(1, 5)).toEqual(['20m', 'Q9ZZT', 'JO22AB', '23']);
    expect(lines.slice(1).map((l) => l.split(',')[0])).toEqual(
      lines
        .slice(1)
        .map((l) => l.split(',')[0])
        .sort(),
    );
    const far = lines.find((l) => l.includes('Q7FAR'))!.split(',');
    expect(Number(far[10])).toBeCloseTo(km.far, 0);
    expect(Number(far[12])).toBeCloseTo(2, 3);
  });
});

describe('overview and station deletion', () => {
  it('when asked at a glance, gives each station’s state, next transmission, last heard and last 24 hours', async () => {
    const { agent } = await signedInAgent(app());
    const station = await beacon(agent, { name: 'Glance beacon', callsign: 'Q9GLA' });
    const quiet = await beacon(agent, { name: 'Quiet beacon', callsign: 'Q9QUI' });
    const { token } = await postWithToken(agent);
    const slotMs = Math.floor(Date.now() / 120_000) * 120_000 - 240_000;
    await device(token, { reports: [report({ txCallsign: 'Q9GLA', slotUtc: new Date(slotMs).toISOString(), frequencyHz: 14_097_100 })] });
    const res = await agent.get('/api/stations/at-a-glance');
    expect(res.status).toBe(200);
    const glance = res.body.find((g: { stationId: number }) => g.stationId === station.id);
    expect(glance).toMatchObject({
      transmitting: true,
      nextTransmission: { startUtc: expect.any(String), bandId: '20m' },
      lastHeard: { slotUtc: new Date(slotMs).toISOString(), rxCallsign: 'Q7RXA', distanceKm: expect.any(Number) },
      last24h: { reports: 1, receivers: 1 },
    });
    expect(Date.parse(glance.nextTransmission.startUtc)).toBeGreaterThanOrEqual(Date.now() - 1000);
    expect(res.body.find((g: { stationId: number }) => g.stationId === quiet.id)).toMatchObject({
      lastHeard: null,
      last24h: { reports: 0, receivers: 0, furthestKm: null },
    });
  });

  it('when a station is deleted, its aggregates go and its reports stay with the importer', async () => {
    const { owner, station } = await smallSet();
    expect(await countRows('reception_slot_counts')).toBeGreaterThan(0);
    expect((await owner.agent.delete(`/api/stations/${station.id}`)).status).toBe(204);
    expect(await countRows('reception_slot_counts')).toBe(0);
    expect(await countRows('reception_receiver_days')).toBe(0);
    const mine = await owner.agent.get(`/api/receptions?from=2026-11-30T00:00:00Z&to=2026-12-01T00:00:00Z`);
    expect(mine.body.total).toBe(5);
  });
});
