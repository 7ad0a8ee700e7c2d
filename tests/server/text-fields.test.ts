import request from 'supertest';
import { createHttpHandler } from '@/server/app';
import { createLogger } from '@/server/lib/logger';
import { makeClub, signedInAgent, startTestServer, truncateAll, validStation, validUnit, type TestServer } from './helpers/test-app';

let server: TestServer;
beforeAll(async () => {
  server = await startTestServer();
});
afterAll(() => server.close());
beforeEach(() => truncateAll(server.sequelize));

// U+202E RIGHT-TO-LEFT OVERRIDE and U+2066 LEFT-TO-RIGHT ISOLATE (Unicode UAX #9, explicit directional formatting characters).
const RLO = '\u202e';
const LRI = '\u2066';

async function setting() {
  const owner = await signedInAgent(server.app, { displayName: 'Text Owner' });
  const clubId = await makeClub('Text Circle', owner.user.id, []);
  const { body: unit } = await owner.agent.post('/api/units').send(validUnit);
  const { body: station } = await owner.agent.post('/api/stations').send(validStation);
  return { ...owner, clubId, unit, station };
}

describe('text shown to others', () => {
  it('when a name, club name, note, reason or callsign holds a control character, answers 400 naming the field and changes nothing', async () => {
    const { agent, clubId, unit, station } = await setting();
    const cases: [string, () => request.Test, string][] = [
      [
        'register displayName',
        () =>
          request(server.app)
            .post('/api/auth/register')
            .send({ email: 'nul@test.faintline.example', password: 'long-enough-pass', displayName: 'Ann\u0000a' }),
        'displayName',
      ],
      ['profile displayName', () => agent.patch('/api/auth/me').send({ displayName: 'Ann\u0007', callsign: '' }), 'displayName'],
      ['profile callsign', () => agent.patch('/api/auth/me').send({ displayName: 'Ann', callsign: 'Q9\u0000ZZ' }), 'callsign'],
      ['profile callsign, leading tab', () => agent.patch('/api/auth/me').send({ displayName: 'Ann', callsign: '\tQ9ZZT' }), 'callsign'],
      ['station name', () => agent.post('/api/stations').send({ ...validStation, name: 'Loft\u001b[31m' }), 'name'],
      ['station notes', () => agent.patch(`/api/stations/${station.id}`).send({ notes: 'ok\u0000' }), 'notes'],
      ['station callsign', () => agent.patch(`/api/stations/${station.id}`).send({ callsign: 'Q9ZZT\u0000' }), 'callsign'],
      ['club name', () => agent.patch(`/api/clubs/${clubId}`).send({ name: 'Circle\u0085' }), 'name'],
      ['unit name', () => agent.patch(`/api/units/${unit.id}`).send({ name: 'Board\u007f' }), 'name'],
      ['unit notes', () => agent.patch(`/api/units/${unit.id}`).send({ notes: 'a\u0000b' }), 'notes'],
      [
        'suspension reason',
        () => agent.post(`/api/clubs/${clubId}/stations/${station.id}/suspension`).send({ reason: 'Spurs\u0000 on 40m' }),
        'reason',
      ],
    ];
    for (const [what, send, field] of cases) {
      const res = await send();
      expect({ what, status: res.status }).toEqual({ what, status: 400 });
      expect(res.body.error.fields[field]).toMatch(/control characters/);
    }
    const me = (await agent.get('/api/auth/me')).body;
    expect(me.displayName).toBe('Text Owner');
    expect((await agent.get(`/api/stations/${station.id}`)).body).toMatchObject({ name: validStation.name, notes: '' });
  });

  it('when a name holds a text-direction override, answers 400; notes keep their line breaks', async () => {
    const { agent, clubId, station } = await setting();
    for (const [send, field] of [
      [() => agent.patch('/api/auth/me').send({ displayName: `Ann${RLO}gnp.exe`, callsign: '' }), 'displayName'],
      [() => agent.post('/api/stations').send({ ...validStation, name: `Loft${LRI}` }), 'name'],
      [() => agent.patch(`/api/clubs/${clubId}`).send({ name: `Harbour ${RLO}Circle` }), 'name'],
      [() => agent.post('/api/units').send({ ...validUnit, name: `Board${RLO}` }), 'name'],
    ] as [() => request.Test, string][]) {
      const res = await send();
      expect(res.status).toBe(400);
      expect(res.body.error.fields[field]).toMatch(/direction override/);
    }
    const notes = 'Line one\nLine two\twith a tab';
    const res = await agent.patch(`/api/stations/${station.id}`).send({ notes });
    expect(res.status).toBe(200);
    expect(res.body.notes).toBe(notes);
    // Ordinary non-Latin names are fine (Hebrew and Greek letters carry their own direction).
    expect((await agent.patch('/api/auth/me').send({ displayName: 'אנה Ωμέγα', callsign: '' })).status).toBe(200);
  });

  it('when a device sends a control character in its firmware version or message text, answers 400', async () => {
    const { agent, station } = await setting();
    const { body } = await agent.post(`/api/stations/${station.id}/device-token`);
    const handler = createHttpHandler(server.app, createLogger('silent'));
    const hb = await request(handler)
      .post('/api/device/v1/heartbeat')
      .set('Authorization', `Bearer ${body.token}`)
      .send({ uptimeS: 1, firmwareVersion: '1.0\u0000', timeSource: 'gps', clockOffsetMs: 0 });
    expect(hb.status).toBe(400);
    expect(hb.body.error.fields).toHaveProperty('firmwareVersion');
    const tx = await request(handler)
      .post('/api/device/v1/transmissions')
      .set('Authorization', `Bearer ${body.token}`)
      .send({
        transmissions: [{ startUtc: '2026-12-02T10:00:01Z', bandId: '20m', frequencyHz: 14097100, messageText: 'Q9ZZT\u0000JO22 23' }],
      });
    expect(tx.status).toBe(400);
    expect(tx.body.error.fields).toHaveProperty(['transmissions.0.messageText']);
  });
});
