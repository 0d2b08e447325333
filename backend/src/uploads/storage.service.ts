import { Inject, Injectable } from '@nestjs/common';
import { randomBytes } from 'node:crypto';
import { mkdirSync } from 'node:fs';
import { readFile, rm, writeFile } from 'node:fs/promises';
import { join } from 'node:path';
import { appConfig, type AppConfig } from '../config/configuration';
import { storageConfig, type StorageConfig } from './storage.config';

/**
 * Where uploaded files live, by opaque key. The local-disk driver below is the default; the
 * S3-compatible object-store driver (storage-s3.ts) implements the same three calls and is chosen
 * with STORAGE_DRIVER=s3 (see storageDriver below).
 */
export abstract class StorageService {
  /** A new random key: never derived from anything the user sent. */
  newKey(): string {
    return randomBytes(16).toString('hex');
  }

  abstract put(key: string, data: Buffer): Promise<void>;
  /** The stored bytes, or null when there is nothing under the key. */
  abstract get(key: string): Promise<Buffer | null>;
  /** Removes the object; removing a missing one is not an error. */
  abstract delete(key: string): Promise<void>;
}

const KEY = /^[0-9a-f]{32}$/;

export function checkKey(key: string): void {
  // Keys are only ever made by newKey(); anything else must never reach the file system.
  if (!KEY.test(key)) throw new Error('Invalid storage key');
}

/** Files under DATA_DIR/uploads/<32 hex characters>, readable by the server's user only. */
@Injectable()
export class LocalDiskStorage extends StorageService {
  readonly root: string;

  constructor(@Inject(appConfig.KEY) config: AppConfig) {
    super();
    this.root = join(config.dataDir, 'uploads');
    mkdirSync(this.root, { recursive: true, mode: 0o700 });
  }

  async put(key: string, data: Buffer): Promise<void> {
    checkKey(key);
    // 'wx': never overwrite (a key collision would be a bug, not something to paper over).
    await writeFile(join(this.root, key), data, { flag: 'wx', mode: 0o600 });
  }

  async get(key: string): Promise<Buffer | null> {
    checkKey(key);
    try {
      return await readFile(join(this.root, key));
    } catch (err) {
      if ((err as NodeJS.ErrnoException).code === 'ENOENT') return null;
      throw err;
    }
  }

  async delete(key: string): Promise<void> {
    checkKey(key);
    await rm(join(this.root, key), { force: true });
  }
}

/** The provider of StorageService: the driver STORAGE_DRIVER names (local disk by default). */
export const storageProvider = {
  provide: StorageService,
  inject: [appConfig.KEY, storageConfig.KEY],
  useFactory: async (app: AppConfig, storage: StorageConfig): Promise<StorageService> => {
    if (storage.driver === 's3') {
      const { S3Storage } = await import('./storage-s3');
      return new S3Storage(storage);
    }
    return new LocalDiskStorage(app);
  },
};
