import { ConflictException, ForbiddenException, Injectable, Logger, NotFoundException } from '@nestjs/common';
import { InjectDataSource, InjectRepository } from '@nestjs/typeorm';
import { DataSource, Not, IsNull, Repository, type EntityManager, type FindOptionsWhere } from 'typeorm';
import type { ConfirmedFixPayload, CorrectionPayload, FieldReportDto, FieldReportSummaryDto, NewCausePayload, Page, ReviewReportDto } from '@causeway/shared';
import type { AuthUser } from '../auth/auth-user';
import { AuditService } from '../audit/audit.service';
import { parseCodeOr400 } from '../codes/codes.service';
import { DtcCode } from '../codes/entities/dtc-code.entity';
import { validationFailed } from '../common/validation';
import { Part } from '../knowledge/entities/part.entity';
import { LikelihoodService } from '../knowledge/likelihood.service';
import { describeScope, normaliseVehicle } from '../knowledge/scope';
import { MailService } from '../mail/mail.service';
import { KnowledgeEditsService, normaliseScope } from '../moderation/knowledge-edits.service';
import { User } from '../users/entities/user.entity';
import type { ApproveReportDto, RejectReportDto, ReviewQueueQuery } from './dto/field-report.dto';
import { FieldReport } from './entities/field-report.entity';
import { FieldReportsService, notFound, reportTitle } from './field-reports.service';
import { decisionMail } from './review-mail';
import { proposedCodeTitle, ReviewDiffService } from './review-diff.service';

const UUID = /^[0-9a-f]{8}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{12}$/i;

/**
 * The review desk: the queue of submitted reports, each with what approving would change,
 * and the decisions. Approving applies the change (or records the outcome) in one transaction
 * with the decision and its audit entry; the author is e-mailed afterwards, and a mail that
 * cannot be sent never undoes a decision.
 */
@Injectable()
export class ReviewService {
  private readonly logger = new Logger(ReviewService.name);

  constructor(
    @InjectDataSource() private readonly dataSource: DataSource,
    @InjectRepository(FieldReport) private readonly reports: Repository<FieldReport>,
    @InjectRepository(User) private readonly users: Repository<User>,
    private readonly fieldReports: FieldReportsService,
    private readonly diffs: ReviewDiffService,
    private readonly edits: KnowledgeEditsService,
    private readonly likelihood: LikelihoodService,
    private readonly audit: AuditService,
    private readonly mail: MailService,
  ) {}

  async queue(q: ReviewQueueQuery): Promise<Page<FieldReportSummaryDto>> {
    const where: FindOptionsWhere<FieldReport> = { status: q.status, submittedAt: Not(IsNull()) };
    if (q.kind) where.kind = q.kind;
    if (q.code) where.code = parseCodeOr400(q.code, 'code').code;
    if (q.proposesNewCode !== undefined) where.proposesNewCode = q.proposesNewCode;
    // The queue is first come, first served; decided reports show the latest first.
    const order = q.status === 'submitted' ? ({ submittedAt: 'ASC', id: 'ASC' } as const) : ({ decidedAt: 'DESC', updatedAt: 'DESC', id: 'ASC' } as const);
    const [rows, total] = await this.reports.findAndCount({ where, order, skip: (q.page - 1) * q.pageSize, take: q.pageSize });
    return { items: await this.fieldReports.toSummaries(rows), total, page: q.page, pageSize: q.pageSize };
  }

  async detail(user: AuthUser, id: string): Promise<ReviewReportDto> {
    const report = await this.reviewable(id);
    const dto = await this.fieldReports.toDto(report);
    const diff = await this.diffs.diff(report);
    if (report.authorId === user.id) {
      diff.applicable = false;
      diff.blockers.unshift('This is your own report: another moderator must decide it.');
    }
    if (report.status !== 'submitted') {
      diff.applicable = false;
      diff.blockers.unshift(`This report is ${report.status}: there is nothing to decide.`);
    }
    return { ...dto, diff };
  }

  async approve(user: AuthUser, id: string, dto: ApproveReportDto): Promise<FieldReportDto> {
    const report = await this.decidable(user, id);
    const note = dto.note?.trim() || null;
    await this.dataSource.transaction(async (em) => {
      await this.claim(em, report, user, 'approved', note);
      const applied = await this.apply(em, report, user, dto, note);
      await this.audit.record(em, user, {
        action: 'report.approve',
        entityType: 'field-report',
        entityId: report.id,
        before: { status: 'submitted' },
        after: { status: 'approved', kind: report.kind, code: report.code, applied },
        note,
      });
    });
    return this.notify(report.id);
  }

  async reject(user: AuthUser, id: string, dto: RejectReportDto): Promise<FieldReportDto> {
    const report = await this.decidable(user, id);
    await this.dataSource.transaction(async (em) => {
      await this.claim(em, report, user, 'rejected', dto.reason);
      await this.audit.record(em, user, {
        action: 'report.reject',
        entityType: 'field-report',
        entityId: report.id,
        before: { status: 'submitted' },
        after: { status: 'rejected', kind: report.kind, code: report.code },
        note: dto.reason,
      });
    });
    return this.notify(report.id);
  }

  // ------------------------------------------------------------ helpers

  /** Moderators may look at anything that was submitted; drafts stay private (404). */
  private async reviewable(id: string): Promise<FieldReport> {
    const report = UUID.test(id) ? await this.reports.findOneBy({ id }) : null;
    if (!report || report.submittedAt === null) throw notFound();
    return report;
  }

  private async decidable(user: AuthUser, id: string): Promise<FieldReport> {
    const report = await this.reviewable(id);
    if (report.authorId === user.id) {
      throw new ForbiddenException({ statusCode: 403, error: 'Forbidden', message: 'You cannot decide your own field report: another moderator must review it' });
    }
    if (report.status !== 'submitted') throw this.alreadyDecided(report.status);
    return report;
  }

  private alreadyDecided(status: string): ConflictException {
    return new ConflictException({ statusCode: 409, error: 'Conflict', message: `This report is ${status}: it can no longer be decided` });
  }

  /** Moves the report from submitted to its decision; only one decision can win. */
  private async claim(em: EntityManager, report: FieldReport, user: AuthUser, status: 'approved' | 'rejected', note: string | null): Promise<void> {
    const result = await em.getRepository(FieldReport).update(
      { id: report.id, status: 'submitted' },
      { status, decidedAt: new Date(), decidedById: user.id, decisionNote: note, notifiedAt: null, notifyError: null },
    );
    if (!result.affected) {
      const now = await em.getRepository(FieldReport).findOneBy({ id: report.id });
      throw this.alreadyDecided(now?.status ?? 'gone');
    }
  }

  /** Writes what the report proposes, each write with its own audit entry; returns what was done for the decision's entry. */
  private async apply(em: EntityManager, report: FieldReport, user: AuthUser, dto: ApproveReportDto, note: string | null): Promise<Record<string, unknown>> {
    const via = `Field report ${report.id}${note ? `: ${note}` : ''}`;
    const out: Record<string, unknown> = {};
    if (report.kind !== 'correction' && !(await em.getRepository(DtcCode).exist({ where: { code: report.code } }))) {
      const title = proposedCodeTitle(report.code, (report.payload as ConfirmedFixPayload | NewCausePayload).codeTitle);
      const entry = await this.edits.createCodeIn(em, user, report.code, title, via);
      out.codeCreated = { code: entry.code, title: entry.title };
    }

    if (report.kind === 'confirmed-fix') {
      const p = report.payload as ConfirmedFixPayload;
      const vehicle = normaliseVehicle({ make: p.make, model: p.model, engine: p.engine ?? undefined, year: p.year ?? undefined });
      const recorded = await this.likelihood.recordOutcome(em, {
        source: 'field-report',
        sourceId: report.id,
        userId: report.authorId,
        shopId: report.shopId,
        code: report.code,
        vehicle,
        fixedBy: [p.part],
      });
      await this.audit.record(em, user, { action: 'outcome.record', entityType: 'outcome', entityId: `field-report:${report.id}`, before: null, after: { code: report.code, vehicle, credits: recorded.credits }, note: via });
      out.outcome = { credits: recorded.credits, summary: recorded.summary };
      return out;
    }

    if (report.kind === 'new-cause') {
      const p = report.payload as NewCausePayload;
      const scope = normaliseScope(p, []);
      if (!(await em.getRepository(Part).exist({ where: { key: p.part } }))) {
        const system = dto.partSystem ?? p.system;
        if (!system) throw validationFailed([{ field: 'partSystem', message: `is required: the report proposes a new part ${p.part} without a system` }]);
        await this.edits.createPartIn(em, user, { key: p.part, name: p.partName ?? p.part, system }, via);
        out.partCreated = { key: p.part, name: p.partName ?? p.part, system };
      }
      const cause = await this.edits.createCauseIn(
        em,
        user,
        { code: report.code, partKey: p.part, prior: p.prior, partCostMinor: p.partCostMinor, currency: p.currency, replaceHours: p.replaceHours, teardownKey: p.teardown ?? null, check: p.check ?? null, ...scope },
        via,
        'payload.',
      );
      out.causeCreated = { id: cause.id, scope: describeScope(scope) };
      return out;
    }

    const p = report.payload as CorrectionPayload;
    if (p.target === 'cause') {
      const scope = normaliseScope(p, []);
      const cause = await this.edits.causeWithScope(em, report.code, p.part!, scope);
      if (!cause) throw new ConflictException({ statusCode: 409, error: 'Conflict', message: `${p.part} is no longer a possible cause of ${report.code} for ${describeScope(scope)}: reject the report` });
      const updated = await this.edits.updateCauseIn(em, user, cause, { [p.field]: p.value }, 'cause.update', via, 'payload.');
      out.causeUpdated = { id: updated.id, field: p.field, value: p.value };
      return out;
    }
    let entry: DtcCode;
    try {
      entry = await this.edits.findCodeEntry(em, report.code, p.make ?? null);
    } catch (err) {
      if (err instanceof NotFoundException) throw new ConflictException({ statusCode: 409, error: 'Conflict', message: `${report.code} is no longer in the catalogue: reject the report` });
      throw err;
    }
    await this.edits.applyCodeChangesIn(em, user, entry, { [p.field]: p.value }, 'code.update', via);
    out.codeUpdated = { code: entry.code, make: entry.make || null, field: p.field };
    return out;
  }

  /** E-mails the author the decision; records when it went, or why not. Never throws. */
  private async notify(id: string): Promise<FieldReportDto> {
    const report = await this.reports.findOneByOrFail({ id });
    try {
      const author = await this.users.findOneBy({ id: report.authorId });
      if (!author) {
        await this.reports.update({ id }, { notifiedAt: null, notifyError: 'The author no longer has an account' });
      } else {
        const names = await this.fieldReports.partNames([report]);
        const result = await this.mail.send(
          decisionMail({
            to: author.email,
            name: author.displayName,
            status: report.status as 'approved' | 'rejected',
            title: reportTitle(report.kind, report.payload, names),
            note: report.decisionNote,
            link: `${this.fieldReports.publicUrl}/field-reports/${report.id}`,
          }),
        );
        await this.reports.update({ id }, result.sent ? { notifiedAt: new Date(), notifyError: null } : { notifiedAt: null, notifyError: result.reason });
      }
    } catch (err) {
      // The decision is committed; a failure to tell the author is logged, not returned as an error.
      this.logger.error(`Decision mail for field report ${id} failed: ${(err as Error).message}`);
    }
    return this.fieldReports.toDto(await this.reports.findOneByOrFail({ id }));
  }
}
