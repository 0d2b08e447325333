import { Body, Controller, Get, HttpCode, Param, Post, Query } from '@nestjs/common';
import { ApiBearerAuth, ApiBody, ApiTags } from '@nestjs/swagger';
import {
  PlanInputError,
  planFixPath,
  validatePlanInput,
  type AdHocFixPathResponse,
  type CauseRankingDto,
  type ExchangeRateDto,
  type FieldError,
  type FixPathDto,
  type MoneyContext,
  type PartDto,
  type PlanInput,
  type PossibleCauseRowDto,
  type TeardownDto,
  type VehicleScopeQuery,
} from '@causeway/shared';
import type { AuthUser } from '../auth/auth-user';
import { CurrentUser } from '../common/decorators/current-user.decorator';
import { validationFailed } from '../common/validation';
import { ShopsService } from '../shops/shops.service';
import { AdHocFixPathDoc, CausesListQueryDto, FixPathQueryDto, MoneyQueryDto, type VehicleQueryDto } from './dto/knowledge.dto';
import { KnowledgeService } from './knowledge.service';

const BODY_FIELDS = new Set(['causes', 'teardowns', 'verificationCost', 'escalationCost', 'unlistedProbability', 'addOns']);
const CAUSE_FIELDS = new Set(['key', 'label', 'probability', 'replaceCost', 'checkCost', 'checkFirst', 'teardown']);
const ADDON_FIELDS = new Set(['key', 'label', 'teardown', 'cost']);

function isRecord(x: unknown): x is Record<string, unknown> {
  return x !== null && typeof x === 'object' && !Array.isArray(x);
}

/** Fields the planner does not know, refused like the global pipe's `forbidNonWhitelisted`. */
function unknownFields(body: Record<string, unknown>): FieldError[] {
  const out: FieldError[] = [];
  for (const k of Object.keys(body)) if (!BODY_FIELDS.has(k)) out.push({ field: k, message: 'is not an accepted field' });
  const nested = (list: unknown, name: string, allowed: Set<string>) => {
    if (!Array.isArray(list)) return;
    list.forEach((item, i) => {
      if (isRecord(item)) for (const k of Object.keys(item)) if (!allowed.has(k)) out.push({ field: `${name}.${i}.${k}`, message: 'is not an accepted field' });
    });
  };
  nested(body.causes, 'causes', CAUSE_FIELDS);
  nested(body.addOns, 'addOns', ADDON_FIELDS);
  return out;
}

function vehicleOf(q: VehicleQueryDto): VehicleScopeQuery {
  return { make: q.make, model: q.model, engine: q.engine, year: q.year };
}

@ApiTags('knowledge')
@ApiBearerAuth()
@Controller()
export class KnowledgeController {
  constructor(
    private readonly knowledge: KnowledgeService,
    private readonly shops: ShopsService,
  ) {}

  /** Ranked possible causes with probability, 90 % interval, evidence and costs in the shop's currency. */
  @Get('codes/:code/causes')
  async causes(@CurrentUser() user: AuthUser, @Param('code') code: string, @Query() q: MoneyQueryDto): Promise<CauseRankingDto> {
    return this.knowledge.rankCauses(code, vehicleOf(q), await this.moneyFor(user, q));
  }

  /** The expected-cost-optimal fix path at the shop's labour rate (net of tax), with both baselines. */
  @Get('codes/:code/fix-path')
  async fixPath(@CurrentUser() user: AuthUser, @Param('code') code: string, @Query() q: FixPathQueryDto): Promise<FixPathDto> {
    const money = await this.moneyFor(user, q);
    const excludedParts = q.exclude ? q.exclude.split(',') : [];
    const dto = await this.knowledge.planForCode(code, vehicleOf(q), money, { excludedParts });
    if (dto.notListed.length > 0) {
      throw validationFailed([{ field: 'exclude', message: `${dto.notListed.join(', ')}: not a possible cause of ${dto.code} for this vehicle` }]);
    }
    return dto;
  }

  /** A fix path for an ad-hoc set of causes, costs in any one unit. */
  @Post('fix-paths')
  @HttpCode(200)
  @ApiBody({ type: AdHocFixPathDoc })
  adHoc(@Body() body: unknown): AdHocFixPathResponse {
    if (!isRecord(body)) throw validationFailed([{ field: 'body', message: 'must be an object with causes, teardowns, verificationCost and unlistedProbability' }]);
    const issues = [...unknownFields(body), ...validatePlanInput(body)];
    if (issues.length > 0) throw validationFailed(issues.map((i) => ({ field: i.field || 'body', message: i.message })));
    try {
      return planFixPath(body as unknown as PlanInput);
    } catch (e) {
      if (e instanceof PlanInputError) throw validationFailed(e.issues);
      throw e;
    }
  }

  @Get('parts')
  parts(): Promise<PartDto[]> {
    return this.knowledge.listParts();
  }

  @Get('teardowns')
  teardowns(): Promise<TeardownDto[]> {
    return this.knowledge.listTeardowns();
  }

  @Get('causes')
  causeRows(@Query() q: CausesListQueryDto): Promise<PossibleCauseRowDto[]> {
    return this.knowledge.listCauses(q.code);
  }

  @Get('exchange-rates')
  exchangeRates(): Promise<ExchangeRateDto[]> {
    return this.knowledge.exchangeRates();
  }

  /** The shop's money context, with any query values overriding it; an account without a shop must give rate and currency. */
  private async moneyFor(user: AuthUser, q: MoneyQueryDto): Promise<MoneyContext> {
    let base: MoneyContext | null = null;
    if (user.shopId) {
      const shop = await this.shops.shopOf(user);
      base = { currency: shop.currency, locale: shop.locale, labourRateMinor: shop.labourRateMinor, taxRateBp: shop.taxRateBp };
    } else if (q.labourRateMinor === undefined || q.currency === undefined) {
      const errors: FieldError[] = [];
      if (q.labourRateMinor === undefined) errors.push({ field: 'labourRateMinor', message: 'is required: your account has no shop, and the fix path needs a labour rate' });
      if (q.currency === undefined) errors.push({ field: 'currency', message: 'is required: your account has no shop, and costs need a currency' });
      throw validationFailed(errors);
    }
    return {
      currency: q.currency ?? base!.currency,
      locale: q.locale ?? base?.locale ?? 'en-GB',
      labourRateMinor: q.labourRateMinor ?? base!.labourRateMinor,
      taxRateBp: q.taxRateBp ?? base?.taxRateBp ?? 0,
    };
  }
}
