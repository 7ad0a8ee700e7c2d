import { crc32, deflateSync } from 'node:zlib';
import { signedInAgent, startTestServer, truncateAll, validUnit, type TestServer } from './helpers/test-app';

let server: TestServer;
beforeAll(async () => {
  server = await startTestServer();
});
afterAll(() => server.close());
beforeEach(() => truncateAll(server.sequelize));

/** A small PNG file whose header (IHDR, PNG specification §11.2.2) claims width × height RGBA pixels. */
function pngClaiming(width: number, height: number) {
  const chunk = (type: string, data: Buffer) => {
    const body = Buffer.concat([Buffer.from(type, 'latin1'), data]);
    const length = Buffer.alloc(4);
    length.writeUInt32BE(data.length);
    const crc = Buffer.alloc(4);
    crc.writeUInt32BE(crc32(body));
    return Buffer.concat([length, body, crc]);
  };
  const ihdr = Buffer.alloc(13);
  ihdr.writeUInt32BE(width, 0);
  ihdr.writeUInt32BE(height, 4);
  ihdr.set([8, 6, 0, 0, 0], 8); // 8 bits, RGBA, deflate, no filter, no interlace
  const signature = Buffer.from([0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a]);
  return Buffer.concat([signature, chunk('IHDR', ihdr), chunk('IDAT', deflateSync(Buffer.alloc(1024))), chunk('IEND', Buffer.alloc(0))]);
}

describe('photo uploads are bounded', () => {
  it('when a photo claims more than 50 megapixels (16000 × 16000), answers 413 before decoding it and stores nothing', async () => {
    const { agent } = await signedInAgent(server.app);
    const { body: unit } = await agent.post('/api/units').send(validUnit);
    const before = process.memoryUsage().rss;
    const res = await agent
      .post(`/api/units/${unit.id}/photos`)
      .attach('photo', pngClaiming(16_000, 16_000), { filename: 'huge.png', contentType: 'image/png' });
    expect(res.status).toBe(413);
    expect(res.body.error.fields.photo).toMatch(/megapixels/);
    // Decoding would take 1 GB; refusing from the header costs next to nothing.
    expect(process.memoryUsage().rss - before).toBeLessThan(200 * 1024 * 1024);
    expect((await agent.get(`/api/units/${unit.id}`)).body.photos).toEqual([]);
  });
});
