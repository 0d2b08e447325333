import { DeleteObjectCommand, GetObjectCommand, NoSuchKey, PutObjectCommand, S3Client, type S3ClientConfig } from '@aws-sdk/client-s3';
import { Injectable } from '@nestjs/common';
import { StorageService, checkKey } from './storage.service';
import type { StorageConfig } from './storage.config';

/**
 * Uploads in an S3-compatible object store (AWS S3, or any store speaking its API: MinIO, Ceph,
 * Garage, a cloud provider's), through the AWS SDK. Every app instance sees the same objects.
 * Objects are `<S3_PREFIX><32 hex characters>` in S3_BUCKET; the bucket must exist and stay
 * private — files are only ever served through the API, which checks who may read them.
 */
@Injectable()
export class S3Storage extends StorageService {
  readonly client: S3Client;
  readonly bucket: string;
  private readonly prefix: string;

  constructor(config: StorageConfig) {
    super();
    if (!config.s3.bucket) throw new Error('Invalid environment:\nS3_BUCKET: must be set when STORAGE_DRIVER=s3');
    this.bucket = config.s3.bucket;
    this.prefix = config.s3.prefix;
    const options: S3ClientConfig = {
      region: config.s3.region,
      forcePathStyle: config.s3.forcePathStyle,
    };
    if (config.s3.endpoint) {
      options.endpoint = config.s3.endpoint;
      // Other S3-compatible stores do not all accept the SDK's default extra checksums.
      options.requestChecksumCalculation = 'WHEN_REQUIRED';
      options.responseChecksumValidation = 'WHEN_REQUIRED';
    }
    // Without keys the SDK's default chain applies (environment, shared config, instance role).
    if (config.s3.accessKeyId && config.s3.secretAccessKey) {
      options.credentials = { accessKeyId: config.s3.accessKeyId, secretAccessKey: config.s3.secretAccessKey };
    }
    this.client = new S3Client(options);
  }

  private objectKey(key: string): string {
    checkKey(key);
    return `${this.prefix}${key}`;
  }

  async put(key: string, data: Buffer): Promise<void> {
    await this.client.send(new PutObjectCommand({ Bucket: this.bucket, Key: this.objectKey(key), Body: data, ContentLength: data.length, ContentType: 'application/octet-stream' }));
  }

  async get(key: string): Promise<Buffer | null> {
    try {
      const res = await this.client.send(new GetObjectCommand({ Bucket: this.bucket, Key: this.objectKey(key) }));
      if (!res.Body) return null;
      return Buffer.from(await res.Body.transformToByteArray());
    } catch (err) {
      if (err instanceof NoSuchKey || (err as { name?: string }).name === 'NoSuchKey' || (err as { $metadata?: { httpStatusCode?: number } }).$metadata?.httpStatusCode === 404) return null;
      throw err;
    }
  }

  async delete(key: string): Promise<void> {
    // S3 answers a delete of a missing object with success too.
    await this.client.send(new DeleteObjectCommand({ Bucket: this.bucket, Key: this.objectKey(key) }));
  }

  onModuleDestroy(): void {
    this.client.destroy();
  }
}
