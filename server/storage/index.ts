import type { Config } from '../config';
import { localDiskStorage } from './local-disk';
import type { FileStorage } from './storage';

export type { FileStorage } from './storage';

/** Loads the S3 driver on first use: the S3 client is large and most installs keep files on disk. */
function lazyS3Storage(config: Config): FileStorage {
  let driver: Promise<FileStorage> | null = null;
  const load = () =>
    (driver ??= import('./s3').then(({ s3Storage }) =>
      s3Storage({
        endpoint: config.S3_ENDPOINT || undefined,
        region: config.S3_REGION,
        bucket: config.S3_BUCKET,
        accessKeyId: config.S3_ACCESS_KEY_ID,
        secretAccessKey: config.S3_SECRET_ACCESS_KEY,
      }),
    ));
  return {
    put: async (key, body, contentType) => (await load()).put(key, body, contentType),
    get: async (key) => (await load()).get(key),
    delete: async (key) => (await load()).delete(key),
  };
}

export function createStorage(config: Config): FileStorage {
  return config.STORAGE_DRIVER === 's3' ? lazyS3Storage(config) : localDiskStorage(config.UPLOAD_DIR);
}
