import Ajv from 'ajv';
import { readFileSync } from 'node:fs';
import { encodeMessage } from '@/shared/domain/wspr/encode';
import { makeClub, signedInAgent, startTestServer, truncateAll, validUnit, type TestServer } from './helpers/test-app';

let server: TestServer;
beforeAll(async () => {
  server = await startTestServer();
});
afterAll(() => server.close());
beforeEach(() => truncateAll(server.sequelize));

const schema = JSON.parse(readFileSync('shared/formats/station-config.v1.schema.json', 'utf8'));
const validateConfig = new Ajv({ allErrors: true }).compile(schema);

async function stationWithUnit(locator = 'JO22AB') {
  const owner = await signedInAgent(server.app);
  const { body: unit } = await owner.agent.post('/api/units').send(validUnit);
  const { body: station } = await owner.agent
    .post('/api/stations')
    .send({ name: 'Bench station', callsign: 'Q9ZZT', locator, unitId: unit.id, audioOffsetHz: 1500 });
  return { ...owner, unit, station };
}

describe('station settings', () => {
  it('when the audio offset is 1700 Hz, responds 400 naming audioOffsetHz', async () => {
    const { agent, station } = await stationWithUnit();
    const res = await agent.patch(`/api/stations/${station.id}`).send({ audioOffsetHz: 1700 });
    expect(res.status).toBe(400);
    expect(res.body.error.fields.audioOffsetHz).toMatch(/1400–1600 Hz/);
  });

  it('when the station names someone else’s unit, responds 400 naming unitId', async () => {
    const { unit } = await stationWithUnit();
    const other = await signedInAgent(server.app);
    const res = await other.agent.post('/api/stations').send({ name: 'x', callsign: 'Q9ZZU', locator: 'JO22', unitId: unit.id });
    expect(res.status).toBe(400);
    expect(res.body.error.fields.unitId).toMatch(/your own units/);
  });

  it('when the callsign has two add-ons, responds 400 with the encoder’s reason', async () => {
    const { agent } = await signedInAgent(server.app);
    const res = await agent.post('/api/stations').send({ name: 'x', callsign: 'Q9/Q9ZZT/P', locator: 'JO22' });
    expect(res.status).toBe(400);
    expect(res.body.error.fields.callsign).toBeTruthy();
  });
});

describe('PUT /api/stations/:id/bands/:bandId', () => {
  it('when the band has a covering filter, enables it', async () => {
    const { agent, station } = await stationWithUnit();
    const res = await agent.put(`/api/stations/${station.id}/bands/20m`).send({ enabled: true });
    expect(res.status).toBe(200);
    expect(res.body.bands).toEqual([expect.objectContaining({ bandId: '20m', enabled: true, calibrationOffsetHz: null })]);
  });

  it('when no installed filter covers 10 m, responds 400 saying why and stores nothing', async () => {
    const { agent, station } = await stationWithUnit();
    const res = await agent.put(`/api/stations/${station.id}/bands/10m`).send({ enabled: true });
    expect(res.status).toBe(400);
    expect(res.body.error.fields.enabled).toMatch(/No low-pass filter for 10 m/);
    expect((await agent.get(`/api/stations/${station.id}`)).body.bands).toEqual([]);
  });

  it('when the station has no unit, refuses to enable a band', async () => {
    const { agent } = await signedInAgent(server.app);
    const { body: station } = await agent.post('/api/stations').send({ name: 'x', callsign: 'Q9ZZT', locator: 'JO22' });
    const res = await agent.put(`/api/stations/${station.id}/bands/20m`).send({ enabled: true });
    expect(res.status).toBe(400);
    expect(res.body.error.fields.enabled).toMatch(/Assign a unit/);
  });

  it('when the band is unknown, responds 404; when another operator tries, 404', async () => {
    const { agent, station } = await stationWithUnit();
    expect((await agent.put(`/api/stations/${station.id}/bands/11m`).send({ enabled: true })).status).toBe(404);
    const stranger = await signedInAgent(server.app);
    expect((await stranger.agent.put(`/api/stations/${station.id}/bands/20m`).send({ enabled: true })).status).toBe(404);
  });
});

describe('calibration', () => {
  it('when 40 m is measured 29.6 Hz high, proposes ≈ +4.2 ppm and scaled offsets for every enabled band, saving nothing yet', async () => {
    const { agent, station } = await stationWithUnit();
    await agent.put(`/api/stations/${station.id}/bands/20m`).send({ enabled: true });
    await agent.put(`/api/stations/${station.id}/bands/40m`).send({ enabled: true });
    const commandedHz = 7_040_100;
    const res = await agent
      .post(`/api/stations/${station.id}/calibration/proposal`)
      .send({ bandId: '40m', commandedHz, observedHz: commandedHz + 29.6 });
    expect(res.status).toBe(200);
    // ppm = (observed / commanded − 1) · 10⁶ (definition of parts per million)
    expect(res.body.referenceErrorPpm).toBeCloseTo((29.6 / commandedHz) * 1e6, 6);
    const byBand = Object.fromEntries(
      res.body.offsets.map((o: { bandId: string; calibrationOffsetHz: number }) => [o.bandId, o.calibrationOffsetHz]),
    );
    // 20 m carrier 14 097 100 Hz scales the same ppm: 14 097 100 × 29.6 / 7 040 100
    expect(byBand['20m']).toBeCloseTo((14_097_100 * 29.6) / commandedHz, 1);
    expect(byBand['40m']).toBeCloseTo(29.6, 1);
    expect(
      (await agent.get(`/api/stations/${station.id}`)).body.bands.every(
        (b: { calibrationOffsetHz: unknown }) => b.calibrationOffsetHz === null,
      ),
    ).toBe(true);
  });

  it('when the operator accepts proposals, they are saved together with the ppm', async () => {
    const { agent, station } = await stationWithUnit();
    const res = await agent.post(`/api/stations/${station.id}/calibration`).send({
      source: 'measured',
      referenceErrorPpm: 4.2,
      offsets: [
        { bandId: '40m', calibrationOffsetHz: 29.6 },
        { bandId: '20m', calibrationOffsetHz: 59.2 },
      ],
    });
    expect(res.status).toBe(200);
    expect(res.body.referenceErrorPpm).toBe(4.2);
    expect(
      res.body.bands.map((b: { bandId: string; calibrationOffsetHz: number; calibrationSource: string }) => [
        b.bandId,
        b.calibrationOffsetHz,
        b.calibrationSource,
      ]),
    ).toEqual([
      ['20m', 59.2, 'measured'],
      ['40m', 29.6, 'measured'],
    ]);
  });

  it('when one offset in the batch is out of range, responds 400 and saves none of them', async () => {
    const { agent, station } = await stationWithUnit();
    const res = await agent.post(`/api/stations/${station.id}/calibration`).send({
      source: 'typed',
      offsets: [
        { bandId: '40m', calibrationOffsetHz: 12 },
        { bandId: '20m', calibrationOffsetHz: 9000 },
      ],
    });
    expect(res.status).toBe(400);
    expect(res.body.error.fields['offsets.1.calibrationOffsetHz']).toMatch(/5000 Hz/);
    expect((await agent.get(`/api/stations/${station.id}`)).body.bands).toEqual([]);
  });
});

describe('GET /api/stations/:id/config', () => {
  it('when downloaded, matches the JSON Schema and carries the core’s symbols for each message', async () => {
    const { agent, station } = await stationWithUnit('JO22AB');
    await agent.put(`/api/stations/${station.id}/bands/20m`).send({ enabled: true, calibrationOffsetHz: 59.2 });
    const res = await agent.get(`/api/stations/${station.id}/config?download`);
    expect(res.status).toBe(200);
    expect(res.headers['content-disposition']).toMatch(/attachment; filename="faintline-Q9ZZT-station-\d+\.json"/);
    expect(validateConfig(res.body)).toBe(true);
    expect(validateConfig.errors ?? []).toEqual([]);
    // A 6-character locator alternates Type 1 and Type 3 (WSPR protocol description).
    expect(res.body.messages.map((m: { type: number }) => m.type)).toEqual([1, 3]);
    for (const message of res.body.messages) {
      const core = encodeMessage(message.text);
      expect(core.ok && Array.from(core.symbols)).toEqual(message.symbols);
    }
    const band = res.body.bands[0];
    // carrier = dial 14 095 600 + 1500 Hz; commanded tones shifted down by the calibration offset
    expect(band.carrierHz).toBe(14_097_100);
    expect(band.commandTonesHz[0]).toBeCloseTo(14_097_100 - 59.2, 3);
    expect(band.synth.tones).toHaveLength(4);
  });

  it('when a club admin downloads a member’s config, responds 200; an outsider 404', async () => {
    const { station, user } = await stationWithUnit();
    const admin = await signedInAgent(server.app);
    await makeClub('Config Circle', admin.user.id, [user.id]);
    expect((await admin.agent.get(`/api/stations/${station.id}/config`)).status).toBe(200);
    const stranger = await signedInAgent(server.app);
    expect((await stranger.agent.get(`/api/stations/${station.id}/config`)).status).toBe(404);
  });
});
