import { registerAs } from '@nestjs/config';

/**
 * Where uploads are kept: STORAGE_DRIVER=local (default: DATA_DIR/uploads on this machine) or s3
 * (an S3-compatible object store every instance shares: S3_BUCKET, and S3_REGION, S3_ENDPOINT,
 * S3_ACCESS_KEY_ID, S3_SECRET_ACCESS_KEY, S3_FORCE_PATH_STYLE, S3_PREFIX as needed).
 */
export const storageConfig = registerAs('storage', () => ({
  driver: (process.env.STORAGE_DRIVER ?? 'local') as 'local' | 's3',
  s3: {
    bucket: process.env.S3_BUCKET ?? '',
    region: process.env.S3_REGION ?? 'us-east-1',
    /** For stores other than AWS (MinIO, Ceph…): their URL, e.g. http://127.0.0.1:9000. */
    endpoint: process.env.S3_ENDPOINT || undefined,
    accessKeyId: process.env.S3_ACCESS_KEY_ID || undefined,
    secretAccessKey: process.env.S3_SECRET_ACCESS_KEY || undefined,
    /** Bucket in the path (http://host/bucket/key) rather than the host name; most non-AWS stores want it. */
    forcePathStyle: process.env.S3_FORCE_PATH_STYLE === 'true',
    /** Prepended to every object key, e.g. `causeway/uploads/`. */
    prefix: process.env.S3_PREFIX ?? '',
  },
}));

export type StorageConfig = ReturnType<typeof storageConfig>;
