import sharp from 'sharp';
import request from 'supertest';
import { makeClub, signedInAgent, startTestServer, truncateAll, validUnit, type TestServer } from './helpers/test-app';

let server: TestServer;
beforeAll(async () => {
  server = await startTestServer({ UPLOAD_DIR: '.cache/test-uploads' });
});
afterAll(() => server.close());
beforeEach(() => truncateAll(server.sequelize));

const png = (width = 64, height = 48) =>
  sharp({ create: { width, height, channels: 3, background: { r: 20, g: 90, b: 110 } } })
    .png()
    .toBuffer();

describe('POST /api/units', () => {
  it('when an operator registers a valid unit, responds 201 with defaults filled in', async () => {
    const { agent, user } = await signedInAgent(server.app);
    const res = await agent.post('/api/units').send(validUnit);
    expect(res.status).toBe(201);
    expect(res.body).toMatchObject({ name: 'Bench board', ownerId: user.id, referenceHz: 25e6, dutyCycle: 0.5, photos: [] });
    expect(res.body.filters).toHaveLength(2);
  });

  it.each([
    ['tolerancePpm', { tolerancePpm: -5 }, /cannot be negative/],
    ['referenceHz', { referenceHz: 0 }, /at least 1 MHz/],
    ['filters.0.bands.0', { filters: [{ bands: ['11m'], type: 'butterworth', order: 5, cutoffHz: 3e7 }] }, /Use one of/],
    ['name', { name: '' }, /name/],
  ])('when %s is bad, responds 400 naming the field and stores nothing', async (field, change, message) => {
    const { agent } = await signedInAgent(server.app);
    const res = await agent.post('/api/units').send({ ...validUnit, ...change });
    expect(res.status).toBe(400);
    expect(res.body.error.fields[field]).toMatch(message);
    expect((await agent.get('/api/units')).body).toEqual([]);
  });
});

describe('units: ownership and club admins', () => {
  it('when a stranger reads, edits, copies or deletes a unit, responds 404', async () => {
    const owner = await signedInAgent(server.app);
    const { body: unit } = await owner.agent.post('/api/units').send(validUnit);
    const stranger = await signedInAgent(server.app);
    expect((await stranger.agent.get(`/api/units/${unit.id}`)).status).toBe(404);
    expect((await stranger.agent.patch(`/api/units/${unit.id}`).send({ name: 'x' })).status).toBe(404);
    expect((await stranger.agent.post(`/api/units/${unit.id}/copy`)).status).toBe(404);
    expect((await stranger.agent.delete(`/api/units/${unit.id}`)).status).toBe(404);
    expect((await owner.agent.get(`/api/units/${unit.id}`)).body.name).toBe('Bench board');
  });

  it('when the club admin reads a member’s unit, responds 200 but editing responds 403', async () => {
    const member = await signedInAgent(server.app);
    const admin = await signedInAgent(server.app);
    await makeClub('Unit Circle', admin.user.id, [member.user.id]);
    const { body: unit } = await member.agent.post('/api/units').send(validUnit);
    expect((await admin.agent.get(`/api/units/${unit.id}`)).status).toBe(200);
    expect((await admin.agent.patch(`/api/units/${unit.id}`).send({ name: 'Admin edit' })).status).toBe(403);
  });

  it('when the owner copies a unit, a new unit with the same hardware and no serial appears', async () => {
    const { agent } = await signedInAgent(server.app);
    const { body: unit } = await agent.post('/api/units').send(validUnit);
    const copy = await agent.post(`/api/units/${unit.id}/copy`);
    expect(copy.status).toBe(201);
    expect(copy.body).toMatchObject({ name: 'Bench board (copy)', serialLabel: '', filters: unit.filters, referenceHz: unit.referenceHz });
    expect(copy.body.id).not.toBe(unit.id);
  });

  it('when the owner patches one field, the rest is kept', async () => {
    const { agent } = await signedInAgent(server.app);
    const { body: unit } = await agent.post('/api/units').send(validUnit);
    const res = await agent.patch(`/api/units/${unit.id}`).send({ attenuatorDb: 6 });
    expect(res.status).toBe(200);
    expect(res.body).toMatchObject({ attenuatorDb: 6, filters: unit.filters, name: 'Bench board' });
  });
});

describe('unit photos', () => {
  it('when the owner uploads a PNG, it is listed with a thumbnail, readable by the club admin, and deletable', async () => {
    const member = await signedInAgent(server.app);
    const admin = await signedInAgent(server.app);
    await makeClub('Photo Circle', admin.user.id, [member.user.id]);
    const { body: unit } = await member.agent.post('/api/units').send(validUnit);
    const up = await member.agent
      .post(`/api/units/${unit.id}/photos`)
      .attach('photo', await png(800, 600), { filename: 'board.png', contentType: 'image/png' });
    expect(up.status).toBe(201);
    expect(up.body.contentType).toBe('image/png');

    const listed = (await member.agent.get(`/api/units/${unit.id}`)).body.photos;
    expect(listed).toHaveLength(1);
    const thumb = await admin.agent.get(listed[0].thumbUrl);
    expect(thumb.status).toBe(200);
    expect(thumb.headers['content-type']).toBe('image/webp');
    const meta = await sharp(thumb.body).metadata();
    expect([meta.width, meta.height]).toEqual([320, 240]);

    const stranger = await signedInAgent(server.app);
    expect((await stranger.agent.get(listed[0].url)).status).toBe(404);
    expect((await admin.agent.delete(listed[0].url)).status).toBe(403);
    expect((await member.agent.delete(listed[0].url)).status).toBe(204);
    expect((await member.agent.get(listed[0].url)).status).toBe(404);
  });

  it('when the photo is over 5 MB, responds 413', async () => {
    const { agent } = await signedInAgent(server.app);
    const { body: unit } = await agent.post('/api/units').send(validUnit);
    const big = Buffer.alloc(7 * 1024 * 1024, 1);
    const res = await agent.post(`/api/units/${unit.id}/photos`).attach('photo', big, { filename: 'big.jpg', contentType: 'image/jpeg' });
    expect(res.status).toBe(413);
    expect(res.body.error.fields.photo).toMatch(/at most 5 MB/);
  });

  it('when the file is text, responds 415 for a text type and 400 for text dressed as PNG', async () => {
    const { agent } = await signedInAgent(server.app);
    const { body: unit } = await agent.post('/api/units').send(validUnit);
    const text = Buffer.from('this is not a picture');
    const plain = await agent
      .post(`/api/units/${unit.id}/photos`)
      .attach('photo', text, { filename: 'notes.txt', contentType: 'text/plain' });
    expect(plain.status).toBe(415);
    const disguised = await agent
      .post(`/api/units/${unit.id}/photos`)
      .attach('photo', text, { filename: 'fake.png', contentType: 'image/png' });
    expect(disguised.status).toBe(400);
    expect(disguised.body.error.fields.photo).toMatch(/JPEG, PNG or WebP/);
    expect((await agent.get(`/api/units/${unit.id}`)).body.photos).toEqual([]);
  });

  it('when a stranger uploads to someone else’s unit, responds 404', async () => {
    const owner = await signedInAgent(server.app);
    const { body: unit } = await owner.agent.post('/api/units').send(validUnit);
    const stranger = await signedInAgent(server.app);
    const res = await stranger.agent
      .post(`/api/units/${unit.id}/photos`)
      .attach('photo', await png(), { filename: 'x.png', contentType: 'image/png' });
    expect(res.status).toBe(404);
  });
});

describe('anonymous access to units', () => {
  it.each(['/api/units', '/api/units/1', '/api/units/1/photos/1'])('when anonymous, GET %s responds 401', async (path) => {
    expect((await request(server.app).get(path)).status).toBe(401);
  });
});
