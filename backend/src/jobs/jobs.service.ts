import { ConflictException, HttpException, Injectable, NotFoundException } from '@nestjs/common';
import { InjectDataSource, InjectRepository } from '@nestjs/typeorm';
import { DataSource, In, Repository, type EntityManager } from 'typeorm';
import {
  planFixPath,
  type CautionDto,
  type DtcSystem,
  type FieldError,
  type FixPathDto,
  type FreezeFrame,
  type JobCodeDto,
  type JobDto,
  type JobStepDto,
  type JobSummaryDto,
  type MoneyContext,
  type Page,
  type PlanInput,
  type VehicleScopeQuery,
} from '@causeway/shared';
import type { AuthUser } from '../auth/auth-user';
import { CodesService, parseCodeOr400 } from '../codes/codes.service';
import { defaultCautionsFor } from '../codes/default-cautions';
import { validationFailed } from '../common/validation';
import { Estimate } from '../estimates/entities/estimate.entity';
import { toEstimateSummary } from '../estimates/estimate-mapper';
import { Part } from '../knowledge/entities/part.entity';
import { KnowledgeService } from '../knowledge/knowledge.service';
import { LikelihoodService } from '../knowledge/likelihood.service';
import type { Shop } from '../shops/entities/shop.entity';
import { ShopsService } from '../shops/shops.service';
import { User } from '../users/entities/user.entity';
import { Vehicle } from '../vehicles/entities/vehicle.entity';
import { nextOdometerKm, shownReading } from '../vehicles/odometer';
import { VehiclesService } from '../vehicles/vehicles.service';
import type { CloseJobDto, CreateJobDto, CreateStepDto, JobListQueryDto } from './dto/job.dto';
import { JobCode } from './entities/job-code.entity';
import { JobStep } from './entities/job-step.entity';
import { Job } from './entities/job.entity';
import { codeProgress, type CodeProgress } from './job-progress';

const UUID = /^[0-9a-f]{8}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{12}$/i;
/** A step or opening time may be this far in the future (clock skew between a tablet and the server). */
const FUTURE_SLACK_MS = 5 * 60_000;
const MAX_FREEZE_FRAME_ENTRIES = 60;

export function moneyOf(shop: Shop): MoneyContext {
  return { currency: shop.currency, locale: shop.locale, labourRateMinor: shop.labourRateMinor, taxRateBp: shop.taxRateBp };
}

export function scopeOf(v: Pick<Vehicle, 'make' | 'model' | 'engine' | 'year'>): VehicleScopeQuery {
  return { make: v.make, model: v.model, ...(v.engine ? { engine: v.engine } : {}), ...(v.year !== null ? { year: v.year } : {}) };
}

function closedConflict(): ConflictException {
  return new ConflictException({ statusCode: 409, error: 'Conflict', message: 'This job is closed: it no longer takes steps, estimates or a second close' });
}

function partsList(keys: string[]): string {
  return keys.join(', ');
}

/** Freeze-frame values are short name → number or text pairs; anything else is a 400 naming the entry. */
function checkFreezeFrame(ff: unknown, field: string, errors: FieldError[]): FreezeFrame {
  if (ff === undefined || ff === null) return {};
  if (typeof ff !== 'object' || Array.isArray(ff)) {
    errors.push({ field, message: 'must be an object of name → value' });
    return {};
  }
  const entries = Object.entries(ff as Record<string, unknown>);
  if (entries.length > MAX_FREEZE_FRAME_ENTRIES) errors.push({ field, message: `has more than ${MAX_FREEZE_FRAME_ENTRIES} values` });
  const out: FreezeFrame = {};
  for (const [name, value] of entries) {
    if (name.trim().length === 0 || name.length > 60) errors.push({ field: `${field}.${name}`, message: 'names must be 1–60 characters' });
    else if (typeof value === 'number' && Number.isFinite(value)) out[name.trim()] = value;
    else if (typeof value === 'string' && value.length <= 100) out[name.trim()] = value.trim();
    else errors.push({ field: `${field}.${name}`, message: 'must be a finite number or text of at most 100 characters' });
  }
  return out;
}

/** An ISO 8601 time from a request, not in the future and not before `notBefore`. */
function timeOf(value: string | undefined, field: string, errors: FieldError[], notBefore?: Date): Date {
  if (value === undefined) return new Date();
  const at = new Date(value);
  if (Number.isNaN(at.getTime())) {
    errors.push({ field, message: 'must be an ISO 8601 date-time' });
    return new Date();
  }
  if (at.getTime() > Date.now() + FUTURE_SLACK_MS) errors.push({ field, message: 'must not be in the future' });
  if (notBefore && at.getTime() < notBefore.getTime()) errors.push({ field, message: `must not be before the job was opened (${notBefore.toISOString()})` });
  return at;
}

/** The fix path after a check found `part` at fault: replace it (the teardown opened for the check is still open) and verify. */
export function narrowToFound(fp: FixPathDto, part: string): FixPathDto | null {
  const cause = fp.input.causes.find((c) => c.key === part);
  if (!cause) return null;
  const input: PlanInput = {
    causes: [{ key: cause.key, ...(cause.label !== undefined ? { label: cause.label } : {}), probability: 1, replaceCost: cause.replaceCost, ...(cause.teardown ? { teardown: cause.teardown } : {}) }],
    teardowns: cause.teardown ? { [cause.teardown]: 0 } : {},
    verificationCost: fp.input.verificationCost,
    unlistedProbability: 0,
  };
  return {
    ...fp,
    input,
    plan: planFixPath(input),
    causes: fp.causes.filter((c) => c.key === part).map((c) => ({ ...c, probability: 1 })),
    teardowns: fp.teardowns.filter((t) => t.key === cause.teardown).map((t) => ({ ...t, openCostMinor: 0 })),
    escalation: null,
    addOns: [],
  };
}

interface CodePath {
  progress: CodeProgress;
  fixPath: FixPathDto | null;
  note: string | null;
  state: JobCodeDto['state'];
  title: string | null;
  cautions: CautionDto[];
}

export const JOB_SORT_COLUMNS: Record<JobListQueryDto['sort'], string> = {
  openedAt: 'j.openedAt',
  closedAt: 'j.closedAt',
  updatedAt: 'j.updatedAt',
  status: 'j.status',
};

@Injectable()
export class JobsService {
  constructor(
    @InjectDataSource() private readonly dataSource: DataSource,
    @InjectRepository(Job) private readonly jobs: Repository<Job>,
    @InjectRepository(JobCode) private readonly jobCodes: Repository<JobCode>,
    @InjectRepository(JobStep) private readonly steps: Repository<JobStep>,
    @InjectRepository(User) private readonly users: Repository<User>,
    @InjectRepository(Part) private readonly parts: Repository<Part>,
    @InjectRepository(Estimate) private readonly estimates: Repository<Estimate>,
    private readonly shops: ShopsService,
    private readonly vehicles: VehiclesService,
    private readonly knowledge: KnowledgeService,
    private readonly likelihood: LikelihoodService,
    private readonly codes: CodesService,
  ) {}

  // ------------------------------------------------------------ reading

  /** A job of the shop with its vehicle, technician, codes and steps; another shop's is a 404. */
  async findOwned(shop: Shop, id: string): Promise<Job> {
    const job = UUID.test(id)
      ? await this.jobs.findOne({ where: { id, shopId: shop.id }, relations: { vehicle: true, technician: true, codes: true, steps: { createdBy: true } } })
      : null;
    if (!job) throw new NotFoundException('Job not found');
    job.codes.sort((a, b) => a.position - b.position);
    job.steps.sort((a, b) => a.sequence - b.sequence);
    return job;
  }

  async get(user: AuthUser, id: string): Promise<JobDto> {
    const shop = await this.shops.shopOf(user);
    return this.toDto(await this.findOwned(shop, id), shop);
  }

  async list(user: AuthUser, q: JobListQueryDto): Promise<Page<JobSummaryDto>> {
    const shop = await this.shops.shopOf(user);
    const errors: FieldError[] = [];
    const qb = this.jobs
      .createQueryBuilder('j')
      .leftJoinAndSelect('j.vehicle', 'v')
      .leftJoinAndSelect('j.technician', 't')
      .where('j.shopId = :shopId', { shopId: shop.id });
    if (q.status) qb.andWhere('j.status = :status', { status: q.status });
    if (q.code) {
      const code = parseCodeOr400(q.code, 'code').code;
      qb.andWhere((w) => `j.id IN ${w.subQuery().select('jc.jobId').from(JobCode, 'jc').where('jc.code = :code').getQuery()}`, { code });
    }
    if (q.vehicleId) qb.andWhere('j.vehicleId = :vehicleId', { vehicleId: q.vehicleId });
    if (q.technicianId) qb.andWhere('j.technicianId = :technicianId', { technicianId: q.technicianId });
    const from = q.from ? new Date(q.from) : null;
    // A date alone means the whole of that day.
    const to = q.to ? new Date(/^\d{4}-\d{2}-\d{2}$/.test(q.to) ? new Date(q.to).getTime() + 86_400_000 - 1 : q.to) : null;
    if (from && Number.isNaN(from.getTime())) errors.push({ field: 'from', message: 'must be an ISO 8601 date or date-time' });
    if (to && Number.isNaN(to.getTime())) errors.push({ field: 'to', message: 'must be an ISO 8601 date or date-time' });
    if (from && to && from.getTime() > to.getTime()) errors.push({ field: 'to', message: 'must not be before from' });
    if (errors.length) throw validationFailed(errors);
    if (from) qb.andWhere('j.openedAt >= :from', { from });
    if (to) qb.andWhere('j.openedAt <= :to', { to });
    // Empty values last in both directions, on SQLite and PostgreSQL alike (their defaults differ).
    qb.orderBy(JOB_SORT_COLUMNS[q.sort], q.order === 'asc' ? 'ASC' : 'DESC', 'NULLS LAST');
    if (q.sort !== 'openedAt') qb.addOrderBy('j.openedAt', 'DESC');
    qb.addOrderBy('j.id', 'ASC');
    qb.skip((q.page - 1) * q.pageSize).take(q.pageSize);
    const [rows, total] = await qb.getManyAndCount();

    const ids = rows.map((j) => j.id);
    const codes = ids.length ? await this.jobCodes.find({ where: { jobId: In(ids) }, order: { position: 'ASC' } }) : [];
    const sums: Array<{ jobId: string; n: string | number; cost: string | number | null }> = ids.length
      ? await this.steps
          .createQueryBuilder('s')
          .select('s.jobId', 'jobId')
          .addSelect('COUNT(*)', 'n')
          .addSelect('SUM(s.actualCostMinor)', 'cost')
          .where('s.jobId IN (:...ids)', { ids })
          .groupBy('s.jobId')
          .getRawMany()
      : [];
    const sumOf = new Map(sums.map((s) => [s.jobId, { n: Number(s.n), cost: Number(s.cost ?? 0) }]));
    const items = rows.map((j) => {
      j.codes = codes.filter((c) => c.jobId === j.id);
      const s = sumOf.get(j.id) ?? { n: 0, cost: 0 };
      return this.toSummary(j, shop, s.n, s.cost);
    });
    return { items, total, page: q.page, pageSize: q.pageSize };
  }

  // ------------------------------------------------------------ writing

  async create(user: AuthUser, dto: CreateJobDto): Promise<JobDto> {
    const shop = await this.shops.shopOf(user);
    const vehicle = await this.vehicles.findOwned(shop, dto.vehicleId);
    const errors: FieldError[] = [];
    const seen = new Map<string, number>();
    const codes = dto.codes.map((c, i) => {
      const s = parseCodeOr400(c.code, `codes.${i}.code`);
      if (seen.has(s.code)) errors.push({ field: `codes.${i}.code`, message: `${s.code} is listed twice (also codes.${seen.get(s.code)})` });
      seen.set(s.code, i);
      return { code: s.code, display: s.display, status: c.status, freezeFrame: checkFreezeFrame(c.freezeFrame, `codes.${i}.freezeFrame`, errors) };
    });
    const technicianId = dto.technicianId ?? user.id;
    const technician = UUID.test(technicianId) ? await this.users.findOne({ where: { id: technicianId, shopId: shop.id, disabled: false } }) : null;
    if (!technician) errors.push({ field: 'technicianId', message: 'is not an active member of this shop' });
    const openedAt = timeOf(dto.openedAt, 'openedAt', errors);
    if (errors.length) throw validationFailed(errors);
    const odometerKm = dto.odometer === undefined ? null : nextOdometerKm(vehicle.odometerKm, dto.odometer, shop.distanceUnit, dto.confirmOdometerLower);

    // The fix path's expected cost at opening, kept to compare with what resolving actually cost.
    const expected = await Promise.all(codes.map((c) => this.expectedCost(c.code, vehicle, shop)));
    const known = expected.filter((e): e is number => e !== null);

    const id = await this.dataSource.transaction(async (em) => {
      if (odometerKm !== null && odometerKm !== vehicle.odometerKm) {
        await em.update(Vehicle, { id: vehicle.id }, { odometerKm, odometerReadAt: new Date() });
      }
      const job = await em.save(
        em.create(Job, {
          shopId: shop.id,
          vehicleId: vehicle.id,
          complaint: dto.complaint,
          technicianId: technician!.id,
          status: 'open',
          resolution: null,
          odometerKm: odometerKm ?? vehicle.odometerKm,
          expectedCostMinor: known.length ? known.reduce((s, x) => s + x, 0) : null,
          openedAt,
          closedAt: null,
          verificationPassed: null,
          closeNotes: null,
          createdById: user.id,
        }),
      );
      await em.save(codes.map((c, i) => em.create(JobCode, { jobId: job.id, position: i, ...c, expectedCostMinor: expected[i], outcome: null })));
      return job.id;
    });
    return this.toDto(await this.findOwned(shop, id), shop);
  }

  async addStep(user: AuthUser, id: string, dto: CreateStepDto): Promise<JobDto> {
    const shop = await this.shops.shopOf(user);
    const job = await this.findOwned(shop, id);
    if (job.status === 'closed') throw closedConflict();
    const errors: FieldError[] = [];
    const code = this.codeOfJob(job, dto.code, 'code');
    if (dto.kind === 'check') {
      if (dto.parts.length !== 1) errors.push({ field: 'parts', message: 'a check is on exactly one part' });
      if (dto.result !== 'at-fault' && dto.result !== 'not-at-fault') errors.push({ field: 'result', message: "a check's result is at-fault or not-at-fault" });
    } else if (dto.result !== 'cleared' && dto.result !== 'came-back') {
      errors.push({ field: 'result', message: "a replacement's result is cleared or came-back" });
    }
    const dup = dto.parts.findIndex((p, i) => dto.parts.indexOf(p) !== i);
    if (dup >= 0) errors.push({ field: `parts.${dup}`, message: `'${dto.parts[dup]}' is listed twice` });
    errors.push(...(await this.unknownParts(dto.parts, 'parts')));
    const at = timeOf(dto.at, 'at', errors, job.openedAt);
    if (errors.length) throw validationFailed(errors);

    await this.dataSource.transaction(async (em) => {
      const last = await em.getRepository(JobStep).maximum('sequence', { jobId: job.id });
      await em.save(
        em.create(JobStep, {
          jobId: job.id,
          sequence: (last ?? 0) + 1,
          code,
          kind: dto.kind,
          parts: dto.parts,
          result: dto.result,
          actualCostMinor: dto.actualCostMinor,
          notes: dto.notes ?? '',
          at,
          createdById: user.id,
        }),
      );
      await em.update(Job, { id: job.id }, { updatedAt: new Date() });
    });
    return this.toDto(await this.findOwned(shop, id), shop);
  }

  async close(user: AuthUser, id: string, dto: CloseJobDto): Promise<JobDto> {
    const shop = await this.shops.shopOf(user);
    const job = await this.findOwned(shop, id);
    if (job.status === 'closed') throw closedConflict();
    const errors: FieldError[] = [];
    const fixedBy = new Map<string, string[]>();
    if (dto.resolution === 'resolved') {
      if (dto.verificationPassed !== true) {
        errors.push({ field: 'verificationPassed', message: 'must be true to close as resolved: the code must stay away after the verification drive' });
      }
      for (const [i, f] of (dto.fixedBy ?? []).entries()) {
        const code = this.codeOfJob(job, f.code, `fixedBy.${i}.code`);
        if (fixedBy.has(code)) errors.push({ field: `fixedBy.${i}.code`, message: `${code} is given twice` });
        errors.push(...(await this.unknownParts(f.parts, `fixedBy.${i}.parts`)));
        fixedBy.set(code, [...new Set(f.parts)]);
      }
      // By default a code was fixed by its last clearing replacement.
      for (const c of job.codes) {
        if (fixedBy.has(c.code)) continue;
        const { clearedBy } = codeProgress(c.code, job.steps);
        if (clearedBy.length) fixedBy.set(c.code, clearedBy);
      }
      if (fixedBy.size === 0 && errors.length === 0) {
        errors.push({ field: 'fixedBy', message: 'say what fixed at least one code (parts: [] for a cause not listed), or record the replacement that cleared it' });
      }
    } else if (dto.fixedBy?.length) {
      errors.push({ field: 'fixedBy', message: 'only a resolved job names what fixed it' });
    }
    if (errors.length) throw validationFailed(errors);

    await this.dataSource.transaction((em) => this.closeIn(em, job, dto.resolution, dto.verificationPassed ?? null, dto.notes ?? null, fixedBy, new Date()));
    return this.toDto(await this.findOwned(shop, id), shop);
  }

  /**
   * Closes a job inside the caller's transaction; on resolved, records one outcome per code
   * named in `fixedBy`, with the credit split the likelihood service worked out, on the job.
   * The outcome is the technician's: the influence caps count it against them and their shop.
   */
  async closeIn(em: EntityManager, job: Job, resolution: 'resolved' | 'unresolved', verificationPassed: boolean | null, notes: string | null, fixedBy: Map<string, string[]>, at: Date): Promise<void> {
    await em.update(Job, { id: job.id }, { status: 'closed', resolution, verificationPassed, closeNotes: notes, closedAt: at });
    if (resolution !== 'resolved') return;
    const vehicle = job.vehicle;
    for (const c of job.codes) {
      const parts = fixedBy.get(c.code);
      if (!parts) continue;
      const outcome = await this.likelihood.recordOutcome(em, {
        source: 'job',
        sourceId: job.id,
        userId: job.technicianId ?? job.createdById ?? 'unknown',
        shopId: job.shopId,
        code: c.code,
        vehicle: scopeOf(vehicle),
        fixedBy: parts,
      });
      await em.update(JobCode, { id: c.id }, { outcome });
    }
  }

  // ------------------------------------------------------------ fix paths

  /** The current fix path of every code of the job, recomputed from the knowledge base and the job's steps. */
  async codePaths(job: Job, shop: Shop): Promise<CodePath[]> {
    return Promise.all(job.codes.map((c) => this.codePath(job, c, shop)));
  }

  private async codePath(job: Job, c: JobCode, shop: Shop): Promise<CodePath> {
    const progress = codeProgress(c.code, job.steps);
    const entry = await this.codes.findEntry(c.code, job.vehicle.make);
    const title = entry?.title ?? null;
    const fallbackCautions = () => this.codes.cautionsFor(entry?.cautions.length ? entry.cautions : defaultCautionsFor({ code: c.code, system: c.code[0] as DtcSystem }));
    const base = { progress, title };
    if (job.status === 'closed') return { ...base, fixPath: null, note: 'The job is closed.', state: progress.state, cautions: await fallbackCautions() };
    if (progress.state === 'cleared') {
      const verify = entry?.verificationProcedure ? ` Verify: ${entry.verificationProcedure}` : '';
      return { ...base, fixPath: null, note: `Cleared by replacing ${partsList(progress.clearedBy)}.${verify} Then close the job.`, state: 'cleared', cautions: await fallbackCautions() };
    }
    let fp: FixPathDto;
    try {
      fp = await this.knowledge.planForCode(c.code, scopeOf(job.vehicle), moneyOf(shop), { excludedParts: progress.excluded });
    } catch (err) {
      if (!(err instanceof HttpException)) throw err;
      return { ...base, fixPath: null, note: `No fix path: ${err.message}`, state: progress.state, cautions: await fallbackCautions() };
    }
    if (progress.found !== null) {
      const narrowed = narrowToFound(fp, progress.found);
      if (narrowed) {
        return { ...base, fixPath: narrowed, note: `A check found ${narrowed.causes[0]?.label ?? progress.found} at fault: the path is its replacement and the verification.`, state: 'cause-found', cautions: fp.cautions };
      }
      return { ...base, fixPath: null, note: `A check found ${progress.found} at fault; it is not on this code's list of possible causes, so there is no costed path: replace it and verify.`, state: 'cause-found', cautions: fp.cautions };
    }
    const exhausted = fp.causes.length === 0 && progress.excluded.length > 0;
    return { ...base, fixPath: fp, note: fp.note, state: exhausted ? 'exhausted' : progress.state, cautions: fp.cautions };
  }

  private async expectedCost(code: string, vehicle: Vehicle, shop: Shop): Promise<number | null> {
    try {
      const fp = await this.knowledge.planForCode(code, scopeOf(vehicle), moneyOf(shop));
      return fp.plan.stages.length ? Math.round(fp.plan.expectedCost) : null;
    } catch (err) {
      if (err instanceof HttpException) return null;
      throw err;
    }
  }

  // ------------------------------------------------------------ helpers

  /** The job's code a request names (or its only code); 400 naming the field otherwise. */
  private codeOfJob(job: Job, input: string | undefined, field: string): string {
    const codes = job.codes.map((c) => c.code);
    if (input === undefined) {
      if (codes.length === 1) return codes[0];
      throw validationFailed([{ field, message: `is required: this job has several codes (${codes.join(', ')})` }]);
    }
    const code = parseCodeOr400(input, field).code;
    if (!codes.includes(code)) throw validationFailed([{ field, message: `${code} is not a code of this job (${codes.join(', ')})` }]);
    return code;
  }

  private async unknownParts(keys: string[], field: string): Promise<FieldError[]> {
    if (keys.length === 0) return [];
    const known = new Set((await this.parts.find({ where: { key: In(keys) }, select: { key: true } })).map((p) => p.key));
    return keys.flatMap((k, i) => (known.has(k) ? [] : [{ field: `${field}.${i}`, message: `'${k}' is not a known part` }]));
  }

  private async partLabels(keys: string[]): Promise<Map<string, string>> {
    if (keys.length === 0) return new Map();
    const rows = await this.parts.find({ where: { key: In([...new Set(keys)]) } });
    return new Map(rows.map((p) => [p.key, p.name]));
  }

  toSummary(j: Job, shop: Shop, stepCount: number, actualCostMinor: number): JobSummaryDto {
    const v = j.vehicle;
    return {
      id: j.id,
      status: j.status,
      resolution: j.resolution,
      complaint: j.complaint,
      openedAt: new Date(j.openedAt).toISOString(),
      closedAt: j.closedAt ? new Date(j.closedAt).toISOString() : null,
      vehicle: { id: v.id, vin: v.vin, make: v.make, model: v.model, engine: v.engine, year: v.year, plate: v.plate },
      codes: (j.codes ?? []).map((c) => ({ code: c.code, status: c.status })),
      technician: j.technician ? { id: j.technician.id, displayName: j.technician.displayName } : null,
      stepCount,
      actualCostMinor,
      expectedCostAtOpenMinor: j.expectedCostMinor,
      currency: shop.currency,
    };
  }

  async toDto(job: Job, shop: Shop): Promise<JobDto> {
    const paths = await this.codePaths(job, shop);
    const labels = await this.partLabels(job.steps.flatMap((s) => s.parts));
    const steps: JobStepDto[] = job.steps.map((s) => ({
      id: s.id,
      sequence: s.sequence,
      code: s.code,
      kind: s.kind,
      parts: s.parts.map((k) => ({ key: k, label: labels.get(k) ?? k })),
      result: s.result,
      actualCostMinor: s.actualCostMinor,
      notes: s.notes,
      at: new Date(s.at).toISOString(),
      recordedBy: s.createdBy ? { id: s.createdBy.id, displayName: s.createdBy.displayName } : null,
    }));
    const codes: JobCodeDto[] = job.codes.map((c, i) => {
      const p = paths[i];
      return {
        code: c.code,
        display: c.display,
        title: p.title,
        status: c.status,
        freezeFrame: c.freezeFrame,
        state: p.state,
        excludedParts: p.progress.excluded,
        foundPart: p.progress.found,
        clearedBy: p.progress.clearedBy,
        expectedCostAtOpenMinor: c.expectedCostMinor,
        fixPath: p.fixPath,
        fixPathNote: p.note,
        outcome: c.outcome,
        cautions: p.cautions,
      };
    });
    const estimates = await this.estimates.find({ where: { jobId: job.id }, relations: { answers: true }, order: { createdAt: 'DESC' } });
    const actual = job.steps.reduce((s, x) => s + x.actualCostMinor, 0);
    return {
      ...this.toSummary(job, shop, job.steps.length, actual),
      codes,
      odometerKm: job.odometerKm,
      odometer: shownReading(job.odometerKm, shop.distanceUnit),
      distanceUnit: shop.distanceUnit,
      steps,
      closeNotes: job.closeNotes,
      verificationPassed: job.verificationPassed,
      estimates: estimates.map((e) => toEstimateSummary(e)),
      taxRateBp: shop.taxRateBp,
      locale: shop.locale,
    };
  }
}
