import { Injectable } from '@nestjs/common';
import { InjectRepository } from '@nestjs/typeorm';
import { Brackets, Repository, type EntityManager } from 'typeorm';
import type { AuditEntryDto, Page } from '@causeway/shared';
import type { AuthUser } from '../auth/auth-user';
import type { AuditQuery } from './dto/audit-query.dto';
import { AuditEntry } from './entities/audit-entry.entity';
import { VersionedCache } from '../common/cache/versioned-cache.service';

/** Who made a change; `null` id for the system itself (seeding, imports). */
export type AuditActor = Pick<AuthUser, 'id' | 'email'> | { id: null; email: string };

export interface AuditRecord {
  action: string;
  entityType: string;
  entityId: string;
  before?: unknown;
  after?: unknown;
  note?: string | null;
}

/** The system as an actor, for changes no person made (the demo loader). */
export const SYSTEM_ACTOR: AuditActor = { id: null, email: 'system' };

export function toAuditDto(e: AuditEntry): AuditEntryDto {
  return {
    id: e.id,
    at: e.at.toISOString(),
    actorId: e.actorId,
    actorEmail: e.actorEmail,
    action: e.action,
    entityType: e.entityType,
    entityId: e.entityId,
    before: e.before ?? null,
    after: e.after ?? null,
    note: e.note,
  };
}

function likeEscape(s: string): string {
  return s.replace(/[\\%_]/g, (c) => `\\${c}`);
}

/** A date-only bound (`2026-11-30`) as `to` means up to the end of that day (UTC). */
function upperBound(to: string): Date {
  const d = new Date(to);
  return /^\d{4}-\d{2}-\d{2}$/.test(to) ? new Date(d.getTime() + 86_400_000 - 1) : d;
}

/**
 * The audit log. `record` takes the caller's transaction manager: the entry is written in
 * the same transaction as the change it describes, so it exists if and only if the change does.
 */
@Injectable()
export class AuditService {
  constructor(
    @InjectRepository(AuditEntry) private readonly entries: Repository<AuditEntry>,
    private readonly cache: VersionedCache,
  ) {}

  /**
   * Every audited change is a change to the knowledge base or to what it learned from, so
   * it also marks cached likelihoods and fix paths stale, in the same transaction.
   */
  async record(em: EntityManager, actor: AuditActor, entry: AuditRecord): Promise<AuditEntry> {
    await this.cache.bump('knowledge', em);
    const repo = em.getRepository(AuditEntry);
    return repo.save(
      repo.create({
        at: new Date(),
        actorId: actor.id,
        actorEmail: actor.email,
        action: entry.action,
        entityType: entry.entityType,
        entityId: entry.entityId,
        before: entry.before ?? null,
        after: entry.after ?? null,
        note: entry.note ?? null,
      }),
    );
  }

  async browse(q: AuditQuery): Promise<Page<AuditEntryDto>> {
    const qb = this.entries.createQueryBuilder('a');
    if (q.actor) {
      const actor = q.actor.trim();
      qb.andWhere(
        new Brackets((w) => w.where('a.actorId = :actorId', { actorId: actor }).orWhere("LOWER(a.actorEmail) LIKE :actorEmail ESCAPE '\\'", { actorEmail: `%${likeEscape(actor.toLowerCase())}%` })),
      );
    }
    if (q.action) {
      // `cause.` (ending in a dot) matches every action on causes.
      if (q.action.endsWith('.')) qb.andWhere("a.action LIKE :action ESCAPE '\\'", { action: `${likeEscape(q.action)}%` });
      else qb.andWhere('a.action = :action', { action: q.action });
    }
    if (q.entityType) qb.andWhere('a.entityType = :entityType', { entityType: q.entityType });
    if (q.entityId) qb.andWhere('a.entityId = :entityId', { entityId: q.entityId });
    if (q.from) qb.andWhere('a.at >= :from', { from: new Date(q.from) });
    if (q.to) qb.andWhere('a.at <= :to', { to: upperBound(q.to) });
    qb.orderBy('a.at', 'DESC').addOrderBy('a.id', 'ASC');
    qb.skip((q.page - 1) * q.pageSize).take(q.pageSize);
    const [rows, total] = await qb.getManyAndCount();
    return { items: rows.map(toAuditDto), total, page: q.page, pageSize: q.pageSize };
  }

  /** Entries about one entity, newest first (for the review desk and tests). */
  async forEntity(entityType: string, entityId: string, em: EntityManager = this.entries.manager): Promise<AuditEntryDto[]> {
    const rows = await em.getRepository(AuditEntry).find({ where: { entityType, entityId }, order: { at: 'DESC' } });
    return rows.map(toAuditDto);
  }
}
