import { Injectable, Logger } from '@nestjs/common';
import type { EntityManager } from 'typeorm';
import { parseDtc, type VehicleScopeQuery } from '@causeway/shared';
import { AddOn } from '../knowledge/entities/addon.entity';
import { ExchangeRate } from '../knowledge/entities/exchange-rate.entity';
import { Part } from '../knowledge/entities/part.entity';
import { PossibleCause } from '../knowledge/entities/possible-cause.entity';
import { Teardown } from '../knowledge/entities/teardown.entity';
import { LikelihoodService } from '../knowledge/likelihood.service';
import type { Shop } from '../shops/entities/shop.entity';
import { User } from '../users/entities/user.entity';
import { readSeed } from './seed-files';

interface Scope { make: string | null; model: string | null; engine: string | null; yearFrom: number | null; yearTo: number | null }
interface PartSeed { key: string; name: string; system: string }
interface TeardownSeed extends Scope { key: string; name: string; hours: number; cautions: string[] }
interface CauseSeed extends Scope {
  code: string;
  part: string;
  prior: number;
  partCostMinor: number;
  currency: string;
  replaceHours: number;
  teardown: string | null;
  check: { description: string; hours: number; mustPrecede: boolean } | null;
}
interface AddOnSeed extends Scope { key: string; label: string; teardown: string; partCostMinor: number; currency: string; hours: number }
interface RatesSeed { _note?: string; base: string; rates: Record<string, number> }
interface VehicleSeed { shop: string; vin: string; make: string; model: string; engine: string; year: number }
interface JobSeed {
  shop: string;
  vin: string;
  technician: string;
  codes: Array<{ code: string }>;
  closed: null | { at: string; resolution: 'resolved' | 'unresolved'; fixedBy: string[] };
}

function scopeOf(s: Scope): Scope {
  return { make: s.make, model: s.model, engine: s.engine, yearFrom: s.yearFrom, yearTo: s.yearTo };
}

/**
 * The invented demo knowledge base (seeds/knowledge, every file says it is invented) and
 * the outcomes of the resolved demo jobs, so the demo likelihoods have evidence. Only with
 * demo data, inside the demo seeding transaction.
 */
@Injectable()
export class KnowledgeSeeder {
  private readonly logger = new Logger(KnowledgeSeeder.name);

  constructor(private readonly likelihood: LikelihoodService) {}

  async run(em: EntityManager, shops: Map<string, Shop>): Promise<void> {
    const parts = readSeed<PartSeed[]>('knowledge', 'parts.json');
    await em.getRepository(Part).save(parts.map((p) => em.create(Part, { key: p.key, name: p.name, system: p.system })));

    const teardowns = readSeed<TeardownSeed[]>('knowledge', 'teardowns.json');
    await em.getRepository(Teardown).save(teardowns.map((t) => em.create(Teardown, { key: t.key, name: t.name, hours: t.hours, cautions: t.cautions, ...scopeOf(t) })));

    const causes = readSeed<CauseSeed[]>('knowledge', 'causes.json');
    const causeRows = causes.map((c) => {
      const parsed = parseDtc(c.code);
      if (!parsed.ok) throw new Error(`seeds/knowledge/causes.json: ${c.code}: ${parsed.error.message}`);
      return em.create(PossibleCause, {
        code: parsed.value.code,
        partKey: c.part,
        prior: c.prior,
        partCostMinor: c.partCostMinor,
        currency: c.currency,
        replaceHours: c.replaceHours,
        teardownKey: c.teardown,
        checkDescription: c.check?.description ?? '',
        checkHours: c.check?.hours ?? null,
        checkMustPrecede: c.check?.mustPrecede ?? false,
        ...scopeOf(c),
      });
    });
    for (let i = 0; i < causeRows.length; i += 100) await em.getRepository(PossibleCause).save(causeRows.slice(i, i + 100));

    const addOns = readSeed<AddOnSeed[]>('knowledge', 'addons.json');
    await em.getRepository(AddOn).save(addOns.map((a) => em.create(AddOn, { key: a.key, label: a.label, teardownKey: a.teardown, partCostMinor: a.partCostMinor, currency: a.currency, hours: a.hours, ...scopeOf(a) })));

    const rates = readSeed<RatesSeed>('knowledge', 'exchange-rates.json');
    const asOf = /\d{4}-\d{2}-\d{2}/.exec(rates._note ?? '')?.[0] ?? new Date().toISOString().slice(0, 10);
    await em.getRepository(ExchangeRate).save(Object.entries(rates.rates).map(([currency, perBase]) => em.create(ExchangeRate, { currency, perBase, base: rates.base, asOf })));

    const outcomes = await this.demoOutcomes(em, shops);
    this.logger.log(`Knowledge base (invented demo data): ${parts.length} parts, ${teardowns.length} teardowns, ${causeRows.length} possible causes, ${addOns.length} add-ons; ${outcomes} outcomes from resolved demo jobs`);
  }

  /**
   * One outcome per resolved demo job and code, in the order the jobs closed. A code none of
   * whose possible causes was replaced (P0300 set alongside P0301 and cleared by the same
   * coil) is a consequence of the other code and is not counted against its list.
   */
  private async demoOutcomes(em: EntityManager, shops: Map<string, Shop>): Promise<number> {
    const vehicles = new Map(readSeed<VehicleSeed[]>('demo', 'vehicles.json').map((v) => [v.vin, v]));
    const jobs = readSeed<JobSeed[]>('demo', 'jobs.json')
      .filter((j) => j.closed?.resolution === 'resolved' && j.closed.fixedBy.length > 0)
      .sort((a, b) => a.closed!.at.localeCompare(b.closed!.at));
    let count = 0;
    for (const job of jobs) {
      const v = vehicles.get(job.vin);
      const user = await em.getRepository(User).findOne({ where: { emailNormalized: job.technician.toLowerCase() } });
      if (!v || !user) throw new Error(`seeds/demo/jobs.json: job on ${job.vin} names an unknown vehicle or technician`);
      const vehicle: VehicleScopeQuery = { make: v.make, model: v.model, engine: v.engine, year: v.year };
      for (const { code } of job.codes) {
        const lik = await this.likelihood.likelihoods(code, vehicle, em);
        if (!job.closed!.fixedBy.some((k) => lik.byKey.has(k))) continue;
        await this.likelihood.recordOutcome(em, { source: 'job', sourceId: null, userId: user.id, shopId: shops.get(job.shop)?.id ?? null, code, vehicle, fixedBy: job.closed!.fixedBy });
        count += 1;
      }
    }
    return count;
  }
}
