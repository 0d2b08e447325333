import { Injectable } from '@nestjs/common';
import { InjectDataSource } from '@nestjs/typeorm';
import { DataSource, type EntityManager } from 'typeorm';
import { CacheVersion } from './cache-version.entity';

export type CacheName = 'knowledge';

interface Entry<T> {
  version: number;
  value: T;
}

const MAX_ENTRIES = 2000;

/**
 * Results derived from the knowledge base (likelihoods, fix paths) are costly to compute
 * and read far more often than the knowledge base changes. Each value is kept with the
 * version it was computed at; one indexed read of the current version decides whether it
 * is still good. Writers call `bump` inside their own transaction.
 */
@Injectable()
export class VersionedCache {
  private readonly entries = new Map<string, Entry<unknown>>();

  constructor(@InjectDataSource() private readonly dataSource: DataSource) {}

  async version(name: CacheName, em: EntityManager = this.dataSource.manager): Promise<number> {
    const row = await em.getRepository(CacheVersion).findOne({ where: { name } });
    return row?.version ?? 0;
  }

  async bump(name: CacheName, em: EntityManager = this.dataSource.manager): Promise<void> {
    const updated = await em.createQueryBuilder().update(CacheVersion).set({ version: () => 'version + 1' }).where('name = :name', { name }).execute();
    if (!updated.affected) await em.getRepository(CacheVersion).save({ name, version: 1 });
  }

  /** The cached value for `key` at the current version, or a freshly computed one. */
  async get<T>(name: CacheName, key: string, compute: () => Promise<T>): Promise<T> {
    const version = await this.version(name);
    const fullKey = `${name}|${key}`;
    const hit = this.entries.get(fullKey) as Entry<T> | undefined;
    if (hit && hit.version === version) return hit.value;
    const value = await compute();
    if (this.entries.size >= MAX_ENTRIES) this.entries.delete(this.entries.keys().next().value as string);
    this.entries.set(fullKey, { version, value });
    return value;
  }
}
