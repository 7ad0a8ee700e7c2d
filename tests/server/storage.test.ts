import { mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import path from 'node:path';
import S3rver from 's3rver';
import { localDiskStorage } from '@/server/storage/local-disk';
import { s3Storage } from '@/server/storage/s3';
import type { FileStorage } from '@/server/storage';

// The same contract for both drivers; the S3 driver runs against a local fake S3 server.
const folder = mkdtempSync(path.join(process.env.TMPDIR ?? tmpdir(), 'faintline-storage-'));
let fakeS3: S3rver;
let s3Port = 0;

beforeAll(async () => {
  fakeS3 = new S3rver({
    port: 0,
    address: '127.0.0.1',
    silent: true,
    directory: path.join(folder, 's3'),
    configureBuckets: [{ name: 'faintline-test', configs: [] }],
  });
  const address = (await fakeS3.run()) as unknown as { port: number };
  s3Port = address.port;
});
afterAll(async () => {
  await fakeS3.close();
  rmSync(folder, { recursive: true, force: true });
});

const drivers: [string, () => FileStorage][] = [
  ['local disk', () => localDiskStorage(path.join(folder, 'disk'))],
  [
    'S3-compatible',
    () =>
      s3Storage({
        endpoint: `http://127.0.0.1:${s3Port}`,
        region: 'us-east-1',
        bucket: 'faintline-test',
        accessKeyId: 'S3RVER',
        secretAccessKey: 'S3RVER',
      }),
  ],
];

describe.each(drivers)('file storage on %s', (_name, make) => {
  it('when a file is put, gives back the same bytes and type, then nothing after delete', async () => {
    const storage = make();
    const body = Buffer.from([0x89, 0x50, 0x4e, 0x47, 1, 2, 3, 4]);
    await storage.put('units/7/abc.png', body, 'image/png');
    const got = await storage.get('units/7/abc.png');
    expect(got?.contentType).toBe('image/png');
    expect(got?.body.equals(body)).toBe(true);
    await storage.delete('units/7/abc.png');
    expect(await storage.get('units/7/abc.png')).toBeNull();
  });

  it('when a key was never written, answers null', async () => {
    expect(await make().get('units/1/missing.webp')).toBeNull();
  });
});

describe('local disk storage', () => {
  it('when a key tries to leave the upload folder, refuses it', async () => {
    await expect(localDiskStorage(path.join(folder, 'disk')).put('../escape.txt', Buffer.from('x'), 'text/plain')).rejects.toThrow(
      /escapes/,
    );
  });
});

describe('unit photos through the S3 driver', () => {
  it('when the server is configured for S3, an uploaded photo is stored there and served back', async () => {
    const sharp = (await import('sharp')).default;
    const { signedInAgent, startTestServer, truncateAll, validUnit } = await import('./helpers/test-app');
    const server = await startTestServer({
      STORAGE_DRIVER: 's3',
      S3_ENDPOINT: `http://127.0.0.1:${s3Port}`,
      S3_BUCKET: 'faintline-test',
      S3_ACCESS_KEY_ID: 'S3RVER',
      S3_SECRET_ACCESS_KEY: 'S3RVER',
    });
    try {
      await truncateAll(server.sequelize);
      const { agent } = await signedInAgent(server.app);
      const { body: unit } = await agent.post('/api/units').send(validUnit);
      const png = await sharp({ create: { width: 40, height: 30, channels: 3, background: '#335566' } })
        .png()
        .toBuffer();
      const up = await agent.post(`/api/units/${unit.id}/photos`).attach('photo', png, { filename: 'a.png', contentType: 'image/png' });
      expect(up.status).toBe(201);
      const stored = s3Storage({
        endpoint: `http://127.0.0.1:${s3Port}`,
        region: 'us-east-1',
        bucket: 'faintline-test',
        accessKeyId: 'S3RVER',
        secretAccessKey: 'S3RVER',
      });
      const { UnitPhotoModel } = await import('@/server/db/models/unit-photo.model');
      const row = await UnitPhotoModel.findByPk(up.body.id);
      expect((await stored.get(row!.thumbKey))?.contentType).toBe('image/webp');
      const served = await agent.get(up.body.url);
      expect(served.status).toBe(200);
      expect(served.headers['content-type']).toBe('image/png');
    } finally {
      await server.close();
    }
  });
});
