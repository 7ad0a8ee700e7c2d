/** The local S3-compatible object store for `npm run cluster` (the same fake the tests use): one bucket, loopback only. */
import { mkdirSync } from 'node:fs';
import S3rver from 's3rver';

const port = Number(process.env.S3_FAKE_PORT ?? 4569);
const directory = process.env.S3_FAKE_DIR ?? '.data/cluster/s3';
const bucket = process.env.S3_BUCKET ?? 'faintline-uploads';
mkdirSync(directory, { recursive: true });

const server = new S3rver({ port, address: '127.0.0.1', directory, silent: true, configureBuckets: [{ name: bucket, configs: [] }] });
server.run().then(
  () => console.log(`[cluster] object storage (S3 fake) on http://127.0.0.1:${port}, bucket ${bucket}`),
  (error: unknown) => {
    console.error('[cluster] object storage did not start:', error);
    process.exit(1);
  },
);
const stop = () => void server.close().finally(() => process.exit(0));
process.on('SIGINT', stop);
process.on('SIGTERM', stop);
