import { Injectable, Logger } from '@nestjs/common';
import { IsNull, type EntityManager } from 'typeorm';
import { parseDtc, validateVin, type CodeStatus, type FreezeFrame, type OutcomeCreditDto, type RecordedOutcomeDto, type StepKind, type StepResult, type VehicleScopeQuery } from '@causeway/shared';
import { JobCode } from '../jobs/entities/job-code.entity';
import { JobStep } from '../jobs/entities/job-step.entity';
import { Job } from '../jobs/entities/job.entity';
import { moneyOf } from '../jobs/jobs.service';
import { Outcome } from '../knowledge/entities/outcome.entity';
import { Part } from '../knowledge/entities/part.entity';
import { KnowledgeService } from '../knowledge/knowledge.service';
import { LikelihoodService } from '../knowledge/likelihood.service';
import type { Shop } from '../shops/entities/shop.entity';
import { User } from '../users/entities/user.entity';
import { Vehicle } from '../vehicles/entities/vehicle.entity';
import { readSeed } from './seed-files';

interface VehicleSeed {
  shop: string;
  vin: string;
  make: string;
  model: string;
  engine: string | null;
  year: number | null;
  plate: string | null;
  odometerKm: number | null;
  ownerName: string | null;
  ownerEmail: string | null;
}

interface JobSeed {
  shop: string;
  vin: string;
  complaint: string;
  openedAt: string;
  codes: Array<{ code: string; status: CodeStatus; freezeFrame: FreezeFrame }>;
  steps: Array<{ at: string; kind: StepKind; parts: string[]; result: StepResult; actualCostMinor: number; notes: string }>;
  closed: null | { at: string; resolution: 'resolved' | 'unresolved'; fixedBy: string[]; notes: string };
  technician: string;
}

function pct(x: number): string {
  return `${Math.round(x * 100)} %`;
}

/**
 * The invented demo vehicles and jobs (seeds/demo/vehicles.json and jobs.json; both files say
 * they are invented), with their steps and how they closed. Runs inside the demo seeding
 * transaction, after the knowledge base.
 *
 * Outcomes: the knowledge seeder already records one outcome per resolved demo job and code
 * (without a job id, since the jobs did not exist yet). Those rows are linked to the job made
 * here and shown on it, never recorded twice; only where none exists is the outcome recorded now.
 */
@Injectable()
export class DemoJobsSeeder {
  private readonly logger = new Logger(DemoJobsSeeder.name);

  constructor(
    private readonly knowledge: KnowledgeService,
    private readonly likelihood: LikelihoodService,
  ) {}

  async run(em: EntityManager, shops: Map<string, Shop>): Promise<void> {
    const vehicles = new Map<string, Vehicle>();
    for (const v of readSeed<VehicleSeed[]>('demo', 'vehicles.json')) {
      const shop = shops.get(v.shop);
      const vin = validateVin(v.vin);
      if (!shop || !vin.valid) throw new Error(`seeds/demo/vehicles.json: ${v.vin}: ${shop ? vin.issues.map((i) => i.message).join('; ') : `unknown shop ${v.shop}`}`);
      const row = await em.save(
        em.create(Vehicle, {
          shopId: shop.id,
          vin: vin.vin,
          make: v.make,
          model: v.model,
          engine: v.engine,
          year: v.year ?? vin.modelYear,
          plate: v.plate,
          odometerKm: v.odometerKm,
          odometerReadAt: v.odometerKm === null ? null : new Date(),
          ownerName: v.ownerName,
          ownerEmail: v.ownerEmail,
        }),
      );
      vehicles.set(`${v.shop}|${vin.vin}`, row);
    }

    const seeds = readSeed<JobSeed[]>('demo', 'jobs.json');
    let linked = 0;
    let recorded = 0;
    // In the order the jobs closed, as the knowledge seeder recorded their outcomes.
    const order = [...seeds.keys()].sort((a, b) => (seeds[a].closed?.at ?? '~').localeCompare(seeds[b].closed?.at ?? '~') || seeds[a].openedAt.localeCompare(seeds[b].openedAt));
    for (const i of order) {
      const s = seeds[i];
      const shop = shops.get(s.shop);
      const vehicle = vehicles.get(`${s.shop}|${s.vin}`);
      const tech = await em.getRepository(User).findOne({ where: { emailNormalized: s.technician.toLowerCase() } });
      if (!shop || !vehicle || !tech) throw new Error(`seeds/demo/jobs.json: job on ${s.vin} names an unknown shop, vehicle or technician`);
      const scope: VehicleScopeQuery = { make: vehicle.make, model: vehicle.model, ...(vehicle.engine ? { engine: vehicle.engine } : {}), ...(vehicle.year !== null ? { year: vehicle.year } : {}) };
      const codes = s.codes.map((c) => {
        const parsed = parseDtc(c.code);
        if (!parsed.ok) throw new Error(`seeds/demo/jobs.json: ${c.code}: ${parsed.error.message}`);
        return { ...c, code: parsed.value.code, display: parsed.value.display };
      });
      const listed = new Map<string, Set<string>>();
      for (const c of codes) listed.set(c.code, new Set((await this.likelihood.likelihoods(c.code, scope, em)).byKey.keys()));

      const expected: Array<number | null> = [];
      for (const c of codes) expected.push(await this.expectedCost(c.code, scope, shop));
      const known = expected.filter((e): e is number => e !== null);

      const job = await em.save(
        em.create(Job, {
          shopId: shop.id,
          vehicleId: vehicle.id,
          complaint: s.complaint,
          technicianId: tech.id,
          status: s.closed ? 'closed' : 'open',
          resolution: s.closed?.resolution ?? null,
          odometerKm: vehicle.odometerKm,
          expectedCostMinor: known.length ? known.reduce((a, b) => a + b, 0) : null,
          openedAt: new Date(s.openedAt),
          closedAt: s.closed ? new Date(s.closed.at) : null,
          verificationPassed: s.closed?.resolution === 'resolved' ? true : null,
          closeNotes: s.closed?.notes ?? null,
          createdById: tech.id,
        }),
      );
      const jobCodes = await em.save(codes.map((c, k) => em.create(JobCode, { jobId: job.id, position: k, code: c.code, display: c.display, status: c.status, freezeFrame: c.freezeFrame ?? {}, expectedCostMinor: expected[k], outcome: null })));
      await em.save(
        s.steps.map((st, k) =>
          em.create(JobStep, {
            jobId: job.id,
            sequence: k + 1,
            // The step belongs to the first code whose possible causes include its parts.
            code: codes.find((c) => st.parts.every((p) => listed.get(c.code)!.has(p)))?.code ?? codes[0].code,
            kind: st.kind,
            parts: st.parts,
            result: st.result,
            actualCostMinor: st.actualCostMinor,
            notes: st.notes ?? '',
            at: new Date(st.at),
            createdById: tech.id,
          }),
        ),
      );

      if (s.closed?.resolution !== 'resolved' || s.closed.fixedBy.length === 0) continue;
      for (const jc of jobCodes) {
        // A code none of whose possible causes was replaced (P0300 beside P0301) went with the other's fix: no outcome.
        if (!s.closed.fixedBy.some((p) => listed.get(jc.code)!.has(p))) continue;
        const rows = await em.getRepository(Outcome).find({
          where: { source: 'job', sourceId: IsNull(), code: jc.code, userId: tech.id, shopId: shop.id, make: scope.make ?? IsNull(), model: scope.model ?? IsNull() },
        });
        let outcome: RecordedOutcomeDto;
        if (rows.length > 0) {
          await em.getRepository(Outcome).update(rows.map((r) => r.id), { sourceId: job.id });
          outcome = await this.describe(em, jc.code, rows, s.closed.fixedBy);
          linked += 1;
        } else {
          outcome = await this.likelihood.recordOutcome(em, { source: 'job', sourceId: job.id, userId: tech.id, shopId: shop.id, code: jc.code, vehicle: scope, fixedBy: s.closed.fixedBy });
          recorded += 1;
        }
        await em.update(JobCode, { id: jc.id }, { outcome });
      }
    }
    this.logger.log(`Demo jobs (invented): ${vehicles.size} vehicles, ${seeds.length} jobs; outcomes linked ${linked}, recorded ${recorded}`);
  }

  private async expectedCost(code: string, scope: VehicleScopeQuery, shop: Shop): Promise<number | null> {
    try {
      const fp = await this.knowledge.planForCode(code, scope, moneyOf(shop));
      return fp.plan.stages.length ? Math.round(fp.plan.expectedCost) : null;
    } catch {
      return null;
    }
  }

  /** How already recorded outcome rows credited a fix, in the words the job shows. */
  private async describe(em: EntityManager, code: string, rows: Outcome[], fixedBy: string[]): Promise<RecordedOutcomeDto> {
    const names = new Map((await em.getRepository(Part).find()).map((p) => [p.key, p.name]));
    const listedKeys = new Set(rows.flatMap((r) => (r.causeKey ? [r.causeKey] : [])));
    const credits: OutcomeCreditDto[] = rows.map((r) => ({ causeKey: r.causeKey, parts: r.causeKey ? [r.causeKey] : fixedBy.filter((p) => !listedKeys.has(p)), weight: r.weight }));
    const name = (c: OutcomeCreditDto) => (c.causeKey === null ? 'a cause not listed' : (names.get(c.causeKey) ?? c.causeKey));
    const shared = credits.length > 1;
    const summary = shared
      ? `${code}: the fix was shared between the parts replaced together, by their current likelihoods: ${credits.map((c) => `${pct(c.weight)} to ${name(c)}`).join(', ')}.`
      : `${code}: credited in full to ${name(credits[0])}.`;
    return { code, credits, shared, summary };
  }
}
