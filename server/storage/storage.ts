/** Where uploaded files live. Two drivers: local disk (default) and S3-compatible object storage. */
export type StoredObject = { body: Buffer; contentType: string };

export type FileStorage = {
  put(key: string, body: Buffer, contentType: string): Promise<void>;
  get(key: string): Promise<StoredObject | null>;
  delete(key: string): Promise<void>;
};
