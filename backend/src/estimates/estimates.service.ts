import { ConflictException, GoneException, Inject, Injectable, NotFoundException, UnprocessableEntityException } from '@nestjs/common';
import { InjectRepository } from '@nestjs/typeorm';
import { createHash, randomBytes } from 'node:crypto';
import { Repository } from 'typeorm';
import type { CreateEstimateResponse, EstimateDto, PublicEstimateDto } from '@causeway/shared';
import type { AuthUser } from '../auth/auth-user';
import { appConfig, type AppConfig } from '../config/configuration';
import { validationFailed } from '../common/validation';
import type { Job } from '../jobs/entities/job.entity';
import { JobsService } from '../jobs/jobs.service';
import { MailService } from '../mail/mail.service';
import { Shop } from '../shops/entities/shop.entity';
import { ShopsService } from '../shops/shops.service';
import type { CreateEstimateDto, EstimateAnswerDto, ResendEstimateDto } from './dto/estimate.dto';
import { EstimateAnswer } from './entities/estimate-answer.entity';
import { Estimate } from './entities/estimate.entity';
import { estimateMail } from './estimate-mail';
import { decisionsOf, ESTIMATE_NOTE, ESTIMATE_ROUNDING, sortedAnswers, toEstimateDto } from './estimate-mapper';
import { buildStages, type CodeFixPath } from '@causeway/shared';
import { estimatesConfig, type EstimatesConfig } from './estimates.config';

const UUID = /^[0-9a-f]{8}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{12}$/i;
/** 32 random bytes in base64url: 43 characters. */
const TOKEN = /^[A-Za-z0-9_-]{43}$/;

/** A fresh link token (256 random bits) and the only thing stored of it, its SHA-256 hash. */
export function newEstimateToken(): { token: string; hash: string } {
  const token = randomBytes(32).toString('base64url');
  return { token, hash: hashToken(token) };
}

export function hashToken(token: string): string {
  return createHash('sha256').update(token, 'utf8').digest('hex');
}

function unknownLink(): NotFoundException {
  return new NotFoundException({ statusCode: 404, error: 'Not Found', message: 'This estimate link is not known. Check that the whole link was copied, or ask the garage to send it again.' });
}

@Injectable()
export class EstimatesService {
  constructor(
    @InjectRepository(Estimate) private readonly estimates: Repository<Estimate>,
    @InjectRepository(EstimateAnswer) private readonly answers: Repository<EstimateAnswer>,
    @InjectRepository(Shop) private readonly shopRepo: Repository<Shop>,
    @Inject(appConfig.KEY) private readonly app: AppConfig,
    @Inject(estimatesConfig.KEY) private readonly config: EstimatesConfig,
    private readonly shops: ShopsService,
    private readonly jobs: JobsService,
    private readonly mail: MailService,
  ) {}

  // ------------------------------------------------------------ the shop's side

  async create(user: AuthUser, jobId: string, dto: CreateEstimateDto): Promise<CreateEstimateResponse> {
    const shop = await this.shops.shopOf(user);
    const job = await this.jobs.findOwned(shop, jobId);
    if (job.status === 'closed') throw new ConflictException({ statusCode: 409, error: 'Conflict', message: 'This job is closed: a staged estimate is for work still to do' });
    const paths = await this.jobs.codePaths(job, shop);
    const withPath: CodeFixPath[] = [];
    job.codes.forEach((c, i) => {
      const fp = paths[i].fixPath;
      if (fp && fp.plan.stages.length > 0) withPath.push({ code: c.code, title: paths[i].title, fixPath: fp });
    });
    if (withPath.length === 0) {
      throw new UnprocessableEntityException({
        statusCode: 422,
        error: 'Unprocessable Entity',
        message: 'No code of this job has a fix path to estimate (cleared, or no possible cause is known)',
        details: { codes: job.codes.map((c, i) => ({ code: c.code, note: paths[i].note })) },
      });
    }
    const { stages, totals } = buildStages(withPath, shop.taxRateBp);
    const { token, hash } = newEstimateToken();
    const estimate = await this.estimates.save(
      this.estimates.create({
        shopId: shop.id,
        jobId: job.id,
        tokenHash: hash,
        expiresAt: this.expiry(dto.expiresInDays),
        currency: shop.currency,
        locale: shop.locale,
        taxRateBp: shop.taxRateBp,
        codes: job.codes.map((c, i) => ({ code: c.code, title: paths[i].title })),
        stages,
        totals,
        message: dto.message ?? null,
        recipientEmail: dto.recipientEmail ?? job.vehicle.ownerEmail ?? null,
        emailedAt: null,
        emailError: null,
        createdById: user.id,
      }),
    );
    return this.send(estimate, job, shop, token);
  }

  /** Sends the estimate again with a new link (the old one stops working) and a new expiry. */
  async resend(user: AuthUser, jobId: string, estimateId: string, dto: ResendEstimateDto): Promise<CreateEstimateResponse> {
    const shop = await this.shops.shopOf(user);
    const job = await this.jobs.findOwned(shop, jobId);
    if (job.status === 'closed') throw new ConflictException({ statusCode: 409, error: 'Conflict', message: 'This job is closed: its estimates are no longer sent' });
    const estimate = await this.findOwned(shop, job.id, estimateId);
    const { token, hash } = newEstimateToken();
    estimate.tokenHash = hash;
    estimate.expiresAt = this.expiry(dto.expiresInDays);
    if (dto.recipientEmail) estimate.recipientEmail = dto.recipientEmail;
    else estimate.recipientEmail ??= job.vehicle.ownerEmail ?? null;
    await this.estimates.save(estimate);
    return this.send(estimate, job, shop, token);
  }

  async list(user: AuthUser, jobId: string): Promise<EstimateDto[]> {
    const shop = await this.shops.shopOf(user);
    const job = await this.jobs.findOwned(shop, jobId);
    const rows = await this.estimates.find({ where: { jobId: job.id, shopId: shop.id }, relations: { answers: true }, order: { createdAt: 'DESC' } });
    return rows.map((e) => toEstimateDto(e));
  }

  async get(user: AuthUser, jobId: string, estimateId: string): Promise<EstimateDto> {
    const shop = await this.shops.shopOf(user);
    const job = await this.jobs.findOwned(shop, jobId);
    return toEstimateDto(await this.findOwned(shop, job.id, estimateId));
  }

  // ------------------------------------------------------------ the vehicle owner's side (public)

  async publicGet(token: string): Promise<PublicEstimateDto> {
    const { estimate, job, shop } = await this.byToken(token);
    return this.publicDto(estimate, job, shop);
  }

  async publicAnswer(token: string, dto: EstimateAnswerDto): Promise<PublicEstimateDto> {
    const { estimate, job, shop } = await this.byToken(token);
    if (job.status === 'closed') {
      throw new ConflictException({ statusCode: 409, error: 'Conflict', message: `The job this estimate belongs to is closed, so answers are no longer taken. Please contact ${shop.name}.` });
    }
    if (dto.stageIndex >= estimate.stages.length) {
      throw validationFailed([{ field: 'stageIndex', message: `must be a stage of this estimate: 0 to ${estimate.stages.length - 1}` }]);
    }
    await this.answers.save(this.answers.create({ estimateId: estimate.id, stageIndex: dto.stageIndex, decision: dto.decision, name: dto.name ?? null, answeredAt: new Date() }));
    estimate.answers = await this.answers.find({ where: { estimateId: estimate.id } });
    return this.publicDto(estimate, job, shop);
  }

  // ------------------------------------------------------------ helpers

  private expiry(days: number | undefined): Date {
    return new Date(Date.now() + (days ?? this.config.expiryDays) * 86_400_000);
  }

  private link(token: string): string {
    return `${this.app.publicUrl.replace(/\/+$/, '')}/estimate/${token}`;
  }

  /** E-mails the estimate; a failure is recorded on it and reported, never thrown: the estimate stays saved. */
  private async send(estimate: Estimate, job: Job, shop: Shop, token: string): Promise<CreateEstimateResponse> {
    const link = this.link(token);
    let emailError: string | null = null;
    if (!estimate.recipientEmail) {
      emailError = "The vehicle has no owner e-mail address: add one to the vehicle (or give recipientEmail) and send again, or hand over the link.";
    } else {
      const result = await this.mail.send(
        estimateMail({
          to: estimate.recipientEmail,
          shopName: shop.name,
          vehicle: { make: job.vehicle.make, model: job.vehicle.model, year: job.vehicle.year, plate: job.vehicle.plate },
          complaint: job.complaint,
          codes: estimate.codes,
          message: estimate.message,
          stages: estimate.stages,
          totals: estimate.totals,
          currency: estimate.currency,
          locale: estimate.locale,
          taxRateBp: estimate.taxRateBp,
          link,
          expiresAt: new Date(estimate.expiresAt),
        }),
      );
      if (result.sent) {
        estimate.emailedAt = new Date();
      } else {
        emailError = `The e-mail was not sent: ${result.reason}. The estimate is saved; send it again later or hand over the link.`;
      }
    }
    estimate.emailError = emailError;
    await this.estimates.update({ id: estimate.id }, { emailedAt: estimate.emailedAt, emailError });
    const saved = await this.estimates.findOneOrFail({ where: { id: estimate.id }, relations: { answers: true } });
    return { estimate: toEstimateDto(saved), link, emailed: emailError === null, emailError };
  }

  private async findOwned(shop: Shop, jobId: string, id: string): Promise<Estimate> {
    const estimate = UUID.test(id) ? await this.estimates.findOne({ where: { id, jobId, shopId: shop.id }, relations: { answers: true } }) : null;
    if (!estimate) throw new NotFoundException('Estimate not found');
    return estimate;
  }

  private async byToken(token: string): Promise<{ estimate: Estimate; job: Job; shop: Shop }> {
    if (!TOKEN.test(token)) throw unknownLink();
    const estimate = await this.estimates.findOne({ where: { tokenHash: hashToken(token) }, relations: { answers: true, job: { vehicle: true, codes: true } } });
    if (!estimate) throw unknownLink();
    const shop = await this.shopRepo.findOneOrFail({ where: { id: estimate.shopId } });
    const expiresAt = new Date(estimate.expiresAt);
    if (expiresAt.getTime() <= Date.now()) {
      const when = expiresAt.toLocaleDateString(estimate.locale, { day: 'numeric', month: 'long', year: 'numeric', timeZone: 'UTC' });
      throw new GoneException({
        statusCode: 410,
        error: 'Gone',
        message: `This estimate link expired on ${when}. Please ask ${shop.name} to send a new one.`,
        details: { expiredAt: expiresAt.toISOString(), shop: shop.name },
      });
    }
    estimate.job.codes.sort((a, b) => a.position - b.position);
    return { estimate, job: estimate.job, shop };
  }

  private async publicDto(estimate: Estimate, job: Job, shop: Shop): Promise<PublicEstimateDto> {
    const answers = sortedAnswers(estimate.answers);
    const v = job.vehicle;
    return {
      shop: { name: shop.name },
      vehicle: { make: v.make, model: v.model, year: v.year, plate: v.plate },
      complaint: job.complaint,
      codes: estimate.codes,
      message: estimate.message,
      currency: estimate.currency,
      locale: estimate.locale,
      taxRateBp: estimate.taxRateBp,
      createdAt: new Date(estimate.createdAt).toISOString(),
      expiresAt: new Date(estimate.expiresAt).toISOString(),
      stages: estimate.stages,
      totals: estimate.totals,
      decisions: decisionsOf(estimate.stages.length, answers),
      answers,
      rounding: ESTIMATE_ROUNDING,
      note: ESTIMATE_NOTE,
      acceptingAnswers: job.status === 'open',
    };
  }
}
