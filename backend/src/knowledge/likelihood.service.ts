import { Inject, Injectable } from '@nestjs/common';
import { InjectDataSource } from '@nestjs/typeorm';
import { DataSource, type EntityManager } from 'typeorm';
import {
  backoffPosterior,
  capInfluence,
  fractionalCredit,
  UNLISTED_KEY,
  type BackoffLevel,
  type CauseLikelihood,
  type FieldError,
  type OutcomeCreditDto,
  type OutcomeSource,
  type RecordedOutcomeDto,
  type ScopeLevelDto,
  type VehicleScopeQuery,
} from '@causeway/shared';
import { appConfig, type AppConfig } from '../config/configuration';
import { parseCodeOr400 } from '../codes/codes.service';
import { VersionedCache } from '../common/cache/versioned-cache.service';
import { validationFailed } from '../common/validation';
import { knowledgeConfig, type KnowledgeConfig } from './knowledge.config';
import { Outcome } from './entities/outcome.entity';
import { PossibleCause } from './entities/possible-cause.entity';
import { chooseList, levelName, normaliseVehicle, outcomeLevel, rowLevel, vehicleLevel, type ScopeLevel, type Scoped } from './scope';

/** The likelihoods of one code's possible causes for one vehicle. */
export interface CodeLikelihoods {
  code: string;
  vehicle: VehicleScopeQuery;
  /** The possible-cause rows used (part and teardown loaded), in curated order. */
  list: PossibleCause[];
  listScope: Scoped | null;
  levels: ScopeLevelDto[];
  /** Posterior per part key. */
  byKey: Map<string, CauseLikelihood>;
  unlisted: CauseLikelihood;
  totalEvidence: number;
  capped: boolean;
  priorStrength: number;
}

export interface RecordOutcomeInput {
  source: OutcomeSource;
  /** The job or field report id; null for demo data. Re-recording the same (source, sourceId, code) replaces the earlier credit. */
  sourceId: string | null;
  userId: string;
  shopId: string | null;
  code: string;
  vehicle: VehicleScopeQuery;
  /** Part keys replaced by the stage that cleared the code; empty = fixed by something else (a cause not listed). */
  fixedBy: string[];
}

function pct(x: number): string {
  return `${Math.round(x * 100)} %`;
}

/**
 * Learned likelihoods (product.md §2): Dirichlet posterior with vehicle-scope back-off,
 * influence caps, and the outcome records that feed it.
 *
 * Back-off rule: the list of possible causes is the one of the most specific scope that
 * applies to the vehicle (see scope.ts). Its curated weights are the prior at the list's own
 * level; from there the levels run general → specific down to what the vehicle states
 * (all vehicles → make → make + model [+ engine]). Each outcome is counted once, at the most
 * specific level it shares with the vehicle, so the posterior of the level above (which
 * holds the other vehicles' outcomes) is the prior of the level below. Outcomes of vehicles
 * outside the list's scope are not counted (they belong to another list). An outcome whose
 * part is not on the list counts for "a cause not listed". Caps apply per level.
 */
@Injectable()
export class LikelihoodService {
  constructor(
    @InjectDataSource() private readonly dataSource: DataSource,
    @Inject(appConfig.KEY) private readonly app: AppConfig,
    @Inject(knowledgeConfig.KEY) private readonly config: KnowledgeConfig,
    private readonly cache: VersionedCache,
  ) {}

  get priorStrength(): number {
    return this.app.priorStrength;
  }

  /** @throws BadRequestException (400 naming the position) for a code the shared codec rejects */
  async likelihoods(codeInput: string, vehicleIn: VehicleScopeQuery, em: EntityManager = this.dataSource.manager): Promise<CodeLikelihoods> {
    const code = parseCodeOr400(codeInput, 'code').code;
    const vehicle = normaliseVehicle(vehicleIn);
    const rows = await em.getRepository(PossibleCause).find({ where: { code }, relations: { part: true, teardown: true }, order: { prior: 'DESC', partKey: 'ASC' } });
    const { scope, rows: list } = chooseList(rows, vehicle);
    const keys = new Set(list.map((c) => c.partKey));

    const from: ScopeLevel = scope === null ? 0 : rowLevel(scope);
    const to = vehicleLevel(vehicle);
    const levelIds: ScopeLevel[] = [];
    for (let l = from; l <= to; l++) levelIds.push(l as ScopeLevel);

    const outcomes = await em.getRepository(Outcome).find({ where: { code } });
    const perLevel = new Map<ScopeLevel, Outcome[]>(levelIds.map((l) => [l, []]));
    for (const o of outcomes) perLevel.get(outcomeLevel(o, vehicle, scope))?.push(o);

    let capped = false;
    const levels: BackoffLevel[] = levelIds.map((l) => {
      const credits = (perLevel.get(l) ?? []).map((o) => ({
        causeKey: o.causeKey !== null && keys.has(o.causeKey) ? o.causeKey : null,
        weight: Math.min(1, Math.max(0, o.weight)),
        userId: o.userId,
        shopId: o.shopId,
      }));
      const c = capInfluence(credits, { perUser: this.config.influenceCapUser, perShop: this.config.influenceCapShop });
      capped ||= c.capped;
      return { scope: levelName(l, vehicle), counts: c.counts, unlisted: c.unlisted };
    });

    // Curated weights are kept at most 1 by the editors; scale defensively rather than fail a request.
    const sum = list.reduce((s, c) => s + c.prior, 0);
    const priors = list.map((c) => ({ key: c.partKey, weight: sum > 1 ? c.prior / sum : c.prior }));
    const posterior = backoffPosterior(priors, levels, this.app.priorStrength);
    return {
      code,
      vehicle,
      list,
      listScope: scope,
      levels: posterior.levels.map((l) => ({ scope: l.scope, evidence: l.posterior.totalEvidence })),
      byKey: new Map(posterior.causes.map((c) => [c.key, c])),
      unlisted: posterior.unlisted,
      totalEvidence: posterior.totalEvidence,
      capped,
      priorStrength: this.app.priorStrength,
    };
  }

  /**
   * Records one verified fix as outcome rows in the caller's transaction. A fix by several
   * parts at once is credited to them in proportion to their current likelihoods; parts that
   * are not possible causes of this code for this vehicle share the credit of "a cause not
   * listed" (with its likelihood as weight). Recording again for the same (source, sourceId,
   * code) replaces the earlier credit.
   */
  async recordOutcome(em: EntityManager, input: RecordOutcomeInput): Promise<RecordedOutcomeDto> {
    const code = parseCodeOr400(input.code, 'code').code;
    const issues: FieldError[] = [];
    if (input.source !== 'job' && input.source !== 'field-report') issues.push({ field: 'source', message: "must be 'job' or 'field-report'" });
    if (typeof input.userId !== 'string' || input.userId.length === 0) issues.push({ field: 'userId', message: 'must be a non-empty string' });
    if (!Array.isArray(input.fixedBy)) issues.push({ field: 'fixedBy', message: 'must be an array of part keys' });
    else input.fixedBy.forEach((k, i) => {
      if (typeof k !== 'string' || k.length === 0) issues.push({ field: `fixedBy.${i}`, message: 'must be a non-empty part key' });
    });
    if (issues.length) throw validationFailed(issues);

    const repo = em.getRepository(Outcome);
    // Cached likelihoods and fix paths are stale from this transaction on.
    await this.cache.bump('knowledge', em);
    if (input.sourceId !== null) await repo.delete({ source: input.source, sourceId: input.sourceId, code });

    const vehicle = normaliseVehicle(input.vehicle);
    const fixedBy = [...new Set(input.fixedBy)];
    const lik = await this.likelihoods(code, vehicle, em);
    const listed = fixedBy.filter((k) => lik.byKey.has(k));
    const others = fixedBy.filter((k) => !lik.byKey.has(k));

    let credits: OutcomeCreditDto[];
    if (fixedBy.length === 0) {
      credits = [{ causeKey: null, parts: [], weight: 1 }];
    } else {
      const current: Record<string, number> = {};
      for (const k of listed) current[k] = lik.byKey.get(k)!.probability;
      const keys = [...listed];
      if (others.length > 0) {
        current[UNLISTED_KEY] = lik.unlisted.probability;
        keys.push(UNLISTED_KEY);
      }
      const share = fractionalCredit(keys, current);
      credits = listed.map((k) => ({ causeKey: k, parts: [k], weight: share[k] }));
      if (others.length > 0) credits.push({ causeKey: null, parts: others, weight: share[UNLISTED_KEY] });
    }

    await repo.save(
      credits.map((c) =>
        repo.create({
          source: input.source,
          sourceId: input.sourceId,
          userId: input.userId,
          shopId: input.shopId,
          code,
          make: vehicle.make ?? null,
          model: vehicle.model ?? null,
          engine: vehicle.engine ?? null,
          year: vehicle.year ?? null,
          causeKey: c.causeKey,
          weight: c.weight,
        }),
      ),
    );

    const name = (c: OutcomeCreditDto) => (c.causeKey === null ? (c.parts.length ? `a cause not listed (${c.parts.join(', ')})` : 'a cause not listed') : (lik.list.find((r) => r.partKey === c.causeKey)?.part?.name ?? c.causeKey));
    const shared = credits.length > 1;
    const summary = shared
      ? `${code}: the fix was shared between the parts replaced together, by their current likelihoods: ${credits.map((c) => `${pct(c.weight)} to ${name(c)}`).join(', ')}.`
      : `${code}: credited in full to ${name(credits[0])}.`;
    return { code, credits, shared, summary };
  }
}
