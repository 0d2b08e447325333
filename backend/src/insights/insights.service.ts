import { Injectable, NotFoundException } from '@nestjs/common';
import { InjectRepository } from '@nestjs/typeorm';
import { In, Repository } from 'typeorm';
import type { FieldError, InsightsDto } from '@causeway/shared';
import type { AuthUser } from '../auth/auth-user';
import { CodesService } from '../codes/codes.service';
import { validationFailed } from '../common/validation';
import { JobCode } from '../jobs/entities/job-code.entity';
import { JobStep } from '../jobs/entities/job-step.entity';
import { Job } from '../jobs/entities/job.entity';
import { Part } from '../knowledge/entities/part.entity';
import { Shop } from '../shops/entities/shop.entity';
import { ShopsService } from '../shops/shops.service';
import type { InsightsQueryDto } from './dto/insights.dto';

function average(xs: number[]): number | null {
  return xs.length ? Math.round(xs.reduce((s, x) => s + x, 0) / xs.length) : null;
}

/**
 * A shop's own record: what it sees, how often the first replacement fixed the fault, what
 * resolving cost against what the fix path expected at opening, and the parts replaced in vain.
 */
@Injectable()
export class InsightsService {
  constructor(
    @InjectRepository(Job) private readonly jobs: Repository<Job>,
    @InjectRepository(JobCode) private readonly jobCodes: Repository<JobCode>,
    @InjectRepository(JobStep) private readonly steps: Repository<JobStep>,
    @InjectRepository(Part) private readonly parts: Repository<Part>,
    @InjectRepository(Shop) private readonly shopRepo: Repository<Shop>,
    private readonly shops: ShopsService,
    private readonly codes: CodesService,
  ) {}

  async insights(user: AuthUser, q: InsightsQueryDto): Promise<InsightsDto> {
    const shop = await this.shopFor(user, q.shopId);
    const errors: FieldError[] = [];
    const from = q.from ? new Date(q.from) : null;
    const to = q.to ? new Date(/^\d{4}-\d{2}-\d{2}$/.test(q.to) ? new Date(q.to).getTime() + 86_400_000 - 1 : q.to) : null;
    if (from && to && from.getTime() > to.getTime()) errors.push({ field: 'to', message: 'must not be before from' });
    if (errors.length) throw validationFailed(errors);

    const qb = this.jobs.createQueryBuilder('j').where('j.shopId = :shopId', { shopId: shop.id });
    if (from) qb.andWhere('j.openedAt >= :from', { from });
    if (to) qb.andWhere('j.openedAt <= :to', { to });
    const jobs = await qb.getMany();
    const ids = jobs.map((j) => j.id);
    const codes = ids.length ? await this.jobCodes.find({ where: { jobId: In(ids) }, order: { position: 'ASC' } }) : [];
    const steps = ids.length ? await this.steps.find({ where: { jobId: In(ids) }, order: { sequence: 'ASC' } }) : [];
    const stepsOf = new Map<string, JobStep[]>(ids.map((id) => [id, []]));
    for (const s of steps) stepsOf.get(s.jobId)!.push(s);
    const codesOf = new Map<string, JobCode[]>(ids.map((id) => [id, []]));
    for (const c of codes) codesOf.get(c.jobId)!.push(c);

    // Jobs by code.
    const byCode = new Map<string, { jobs: number; open: number; resolved: number; unresolved: number }>();
    for (const j of jobs) {
      for (const c of codesOf.get(j.id)!) {
        const row = byCode.get(c.code) ?? { jobs: 0, open: 0, resolved: 0, unresolved: 0 };
        row.jobs += 1;
        if (j.status === 'open') row.open += 1;
        else if (j.resolution === 'resolved') row.resolved += 1;
        else row.unresolved += 1;
        byCode.set(c.code, row);
      }
    }
    const titles = new Map<string, string | null>();
    for (const code of byCode.keys()) titles.set(code, (await this.codes.findEntry(code))?.title ?? null);
    const jobsByCode = [...byCode.entries()]
      .map(([code, r]) => ({ code, title: titles.get(code) ?? null, ...r }))
      .sort((a, b) => b.jobs - a.jobs || a.code.localeCompare(b.code));

    // First-time fix: resolved jobs whose first replacement cleared the code.
    const resolved = jobs.filter((j) => j.status === 'closed' && j.resolution === 'resolved');
    let withReplacement = 0;
    let firstTime = 0;
    for (const j of resolved) {
      const first = stepsOf.get(j.id)!.find((s) => s.kind === 'replace');
      if (!first) continue;
      withReplacement += 1;
      if (first.result === 'cleared') firstTime += 1;
    }

    // Cost to resolve against the fix path's expected cost at opening, overall and by the job's first code.
    const costed = resolved.filter((j) => j.expectedCostMinor !== null);
    const actualOf = (j: Job) => stepsOf.get(j.id)!.reduce((s, x) => s + x.actualCostMinor, 0);
    const perCode = new Map<string, { actual: number[]; expected: number[] }>();
    for (const j of costed) {
      const primary = codesOf.get(j.id)![0]?.code;
      if (!primary) continue;
      const row = perCode.get(primary) ?? { actual: [], expected: [] };
      row.actual.push(actualOf(j));
      row.expected.push(j.expectedCostMinor!);
      perCode.set(primary, row);
    }

    // Parts replaced where the code came back; a step's cost is shared equally between its parts.
    const wasted = new Map<string, { times: number; cost: number }>();
    for (const s of steps) {
      if (s.kind !== 'replace' || s.result !== 'came-back') continue;
      for (const p of s.parts) {
        const row = wasted.get(p) ?? { times: 0, cost: 0 };
        row.times += 1;
        row.cost += s.actualCostMinor / s.parts.length;
        wasted.set(p, row);
      }
    }
    const labels = wasted.size ? new Map((await this.parts.find({ where: { key: In([...wasted.keys()]) } })).map((p) => [p.key, p.name])) : new Map<string, string>();

    return {
      currency: shop.currency,
      from: from?.toISOString() ?? null,
      to: to?.toISOString() ?? null,
      jobsByCode,
      firstTimeFix: { resolvedJobs: withReplacement, firstTimeFixed: firstTime, rate: withReplacement ? firstTime / withReplacement : null },
      costToResolve: {
        jobs: costed.length,
        averageActualMinor: average(costed.map(actualOf)),
        averageExpectedMinor: average(costed.map((j) => j.expectedCostMinor!)),
        byCode: [...perCode.entries()]
          .map(([code, r]) => ({ code, jobs: r.actual.length, averageActualMinor: average(r.actual)!, averageExpectedMinor: average(r.expected)! }))
          .sort((a, b) => b.jobs - a.jobs || a.code.localeCompare(b.code)),
      },
      replacedWithoutFix: [...wasted.entries()]
        .map(([part, r]) => ({ part, label: labels.get(part) ?? part, times: r.times, costMinor: Math.round(r.cost) }))
        .sort((a, b) => b.times - a.times || b.costMinor - a.costMinor || a.part.localeCompare(b.part)),
    };
  }

  /** The caller's shop; an admin may name any shop (and must, without one of their own). */
  private async shopFor(user: AuthUser, shopId: string | undefined): Promise<Shop> {
    if (user.role === 'admin' && shopId) {
      const shop = await this.shopRepo.findOne({ where: { id: shopId } });
      if (!shop) throw new NotFoundException('Shop not found');
      return shop;
    }
    if (user.role === 'admin' && !user.shopId) throw validationFailed([{ field: 'shopId', message: 'is required: your account has no shop of its own' }]);
    if (shopId && shopId !== user.shopId) throw new NotFoundException('Shop not found');
    return this.shops.shopOf(user);
  }
}
