import { ConflictException, Injectable, NotFoundException } from '@nestjs/common';
import { InjectDataSource } from '@nestjs/typeorm';
import { DataSource, In, type EntityManager } from 'typeorm';
import { PART_SYSTEMS, type FieldError } from '@causeway/shared';
import { AuditService, type AuditActor } from '../audit/audit.service';
import { parseCodeOr400 } from '../codes/codes.service';
import { DtcCode } from '../codes/entities/dtc-code.entity';
import { SafetyCaution } from '../codes/entities/safety-caution.entity';
import { validationFailed } from '../common/validation';
import { Part } from '../knowledge/entities/part.entity';
import { PossibleCause } from '../knowledge/entities/possible-cause.entity';
import { Teardown } from '../knowledge/entities/teardown.entity';
import { toPartDto, toTeardownDto } from '../knowledge/knowledge.service';
import { describeScope, scopeKey, type Scoped } from '../knowledge/scope';
import type { CodeEditDto, CreateCauseDto, CreatePartDto, CreateTeardownDto, ScopeDto, UpdateCauseDto, UpdatePartDto, UpdateTeardownDto } from './dto/knowledge-edit.dto';

/** Priors of one code and scope may sum to at most 1, within rounding of stored weights. */
const SUM_TOLERANCE = 1e-9;

/** The editable fields of a cause, as the audit log keeps them. */
function causeSnapshot(c: PossibleCause): Record<string, unknown> {
  const { part: _part, teardown: _teardown, ...fields } = c;
  return { ...fields };
}

function codeSnapshot(c: DtcCode): Record<string, unknown> {
  return {
    code: c.code,
    make: c.make || null,
    title: c.title,
    description: c.description,
    subsystem: c.subsystem,
    symptoms: c.symptoms,
    verification: { monitor: c.verificationMonitor, procedure: c.verificationProcedure, hours: c.verificationHours },
    escalation: c.escalationHours === null ? null : { hours: c.escalationHours, description: c.escalationDescription },
    cautions: c.cautions,
  };
}

/** Only the fields that changed, before and after. */
function delta(before: Record<string, unknown>, after: Record<string, unknown>): { before: Record<string, unknown>; after: Record<string, unknown> } {
  const b: Record<string, unknown> = {};
  const a: Record<string, unknown> = {};
  for (const key of new Set([...Object.keys(before), ...Object.keys(after)])) {
    if (JSON.stringify(before[key]) !== JSON.stringify(after[key])) {
      b[key] = before[key];
      a[key] = after[key];
    }
  }
  return { before: b, after: a };
}

export function codeEntityId(code: string, make: string): string {
  return make ? `${code}|${make}` : code;
}

function same(a: string | null, b: string | null): boolean {
  return (a ?? '').trim().toLowerCase() === (b ?? '').trim().toLowerCase();
}

/** Scope fields with blanks as null, checked for a make above a model above an engine and years in order. */
export function normaliseScope(s: Partial<ScopeDto>, errors: FieldError[], prefix = ''): Scoped {
  const t = (v: string | null | undefined) => (typeof v === 'string' && v.trim() ? v.trim() : null);
  const scope: Scoped = { make: t(s.make), model: t(s.model), engine: t(s.engine), yearFrom: s.yearFrom ?? null, yearTo: s.yearTo ?? null };
  if (scope.model !== null && scope.make === null) errors.push({ field: `${prefix}model`, message: 'needs a make: a model is scoped within its make' });
  if (scope.engine !== null && scope.model === null) errors.push({ field: `${prefix}engine`, message: 'needs a model: an engine is scoped within its model' });
  if (scope.yearFrom !== null && scope.yearTo !== null && scope.yearFrom > scope.yearTo) errors.push({ field: `${prefix}yearTo`, message: 'must not be before yearFrom' });
  return scope;
}

/** A teardown serves a cause when its scope contains the cause's (null = any). */
export function scopeCovers(outer: Scoped, inner: Scoped): boolean {
  for (const f of ['make', 'model', 'engine'] as const) {
    if (outer[f] !== null && (inner[f] === null || !same(outer[f], inner[f]))) return false;
  }
  if (outer.yearFrom !== null && (inner.yearFrom === null || inner.yearFrom < outer.yearFrom)) return false;
  if (outer.yearTo !== null && (inner.yearTo === null || inner.yearTo > outer.yearTo)) return false;
  return true;
}

export interface NewCauseInput extends Scoped {
  code: string;
  partKey: string;
  prior: number;
  partCostMinor: number;
  currency: string;
  replaceHours: number;
  teardownKey: string | null;
  check: { description: string; hours: number; mustPrecede: boolean } | null;
}

/**
 * Direct edits of the knowledge base by moderators, and the same writes when a field report is
 * approved. Every write goes with its audit entry in one transaction: the `…In(em, …)` methods
 * take the caller's transaction; the others open their own.
 */
@Injectable()
export class KnowledgeEditsService {
  constructor(
    @InjectDataSource() private readonly dataSource: DataSource,
    private readonly audit: AuditService,
  ) {}

  // ------------------------------------------------------------------ codes

  async updateCode(actor: AuditActor, codeInput: string, make: string | undefined, dto: CodeEditDto): Promise<DtcCode> {
    const code = parseCodeOr400(codeInput, 'code').code;
    return this.dataSource.transaction(async (em) => {
      const entry = await this.findCodeEntry(em, code, make);
      await this.checkCautions(em, dto.cautions, 'cautions');
      const changes: Partial<DtcCode> = {};
      if (dto.title !== undefined) changes.title = dto.title;
      if (dto.description !== undefined) changes.description = dto.description;
      if (dto.subsystem !== undefined) changes.subsystem = dto.subsystem;
      if (dto.symptoms !== undefined) changes.symptoms = dto.symptoms.map((s) => s.trim()).filter(Boolean);
      if (dto.verification?.monitor !== undefined) changes.verificationMonitor = dto.verification.monitor;
      if (dto.verification?.procedure !== undefined) changes.verificationProcedure = dto.verification.procedure;
      if (dto.verification?.hours !== undefined) changes.verificationHours = dto.verification.hours;
      if (dto.escalation === null) {
        changes.escalationHours = null;
        changes.escalationDescription = '';
      } else if (dto.escalation !== undefined) {
        changes.escalationHours = dto.escalation.hours;
        changes.escalationDescription = dto.escalation.description;
      }
      if (dto.cautions !== undefined) changes.cautions = [...new Set(dto.cautions)];
      return this.applyCodeChangesIn(em, actor, entry, changes, 'code.update', null);
    });
  }

  /** The catalogue entry a moderator means: this make's, or the generic one. 404 when there is none. */
  async findCodeEntry(em: EntityManager, code: string, make?: string | null): Promise<DtcCode> {
    const rows = await em.getRepository(DtcCode).find({ where: { code } });
    const wanted = make?.trim().toLowerCase();
    const row = wanted ? rows.find((r) => r.make.toLowerCase() === wanted) : rows.find((r) => r.make === '');
    if (!row) {
      throw new NotFoundException({ statusCode: 404, error: 'Not Found', message: `${code}${make ? ` for ${make}` : ''} is not in the catalogue` });
    }
    return row;
  }

  async applyCodeChangesIn(em: EntityManager, actor: AuditActor, entry: DtcCode, changes: Partial<DtcCode>, action: string, note: string | null): Promise<DtcCode> {
    const before = codeSnapshot(entry);
    Object.assign(entry, changes);
    const saved = await em.getRepository(DtcCode).save(entry);
    const d = delta(before, codeSnapshot(saved));
    await this.audit.record(em, actor, { action, entityType: 'dtc-code', entityId: codeEntityId(saved.code, saved.make), before: d.before, after: d.after, note });
    return saved;
  }

  /** Adds a catalogue entry for a valid code that had none (proposed by a field report). */
  async createCodeIn(em: EntityManager, actor: AuditActor, codeInput: string, title: string, note: string | null): Promise<DtcCode> {
    const s = parseCodeOr400(codeInput, 'code');
    const repo = em.getRepository(DtcCode);
    const row = await repo.save(
      repo.create({
        code: s.code,
        make: '',
        system: s.system,
        control: s.control,
        title,
        description: '',
        subsystem: s.group,
        symptoms: [],
        cautions: [],
        source: 'field-report',
        escalationHours: null,
      }),
    );
    await this.audit.record(em, actor, { action: 'code.create', entityType: 'dtc-code', entityId: codeEntityId(row.code, row.make), before: null, after: codeSnapshot(row), note });
    return row;
  }

  // ------------------------------------------------------------------ parts

  createPart(actor: AuditActor, dto: CreatePartDto): Promise<Part> {
    return this.dataSource.transaction((em) => this.createPartIn(em, actor, dto, null));
  }

  async createPartIn(em: EntityManager, actor: AuditActor, dto: { key: string; name: string; system: string }, note: string | null): Promise<Part> {
    const repo = em.getRepository(Part);
    if (await repo.findOne({ where: { key: dto.key } })) {
      throw new ConflictException({ statusCode: 409, error: 'Conflict', message: `key: a part ${dto.key} already exists`, errors: [{ field: 'key', message: 'is already taken by another part' }] });
    }
    const part = await repo.save(repo.create({ key: dto.key, name: dto.name, system: dto.system }));
    await this.audit.record(em, actor, { action: 'part.create', entityType: 'part', entityId: part.key, before: null, after: toPartDto(part), note });
    return part;
  }

  updatePart(actor: AuditActor, key: string, dto: UpdatePartDto): Promise<Part> {
    return this.dataSource.transaction(async (em) => {
      const repo = em.getRepository(Part);
      const part = await repo.findOne({ where: { key } });
      if (!part) throw new NotFoundException(`There is no part ${key}`);
      const before = toPartDto(part);
      if (dto.name !== undefined) part.name = dto.name;
      if (dto.system !== undefined) part.system = dto.system;
      const saved = await repo.save(part);
      const d = delta({ ...before }, { ...toPartDto(saved) });
      await this.audit.record(em, actor, { action: 'part.update', entityType: 'part', entityId: key, before: d.before, after: d.after });
      return saved;
    });
  }

  // ------------------------------------------------------------------ teardowns

  createTeardown(actor: AuditActor, dto: CreateTeardownDto): Promise<Teardown> {
    return this.dataSource.transaction(async (em) => {
      const errors: FieldError[] = [];
      const scope = normaliseScope(dto, errors);
      if (errors.length) throw validationFailed(errors);
      await this.checkCautions(em, dto.cautions, 'cautions');
      const repo = em.getRepository(Teardown);
      if (await repo.findOne({ where: { key: dto.key } })) {
        throw new ConflictException({ statusCode: 409, error: 'Conflict', message: `key: a teardown ${dto.key} already exists`, errors: [{ field: 'key', message: 'is already taken by another teardown' }] });
      }
      const t = await repo.save(repo.create({ key: dto.key, name: dto.name, hours: dto.hours, cautions: [...new Set(dto.cautions)], ...scope }));
      await this.audit.record(em, actor, { action: 'teardown.create', entityType: 'teardown', entityId: t.key, before: null, after: toTeardownDto(t) });
      return t;
    });
  }

  updateTeardown(actor: AuditActor, key: string, dto: UpdateTeardownDto): Promise<Teardown> {
    return this.dataSource.transaction(async (em) => {
      const repo = em.getRepository(Teardown);
      const t = await repo.findOne({ where: { key } });
      if (!t) throw new NotFoundException(`There is no teardown ${key}`);
      const before = toTeardownDto(t);
      const errors: FieldError[] = [];
      const merged = normaliseScope(
        {
          make: dto.make !== undefined ? dto.make : t.make,
          model: dto.model !== undefined ? dto.model : t.model,
          engine: dto.engine !== undefined ? dto.engine : t.engine,
          yearFrom: dto.yearFrom !== undefined ? dto.yearFrom : t.yearFrom,
          yearTo: dto.yearTo !== undefined ? dto.yearTo : t.yearTo,
        },
        errors,
      );
      if (errors.length) throw validationFailed(errors);
      await this.checkCautions(em, dto.cautions, 'cautions');
      // A narrower scope must still contain every cause that opens this teardown.
      const users = await em.getRepository(PossibleCause).find({ where: { teardownKey: key } });
      const outside = users.filter((c) => !scopeCovers(merged, c));
      if (outside.length) {
        throw validationFailed([{ field: 'make', message: `the scope ${describeScope(merged)} would no longer cover ${outside.length} possible cause(s) that use this teardown (e.g. ${outside[0].code} ${outside[0].partKey} for ${describeScope(outside[0])})` }]);
      }
      Object.assign(t, merged);
      if (dto.name !== undefined) t.name = dto.name;
      if (dto.hours !== undefined) t.hours = dto.hours;
      if (dto.cautions !== undefined) t.cautions = [...new Set(dto.cautions)];
      const saved = await repo.save(t);
      const d = delta({ ...before }, { ...toTeardownDto(saved) });
      await this.audit.record(em, actor, { action: 'teardown.update', entityType: 'teardown', entityId: key, before: d.before, after: d.after });
      return saved;
    });
  }

  // ------------------------------------------------------------------ causes

  createCause(actor: AuditActor, dto: CreateCauseDto): Promise<PossibleCause> {
    return this.dataSource.transaction(async (em) => {
      const errors: FieldError[] = [];
      const scope = normaliseScope(dto, errors);
      if (errors.length) throw validationFailed(errors);
      const code = parseCodeOr400(dto.code, 'code').code;
      if (!(await em.getRepository(DtcCode).exist({ where: { code } }))) {
        throw validationFailed([{ field: 'code', message: `${code} is not in the catalogue` }]);
      }
      return this.createCauseIn(
        em,
        actor,
        { code, partKey: dto.partKey, prior: dto.prior, partCostMinor: dto.partCostMinor, currency: dto.currency, replaceHours: dto.replaceHours, teardownKey: dto.teardownKey ?? null, check: dto.check ?? null, ...scope },
        null,
      );
    });
  }

  /** Checks references, uniqueness and the sum of priors, then writes the cause and its audit entry. */
  async createCauseIn(em: EntityManager, actor: AuditActor, input: NewCauseInput, note: string | null, fieldPrefix = ''): Promise<PossibleCause> {
    const f = (name: string) => `${fieldPrefix}${name}`;
    const errors: FieldError[] = [];
    if (!(await em.getRepository(Part).exist({ where: { key: input.partKey } }))) errors.push({ field: f('partKey'), message: `there is no part ${input.partKey}` });
    await this.checkTeardown(em, input.teardownKey, input, errors, f('teardownKey'));
    const siblings = await this.sameScope(em, input.code, input);
    if (siblings.some((c) => c.partKey === input.partKey)) {
      throw new ConflictException({
        statusCode: 409,
        error: 'Conflict',
        message: `${input.partKey} is already a possible cause of ${input.code} for ${describeScope(input)}`,
        errors: [{ field: f('partKey'), message: `is already a possible cause of ${input.code} for ${describeScope(input)}` }],
      });
    }
    this.checkPriorSum(siblings, input.prior, input.code, input, errors, f('prior'));
    if (errors.length) throw validationFailed(errors);
    const repo = em.getRepository(PossibleCause);
    const row = await repo.save(
      repo.create({
        code: input.code,
        partKey: input.partKey,
        prior: input.prior,
        partCostMinor: input.partCostMinor,
        currency: input.currency,
        replaceHours: input.replaceHours,
        teardownKey: input.teardownKey,
        checkDescription: input.check?.description ?? '',
        checkHours: input.check?.hours ?? null,
        checkMustPrecede: input.check?.mustPrecede ?? false,
        make: input.make,
        model: input.model,
        engine: input.engine,
        yearFrom: input.yearFrom,
        yearTo: input.yearTo,
      }),
    );
    await this.audit.record(em, actor, { action: 'cause.create', entityType: 'possible-cause', entityId: row.id, before: null, after: causeSnapshot(row), note });
    return row;
  }

  updateCause(actor: AuditActor, id: string, dto: UpdateCauseDto): Promise<PossibleCause> {
    return this.dataSource.transaction(async (em) => {
      const cause = await this.findCause(em, id);
      const errors: FieldError[] = [];
      const scope = normaliseScope(
        {
          make: dto.make !== undefined ? dto.make : cause.make,
          model: dto.model !== undefined ? dto.model : cause.model,
          engine: dto.engine !== undefined ? dto.engine : cause.engine,
          yearFrom: dto.yearFrom !== undefined ? dto.yearFrom : cause.yearFrom,
          yearTo: dto.yearTo !== undefined ? dto.yearTo : cause.yearTo,
        },
        errors,
      );
      const changes: Partial<PossibleCause> = { ...scope };
      if (dto.prior !== undefined) changes.prior = dto.prior;
      if (dto.partCostMinor !== undefined) changes.partCostMinor = dto.partCostMinor;
      if (dto.currency !== undefined) changes.currency = dto.currency;
      if (dto.replaceHours !== undefined) changes.replaceHours = dto.replaceHours;
      if (dto.teardownKey !== undefined) changes.teardownKey = dto.teardownKey;
      if (dto.check === null) Object.assign(changes, { checkDescription: '', checkHours: null, checkMustPrecede: false });
      else if (dto.check !== undefined) Object.assign(changes, { checkDescription: dto.check.description, checkHours: dto.check.hours, checkMustPrecede: dto.check.mustPrecede });
      if (errors.length) throw validationFailed(errors);
      return this.updateCauseIn(em, actor, cause, changes, 'cause.update', null);
    });
  }

  async findCause(em: EntityManager, id: string): Promise<PossibleCause> {
    const cause = /^[0-9a-f-]{36}$/i.test(id) ? await em.getRepository(PossibleCause).findOne({ where: { id } }) : null;
    if (!cause) throw new NotFoundException(`There is no possible cause ${id}`);
    return cause;
  }

  /** Applies changes to a cause after checking its teardown, uniqueness and the sum of priors in its (new) scope. */
  async updateCauseIn(em: EntityManager, actor: AuditActor, cause: PossibleCause, changes: Partial<PossibleCause>, action: string, note: string | null, fieldPrefix = ''): Promise<PossibleCause> {
    const f = (name: string) => `${fieldPrefix}${name}`;
    const before = causeSnapshot(cause);
    const next = { ...cause, ...changes } as PossibleCause;
    const errors: FieldError[] = [];
    await this.checkTeardown(em, next.teardownKey, next, errors, f('teardownKey'));
    const siblings = (await this.sameScope(em, next.code, next)).filter((c) => c.id !== cause.id);
    if (siblings.some((c) => c.partKey === next.partKey)) {
      throw new ConflictException({ statusCode: 409, error: 'Conflict', message: `${next.partKey} is already a possible cause of ${next.code} for ${describeScope(next)}`, errors: [{ field: f('make'), message: `${next.partKey} is already a possible cause of ${next.code} for ${describeScope(next)}` }] });
    }
    this.checkPriorSum(siblings, next.prior, next.code, next, errors, f('prior'));
    if (errors.length) throw validationFailed(errors);
    Object.assign(cause, changes);
    const saved = await em.getRepository(PossibleCause).save(cause);
    const d = delta(before, causeSnapshot(saved));
    await this.audit.record(em, actor, { action, entityType: 'possible-cause', entityId: saved.id, before: d.before, after: d.after, note });
    return saved;
  }

  deleteCause(actor: AuditActor, id: string): Promise<void> {
    return this.dataSource.transaction(async (em) => {
      const cause = await this.findCause(em, id);
      const before = causeSnapshot(cause);
      await em.getRepository(PossibleCause).delete({ id });
      await this.audit.record(em, actor, { action: 'cause.delete', entityType: 'possible-cause', entityId: id, before, after: null });
    });
  }

  /** The possible causes of a code with exactly this scope (one curated list). */
  async sameScope(em: EntityManager, code: string, scope: Scoped): Promise<PossibleCause[]> {
    const key = scopeKey(scope);
    const rows = await em.getRepository(PossibleCause).find({ where: { code }, relations: { part: true } });
    return rows.filter((r) => scopeKey(r) === key);
  }

  async causeWithScope(em: EntityManager, code: string, partKey: string, scope: Scoped): Promise<PossibleCause | null> {
    return (await this.sameScope(em, code, scope)).find((c) => c.partKey === partKey) ?? null;
  }

  priorSumProblem(siblings: PossibleCause[], prior: number, code: string, scope: Scoped): string | null {
    const sum = siblings.reduce((s, c) => s + c.prior, 0) + prior;
    if (sum <= 1 + SUM_TOLERANCE) return null;
    return `the priors of ${code} for ${describeScope(scope)} would sum to ${Math.round(sum * 1000) / 1000}; they must sum to at most 1 (the rest is a cause not listed)`;
  }

  private checkPriorSum(siblings: PossibleCause[], prior: number, code: string, scope: Scoped, errors: FieldError[], field: string): void {
    const problem = this.priorSumProblem(siblings, prior, code, scope);
    if (problem) errors.push({ field, message: problem });
  }

  private async checkTeardown(em: EntityManager, key: string | null, scope: Scoped, errors: FieldError[], field: string): Promise<void> {
    if (key === null) return;
    const t = await em.getRepository(Teardown).findOne({ where: { key } });
    if (!t) errors.push({ field, message: `there is no teardown ${key}` });
    else if (!scopeCovers(t, scope)) errors.push({ field, message: `the teardown is for ${describeScope(t)}, which does not cover ${describeScope(scope)}` });
  }

  private async checkCautions(em: EntityManager, keys: string[] | undefined, field: string): Promise<void> {
    if (!keys?.length) return;
    const known = new Set((await em.getRepository(SafetyCaution).find({ where: { key: In(keys) } })).map((c) => c.key));
    const errors = keys.flatMap((k, i) => (known.has(k) ? [] : [{ field: `${field}.${i}`, message: `there is no safety caution ${k}` }]));
    if (errors.length) throw validationFailed(errors);
  }

  static isPartSystem(s: unknown): boolean {
    return typeof s === 'string' && (PART_SYSTEMS as readonly string[]).includes(s);
  }
}
