import type { Config } from '../config';
import { localDiskStorage } from './local-disk';
import type { FileStorage } from './storage';

export type { FileStorage } from './storage';

export function createStorage(config: Config): FileStorage {
  if (config.STORAGE_DRIVER === 's3') {
    // Loaded only when used: the S3 client is large and most installs keep files on disk.
    const { s3Storage } = require('./s3') as typeof import('./s3');
    return s3Storage({
      endpoint: config.S3_ENDPOINT || undefined,
      region: config.S3_REGION,
      bucket: config.S3_BUCKET,
      accessKeyId: config.S3_ACCESS_KEY_ID,
      secretAccessKey: config.S3_SECRET_ACCESS_KEY,
    });
  }
  return localDiskStorage(config.UPLOAD_DIR);
}
