import { ConflictException, Inject, Injectable, NotFoundException } from '@nestjs/common';
import { InjectDataSource, InjectRepository } from '@nestjs/typeorm';
import { plainToInstance } from 'class-transformer';
import { validate } from 'class-validator';
import { DataSource, In, Repository, type EntityManager } from 'typeorm';
import {
  ATTACHMENT_LIMITS,
  roleAtLeast,
  type AttachmentDto,
  type ConfirmedFixPayload,
  type CorrectionPayload,
  type FieldError,
  type FieldReportDto,
  type FieldReportKind,
  type FieldReportPayload,
  type FieldReportSummaryDto,
  type NewCausePayload,
  type Page,
} from '@causeway/shared';
import type { AuthUser } from '../auth/auth-user';
import { parseCodeOr400 } from '../codes/codes.service';
import { DtcCode } from '../codes/entities/dtc-code.entity';
import { flattenValidationErrors, validationFailed } from '../common/validation';
import { appConfig, type AppConfig } from '../config/configuration';
import { Part } from '../knowledge/entities/part.entity';
import { Teardown } from '../knowledge/entities/teardown.entity';
import { describeScope } from '../knowledge/scope';
import { KnowledgeEditsService, normaliseScope, scopeCovers } from '../moderation/knowledge-edits.service';
import { Attachment } from '../uploads/entities/attachment.entity';
import { UploadsService, type IncomingFile } from '../uploads/uploads.service';
import { User } from '../users/entities/user.entity';
import type { FieldReportBody, MyReportsQuery } from './dto/field-report.dto';
import { PAYLOAD_CLASSES } from './dto/payloads.dto';
import { FieldReport } from './entities/field-report.entity';

const UUID = /^[0-9a-f]{8}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{12}$/i;

export function notFound(): NotFoundException {
  return new NotFoundException({ statusCode: 404, error: 'Not Found', message: 'Field report not found' });
}

/** Drops keys whose value is undefined, so the stored payload holds what was sent. */
function defined<T extends object>(o: T): T {
  return Object.fromEntries(Object.entries(o).filter(([, v]) => v !== undefined)) as T;
}

function vehicleName(p: { make?: string | null; model?: string | null; engine?: string | null; year?: number | null }): string {
  return [p.make, p.model, p.engine, p.year ?? null].filter((x) => x !== null && x !== undefined && x !== '').join(' ');
}

/** One line for lists and e-mails. */
export function reportTitle(kind: FieldReportKind, payload: FieldReportPayload, partNames: Map<string, string>): string {
  const name = (key: string | null | undefined) => (key ? (partNames.get(key) ?? key) : '');
  if (kind === 'confirmed-fix') {
    const p = payload as ConfirmedFixPayload;
    return `${p.code} fixed by ${name(p.part)} on ${vehicleName(p)}`;
  }
  if (kind === 'new-cause') {
    const p = payload as NewCausePayload;
    return `${p.code}: ${p.partName ?? name(p.part)} proposed as a possible cause for ${describeScope(normaliseScope(p, []))}`;
  }
  const p = payload as CorrectionPayload;
  const what = { partCostMinor: 'part cost', replaceHours: 'labour hours', title: 'title', description: 'description' }[p.field];
  return p.target === 'cause' ? `${p.code}: correct the ${what} of ${name(p.part)} for ${describeScope(normaliseScope(p, []))}` : `${p.code}: correct the ${what}`;
}

export function partKeysOf(kind: FieldReportKind, payload: FieldReportPayload): string[] {
  if (kind === 'confirmed-fix') {
    const p = payload as ConfirmedFixPayload;
    return [p.part, ...(p.triedFirst ?? [])];
  }
  const part = (payload as NewCausePayload | CorrectionPayload).part;
  return part ? [part] : [];
}

/**
 * Field reports: contributors file confirmed fixes, new possible causes and corrections,
 * keep them as drafts, submit or withdraw them and attach evidence. Only the author sees a
 * draft; moderators see what was submitted. Anyone else gets a 404, never a hint it exists.
 */
@Injectable()
export class FieldReportsService {
  constructor(
    @InjectDataSource() private readonly dataSource: DataSource,
    @InjectRepository(FieldReport) private readonly reports: Repository<FieldReport>,
    @InjectRepository(Attachment) private readonly attachments: Repository<Attachment>,
    @InjectRepository(User) private readonly users: Repository<User>,
    @Inject(appConfig.KEY) private readonly app: AppConfig,
    private readonly edits: KnowledgeEditsService,
    private readonly uploads: UploadsService,
  ) {}

  // ------------------------------------------------------------ filing

  async create(user: AuthUser, body: FieldReportBody): Promise<FieldReportDto> {
    const checked = await this.checkBody(body.kind, body.payload);
    const now = new Date();
    const report = await this.reports.save(
      this.reports.create({
        kind: body.kind,
        status: body.submit ? 'submitted' : 'draft',
        authorId: user.id,
        shopId: user.shopId,
        code: checked.payload.code,
        payload: checked.payload,
        proposesNewCode: checked.proposesNewCode,
        submittedAt: body.submit ? now : null,
        decidedAt: null,
        decidedById: null,
        decisionNote: null,
        notifiedAt: null,
        notifyError: null,
      }),
    );
    return this.toDto(report);
  }

  async update(user: AuthUser, id: string, body: FieldReportBody): Promise<FieldReportDto> {
    const report = await this.ownDraft(user, id, 'edited');
    const checked = await this.checkBody(body.kind, body.payload);
    const changes = { kind: body.kind, payload: checked.payload, code: checked.payload.code, proposesNewCode: checked.proposesNewCode };
    if (body.submit) Object.assign(changes, { status: 'submitted', submittedAt: new Date() });
    // Guarded on the status, so a concurrent submit or withdraw is not overwritten.
    const result = await this.reports.update({ id: report.id, status: 'draft' }, changes);
    if (!result.affected) throw this.notDraft('edited');
    return this.toDto(await this.reports.findOneByOrFail({ id: report.id }));
  }

  async submit(user: AuthUser, id: string): Promise<FieldReportDto> {
    const report = await this.ownDraft(user, id, 'submitted');
    // The knowledge base may have changed since the draft was saved.
    const checked = await this.checkBody(report.kind, report.payload as unknown as Record<string, unknown>);
    const result = await this.reports.update({ id: report.id, status: 'draft' }, { status: 'submitted', submittedAt: new Date(), payload: checked.payload, proposesNewCode: checked.proposesNewCode });
    if (!result.affected) throw this.notDraft('submitted');
    return this.toDto(await this.reports.findOneByOrFail({ id: report.id }));
  }

  async withdraw(user: AuthUser, id: string): Promise<FieldReportDto> {
    const report = await this.findReadable(user, id);
    if (report.authorId !== user.id) throw notFound();
    const result = await this.reports.update({ id: report.id, status: In(['draft', 'submitted']) }, { status: 'withdrawn' });
    if (!result.affected) {
      throw new ConflictException({ statusCode: 409, error: 'Conflict', message: `This report is ${report.status}: only a draft or a submitted report can be withdrawn` });
    }
    return this.toDto(await this.reports.findOneByOrFail({ id: report.id }));
  }

  async mine(user: AuthUser, q: MyReportsQuery): Promise<Page<FieldReportSummaryDto>> {
    const where = { authorId: user.id, ...(q.status ? { status: q.status } : {}), ...(q.kind ? { kind: q.kind } : {}) };
    const [rows, total] = await this.reports.findAndCount({ where, order: { updatedAt: 'DESC', id: 'ASC' }, skip: (q.page - 1) * q.pageSize, take: q.pageSize });
    return { items: await this.toSummaries(rows), total, page: q.page, pageSize: q.pageSize };
  }

  async get(user: AuthUser, id: string): Promise<FieldReportDto> {
    return this.toDto(await this.findReadable(user, id));
  }

  // ------------------------------------------------------------ attachments

  async addAttachments(user: AuthUser, id: string, files: IncomingFile[]): Promise<AttachmentDto[]> {
    const report = await this.ownDraft(user, id, 'given attachments');
    if (files.length === 0) throw validationFailed([{ field: 'files', message: 'is required: send one or more files in the multipart field "files"' }]);
    const existing = await this.attachments.count({ where: { reportId: report.id } });
    if (existing + files.length > ATTACHMENT_LIMITS.maxFiles) {
      throw validationFailed([{ field: 'files', message: `at most ${ATTACHMENT_LIMITS.maxFiles} files per report: this one has ${existing}, so ${Math.max(0, ATTACHMENT_LIMITS.maxFiles - existing)} more can be added; nothing was uploaded` }]);
    }
    const checked = await this.uploads.check(files);
    const stored = await this.uploads.store(checked);
    try {
      const rows = await this.dataSource.transaction(async (em) => {
        // Re-checked inside the transaction: the count and the status may have moved meanwhile.
        const fresh = await em.getRepository(FieldReport).findOneBy({ id: report.id });
        if (fresh?.status !== 'draft') throw this.notDraft('given attachments');
        const count = await em.getRepository(Attachment).count({ where: { reportId: report.id } });
        if (count + stored.length > ATTACHMENT_LIMITS.maxFiles) throw validationFailed([{ field: 'files', message: `at most ${ATTACHMENT_LIMITS.maxFiles} files per report; nothing was uploaded` }]);
        const repo = em.getRepository(Attachment);
        return repo.save(
          stored.map((s) =>
            repo.create({ reportId: report.id, storageKey: s.storageKey, originalName: s.name, contentType: s.contentType, size: s.data.length, width: s.width, height: s.height, uploadedById: user.id }),
          ),
        );
      });
      return rows.map((a) => this.attachmentDto(a));
    } catch (err) {
      await this.uploads.remove(stored.map((s) => s.storageKey));
      throw err;
    }
  }

  async attachment(user: AuthUser, id: string, attachmentId: string): Promise<{ row: Attachment; data: Buffer }> {
    const report = await this.findReadable(user, id);
    const row = UUID.test(attachmentId) ? await this.attachments.findOne({ where: { id: attachmentId, reportId: report.id } }) : null;
    if (!row) throw new NotFoundException({ statusCode: 404, error: 'Not Found', message: 'Attachment not found' });
    const data = await this.uploads.read(row.storageKey);
    if (!data) throw new NotFoundException({ statusCode: 404, error: 'Not Found', message: 'The attachment file is missing from storage' });
    return { row, data };
  }

  async removeAttachment(user: AuthUser, id: string, attachmentId: string): Promise<void> {
    const report = await this.ownDraft(user, id, 'changed');
    const row = UUID.test(attachmentId) ? await this.attachments.findOne({ where: { id: attachmentId, reportId: report.id } }) : null;
    if (!row) throw new NotFoundException({ statusCode: 404, error: 'Not Found', message: 'Attachment not found' });
    await this.attachments.delete({ id: row.id });
    await this.uploads.remove([row.storageKey]);
  }

  // ------------------------------------------------------------ access

  /** The report if this user may see it: the author always, moderators once it was submitted. Else 404. */
  async findReadable(user: AuthUser, id: string): Promise<FieldReport> {
    const report = UUID.test(id) ? await this.reports.findOneBy({ id }) : null;
    if (!report) throw notFound();
    if (report.authorId === user.id) return report;
    if (roleAtLeast(user.role, 'moderator') && report.submittedAt !== null) return report;
    throw notFound();
  }

  private async ownDraft(user: AuthUser, id: string, what: string): Promise<FieldReport> {
    const report = await this.findReadable(user, id);
    if (report.authorId !== user.id) throw notFound();
    if (report.status !== 'draft') throw this.notDraft(what);
    return report;
  }

  private notDraft(what: string): ConflictException {
    return new ConflictException({ statusCode: 409, error: 'Conflict', message: `Only a draft can be ${what}; this report has been submitted, decided or withdrawn` });
  }

  // ------------------------------------------------------------ payload checks

  /**
   * The kind's rules (class-validator, errors named `payload.<field>`), the code through the
   * shared codec, then the references: known parts and teardowns, an existing cause or code to
   * correct. A valid code that is not in the catalogue is allowed and flagged.
   */
  async checkBody(kind: FieldReportKind, raw: Record<string, unknown>, em: EntityManager = this.dataSource.manager): Promise<{ payload: FieldReportPayload; proposesNewCode: boolean }> {
    const cls = PAYLOAD_CLASSES[kind];
    const instance = plainToInstance(cls as new () => object, raw ?? {}) as Record<string, unknown>;
    const shapeErrors = await validate(instance, { whitelist: true, forbidNonWhitelisted: true, stopAtFirstError: false });
    const errors: FieldError[] = flattenValidationErrors(shapeErrors, 'payload').map((e) => ({
      field: e.field,
      message: e.message.replace(/^property (\S+) should not exist$/, 'is not an accepted field'),
    }));
    if (errors.length) throw validationFailed(errors);
    const payload = defined({ ...instance }) as unknown as FieldReportPayload & { check?: unknown };
    if (payload.check && typeof payload.check === 'object') payload.check = defined({ ...(payload.check as object) });
    payload.code = parseCodeOr400(payload.code, 'payload.code').code;
    const inCatalogue = await em.getRepository(DtcCode).exist({ where: { code: payload.code } });

    if (kind === 'confirmed-fix') await this.checkConfirmedFix(em, payload as ConfirmedFixPayload, errors);
    else if (kind === 'new-cause') await this.checkNewCause(em, payload as NewCausePayload, errors);
    else await this.checkCorrection(em, payload as CorrectionPayload, inCatalogue, errors);
    if (errors.length) throw validationFailed(errors);
    if (!inCatalogue && kind === 'correction') throw validationFailed([{ field: 'payload.code', message: `${payload.code} is not in the catalogue: there is nothing to correct` }]);
    return { payload, proposesNewCode: !inCatalogue };
  }

  private async knownParts(em: EntityManager, keys: string[]): Promise<Set<string>> {
    if (keys.length === 0) return new Set();
    return new Set((await em.getRepository(Part).find({ where: { key: In(keys) } })).map((p) => p.key));
  }

  private async checkConfirmedFix(em: EntityManager, p: ConfirmedFixPayload, errors: FieldError[]): Promise<void> {
    const tried = p.triedFirst ?? [];
    const known = await this.knownParts(em, [p.part, ...tried]);
    if (!known.has(p.part)) errors.push({ field: 'payload.part', message: `there is no part ${p.part}; to propose a new part, file a new possible cause` });
    tried.forEach((k, i) => {
      if (!known.has(k)) errors.push({ field: `payload.triedFirst.${i}`, message: `there is no part ${k}` });
      else if (k === p.part) errors.push({ field: `payload.triedFirst.${i}`, message: 'is the part that fixed it; list only the parts tried before without success' });
    });
    if (p.triedFirst) p.triedFirst = [...new Set(tried)];
  }

  private async checkNewCause(em: EntityManager, p: NewCausePayload, errors: FieldError[]): Promise<void> {
    const scope = normaliseScope(p, errors, 'payload.');
    Object.assign(p, defined({ make: scope.make ?? undefined, model: scope.model ?? undefined, engine: scope.engine ?? undefined }));
    const known = await this.knownParts(em, [p.part]);
    if (!known.has(p.part)) {
      if (!p.partName) errors.push({ field: 'payload.partName', message: `is required: ${p.part} is not a known part, so name the new part (and give its system)` });
    } else {
      delete p.partName;
      delete p.system;
      const existing = await this.edits.causeWithScope(em, p.code, p.part, scope);
      if (existing) errors.push({ field: 'payload.part', message: `is already a possible cause of ${p.code} for ${describeScope(scope)}; file a correction instead` });
    }
    if (p.teardown) {
      const t = await em.getRepository(Teardown).findOneBy({ key: p.teardown });
      if (!t) errors.push({ field: 'payload.teardown', message: `there is no teardown ${p.teardown}` });
      else if (!scopeCovers(t, scope)) errors.push({ field: 'payload.teardown', message: `the teardown is for ${describeScope(t)}, which does not cover ${describeScope(scope)}` });
    }
  }

  private async checkCorrection(em: EntityManager, p: CorrectionPayload, inCatalogue: boolean, errors: FieldError[]): Promise<void> {
    if (p.target === 'cause') {
      if (p.field !== 'partCostMinor' && p.field !== 'replaceHours') errors.push({ field: 'payload.field', message: 'for a possible cause must be partCostMinor or replaceHours' });
      if (!p.part) {
        errors.push({ field: 'payload.part', message: 'is required: the part key of the possible cause to correct' });
        return;
      }
      const scope = normaliseScope(p, errors, 'payload.');
      if (errors.length || !inCatalogue) return;
      const cause = await this.edits.causeWithScope(em, p.code, p.part, scope);
      if (!cause) errors.push({ field: 'payload.part', message: `is not a possible cause of ${p.code} for ${describeScope(scope)}` });
    } else {
      if (p.field !== 'title' && p.field !== 'description') errors.push({ field: 'payload.field', message: 'for a code must be title or description' });
      if (p.part) errors.push({ field: 'payload.part', message: 'must be left out when correcting a code' });
      if (typeof p.value === 'string') p.value = p.value.trim();
      if (inCatalogue && p.make) {
        const entries = await em.getRepository(DtcCode).find({ where: { code: p.code } });
        if (!entries.some((e) => e.make.toLowerCase() === p.make!.toLowerCase())) errors.push({ field: 'payload.make', message: `${p.code} has no entry of its own for ${p.make}; leave make out to correct the generic entry` });
      }
    }
  }

  // ------------------------------------------------------------ mapping

  attachmentDto(a: Attachment): AttachmentDto {
    return {
      id: a.id,
      name: a.originalName,
      contentType: a.contentType,
      size: a.size,
      width: a.width,
      height: a.height,
      createdAt: new Date(a.createdAt).toISOString(),
      url: `/api/field-reports/${a.reportId}/attachments/${a.id}`,
    };
  }

  async partNames(reports: FieldReport[], em: EntityManager = this.dataSource.manager): Promise<Map<string, string>> {
    const keys = [...new Set(reports.flatMap((r) => partKeysOf(r.kind, r.payload)))];
    if (keys.length === 0) return new Map();
    const parts = await em.getRepository(Part).find({ where: { key: In(keys) } });
    return new Map(parts.map((p) => [p.key, p.name]));
  }

  async toSummaries(rows: FieldReport[]): Promise<FieldReportSummaryDto[]> {
    if (rows.length === 0) return [];
    const ids = rows.map((r) => r.id);
    const people = await this.users.find({ where: { id: In([...new Set(rows.map((r) => r.authorId))]) } });
    const byId = new Map(people.map((u) => [u.id, u]));
    const counts = await this.attachments
      .createQueryBuilder('a')
      .select('a.reportId', 'reportId')
      .addSelect('COUNT(*)', 'n')
      .where('a.reportId IN (:...ids)', { ids })
      .groupBy('a.reportId')
      .getRawMany<{ reportId: string; n: string | number }>();
    const countOf = new Map(counts.map((c) => [c.reportId, Number(c.n)]));
    const names = await this.partNames(rows);
    return rows.map((r) => this.summary(r, byId.get(r.authorId) ?? null, countOf.get(r.id) ?? 0, names));
  }

  private summary(r: FieldReport, author: User | null, attachmentCount: number, names: Map<string, string>): FieldReportSummaryDto {
    const iso = (d: Date | null) => (d ? new Date(d).toISOString() : null);
    return {
      id: r.id,
      kind: r.kind,
      status: r.status,
      code: r.code,
      title: reportTitle(r.kind, r.payload, names),
      proposesNewCode: r.proposesNewCode,
      author: { id: r.authorId, displayName: author?.displayName ?? 'Former user' },
      attachmentCount,
      createdAt: new Date(r.createdAt).toISOString(),
      updatedAt: new Date(r.updatedAt).toISOString(),
      submittedAt: iso(r.submittedAt),
      decidedAt: iso(r.decidedAt),
    };
  }

  async toDto(r: FieldReport): Promise<FieldReportDto> {
    const ids = [r.authorId, ...(r.decidedById ? [r.decidedById] : [])];
    const people = new Map((await this.users.find({ where: { id: In(ids) } })).map((u) => [u.id, u]));
    const files = await this.attachments.find({ where: { reportId: r.id }, order: { createdAt: 'ASC', id: 'ASC' } });
    const names = await this.partNames([r]);
    const decider = r.decidedById ? people.get(r.decidedById) : undefined;
    return {
      ...this.summary(r, people.get(r.authorId) ?? null, files.length, names),
      payload: r.payload,
      attachments: files.map((a) => this.attachmentDto(a)),
      decidedBy: r.decidedById ? { id: r.decidedById, displayName: decider?.displayName ?? 'Former user' } : null,
      decisionNote: r.decisionNote,
      notifiedAt: r.notifiedAt ? new Date(r.notifiedAt).toISOString() : null,
    };
  }

  get publicUrl(): string {
    return this.app.publicUrl.replace(/\/+$/, '');
  }
}
