import { Injectable } from '@nestjs/common';
import { InjectRepository } from '@nestjs/typeorm';
import { Repository } from 'typeorm';
import {
  conditionOnExcluded,
  DEFER_TO_PROCEDURE,
  labourCostMinor,
  planFixPath,
  type CauseLikelihood,
  type CauseRankingDto,
  type CodeEntryDto,
  type ExchangeRateDto,
  type FixPathAddOnDto,
  type FixPathCauseDto,
  type FixPathDto,
  type LikelihoodDto,
  type MoneyContext,
  type PartDto,
  type PlanAddOn,
  type PlanCause,
  type PlanInput,
  type PossibleCauseRowDto,
  type RankedCauseDto,
  type TeardownDto,
  type TeardownUseDto,
  type VehicleScopeQuery,
} from '@causeway/shared';
import { CodesService, parseCodeOr400 } from '../codes/codes.service';
import { VersionedCache } from '../common/cache/versioned-cache.service';
import { AddOn } from './entities/addon.entity';
import { ExchangeRate } from './entities/exchange-rate.entity';
import { Part } from './entities/part.entity';
import { PossibleCause } from './entities/possible-cause.entity';
import { Teardown } from './entities/teardown.entity';
import { LikelihoodService, type CodeLikelihoods } from './likelihood.service';
import { convertMinor, SYSTEM_CAUTIONS, type RateTable } from './money';
import { appliesTo } from './scope';

/** In-job evidence: parts replaced or checked without success, to be ruled out. */
export interface FixPathEvidence {
  excludedParts: string[];
}

interface Detailed {
  entry: CodeEntryDto;
  lik: CodeLikelihoods;
  causes: RankedCauseDto[];
  teardowns: Map<string, TeardownUseDto>;
  rates: RateTable;
}

function likelihoodDto(c: CauseLikelihood): LikelihoodDto {
  return { probability: c.probability, lower: c.lower, upper: c.upper, evidence: c.evidence, inheritedEvidence: c.inheritedEvidence, priorWeight: c.priorWeight };
}

function uniq(keys: Iterable<string>): string[] {
  return [...new Set(keys)];
}

/** The API shape of a part; also what the audit log keeps of one. */
export function toPartDto(p: Part): PartDto {
  return { key: p.key, name: p.name, system: p.system };
}

/** The API shape of a teardown; also what the audit log keeps of one. */
export function toTeardownDto(t: Teardown): TeardownDto {
  return { key: t.key, name: t.name, hours: t.hours, cautions: t.cautions, make: t.make, model: t.model, engine: t.engine, yearFrom: t.yearFrom, yearTo: t.yearTo };
}

/** A possible cause as the knowledge tables list it; `partName` when the part relation is not loaded. */
export function toCauseRowDto(c: PossibleCause, partName?: string): PossibleCauseRowDto {
  return {
    id: c.id,
    code: c.code,
    partKey: c.partKey,
    partName: partName ?? c.part?.name ?? c.partKey,
    prior: c.prior,
    partCostMinor: c.partCostMinor,
    currency: c.currency,
    replaceHours: c.replaceHours,
    teardownKey: c.teardownKey,
    check: c.checkHours === null ? null : { description: c.checkDescription, hours: c.checkHours, mustPrecede: c.checkMustPrecede },
    make: c.make,
    model: c.model,
    engine: c.engine,
    yearFrom: c.yearFrom,
    yearTo: c.yearTo,
  };
}

/**
 * The knowledge base as the shop sees it: ranked possible causes with costs at the shop's
 * labour rate, and the expected-cost-optimal fix path (product.md §3). Every figure is in
 * integer minor units of the shop's currency, net of tax.
 */
@Injectable()
export class KnowledgeService {
  constructor(
    private readonly codes: CodesService,
    private readonly likelihood: LikelihoodService,
    @InjectRepository(Part) private readonly parts: Repository<Part>,
    @InjectRepository(Teardown) private readonly teardownRepo: Repository<Teardown>,
    @InjectRepository(PossibleCause) private readonly causeRepo: Repository<PossibleCause>,
    @InjectRepository(AddOn) private readonly addOnRepo: Repository<AddOn>,
    @InjectRepository(ExchangeRate) private readonly rateRepo: Repository<ExchangeRate>,
    private readonly cache: VersionedCache,
  ) {}

  /** Results are cached per knowledge-base version; the returned objects are shared, never mutate them. */
  private cached<T>(kind: string, parts: unknown[], compute: () => Promise<T>): Promise<T> {
    return this.cache.get('knowledge', `${kind}|${JSON.stringify(parts)}`, compute);
  }

  listParts(): Promise<PartDto[]> {
    return this.parts.find({ order: { key: 'ASC' } }).then((rows) => rows.map(toPartDto));
  }

  listTeardowns(): Promise<TeardownDto[]> {
    return this.teardownRepo.find({ order: { key: 'ASC' } }).then((rows) => rows.map(toTeardownDto));
  }

  async listCauses(code?: string): Promise<PossibleCauseRowDto[]> {
    const where = code ? { code: parseCodeOr400(code, 'code').code } : {};
    const rows = await this.causeRepo.find({ where, relations: { part: true }, order: { code: 'ASC', make: 'ASC', model: 'ASC', prior: 'DESC' } });
    return rows.map((c) => toCauseRowDto(c));
  }

  async exchangeRates(): Promise<ExchangeRateDto[]> {
    const rows = await this.rateRepo.find({ order: { currency: 'ASC' } });
    return rows.map((r) => ({ currency: r.currency, perBase: r.perBase, base: r.base, asOf: r.asOf }));
  }

  /** Ranked possible causes of a code for a vehicle, with likelihoods and costs in the shop's money. */
  rankCauses(code: string, vehicle: VehicleScopeQuery, money: MoneyContext): Promise<CauseRankingDto> {
    return this.cached('rank', [code.trim().toUpperCase(), vehicle, this.moneyDto(money)], () => this.computeRankCauses(code, vehicle, money));
  }

  private async computeRankCauses(code: string, vehicle: VehicleScopeQuery, money: MoneyContext): Promise<CauseRankingDto> {
    const d = await this.detailed(code, vehicle, money);
    const causes = [...d.causes].sort((a, b) => b.probability - a.probability || a.replaceCostMinor - b.replaceCostMinor || a.key.localeCompare(b.key));
    return {
      code: d.lik.code,
      title: d.entry.title,
      vehicle: d.lik.vehicle,
      listScope: d.lik.listScope,
      levels: d.lik.levels,
      money: this.moneyDto(money),
      causes,
      unlisted: likelihoodDto(d.lik.unlisted),
      totalEvidence: d.lik.totalEvidence,
      capped: d.lik.capped,
      priorStrength: d.lik.priorStrength,
      cautions: d.entry.cautions,
      deferTo: DEFER_TO_PROCEDURE,
      indicative: causes.some((c) => c.partCost.indicative),
    };
  }

  /**
   * The fix path of least expected cost for a code on a vehicle at the shop's labour rate.
   * Excluded parts (tried in this job without success) leave the path and the rest are
   * renormalised; parts that are not possible causes of this code here are ignored and
   * reported in `notListed`.
   */
  planForCode(code: string, vehicle: VehicleScopeQuery, money: MoneyContext, evidence?: FixPathEvidence): Promise<FixPathDto> {
    const excluded = [...new Set(evidence?.excludedParts ?? [])].sort();
    return this.cached('plan', [code.trim().toUpperCase(), vehicle, this.moneyDto(money), excluded], () => this.computePlan(code, vehicle, money, evidence));
  }

  private async computePlan(code: string, vehicle: VehicleScopeQuery, money: MoneyContext, evidence?: FixPathEvidence): Promise<FixPathDto> {
    const d = await this.detailed(code, vehicle, money);
    const rate = money.labourRateMinor;
    const wanted = uniq(evidence?.excludedParts ?? []);
    const listedKeys = new Set(d.causes.map((c) => c.key));
    const excluded = wanted.filter((k) => listedKeys.has(k));
    const notListed = wanted.filter((k) => !listedKeys.has(k));

    const conditioned = conditionOnExcluded(
      d.causes.map((c) => ({ key: c.key, probability: c.probability })),
      d.lik.unlisted.probability,
      excluded,
    );
    const pOf = new Map(conditioned.causes.map((c) => [c.key, c.probability]));
    const out = new Set(excluded);
    const kept = d.causes.filter((c) => !out.has(c.key));

    const planCauses: PlanCause[] = kept.map((c) => {
      const pc: PlanCause = { key: c.key, label: c.partName, probability: pOf.get(c.key) ?? 0, replaceCost: c.replaceCostMinor };
      if (c.check) {
        pc.checkCost = c.check.costMinor;
        if (c.check.mustPrecede) pc.checkFirst = true;
      }
      if (c.teardown) pc.teardown = c.teardown.key;
      return pc;
    });
    const teardowns: TeardownUseDto[] = uniq(kept.flatMap((c) => (c.teardown ? [c.teardown.key] : []))).map((k) => d.teardowns.get(k)!);
    const teardownCosts = Object.fromEntries(teardowns.map((t) => [t.key, t.openCostMinor]));

    const addOnRows = (await this.addOnRepo.find({ order: { key: 'ASC' } })).filter((a) => a.teardownKey in teardownCosts && appliesTo(a, d.lik.vehicle));
    const addOnInfo = new Map(
      addOnRows.map((a) => {
        const partCost = convertMinor(a.partCostMinor, a.currency, money.currency, d.rates);
        return [a.key, { row: a, partCost, costMinor: partCost.minor + labourCostMinor(a.hours, rate) }] as const;
      }),
    );
    const planAddOns: PlanAddOn[] = [...addOnInfo.values()].map((a) => ({ key: a.row.key, label: a.row.label, teardown: a.row.teardownKey, cost: a.costMinor }));

    const v = d.entry.verification;
    const verificationCost = labourCostMinor(v.hours, rate);
    const esc = d.entry.escalation;
    const input: PlanInput = {
      causes: planCauses,
      teardowns: teardownCosts,
      verificationCost,
      ...(esc ? { escalationCost: labourCostMinor(esc.hours, rate) } : {}),
      unlistedProbability: conditioned.unlisted,
      ...(planAddOns.length ? { addOns: planAddOns } : {}),
    };
    const plan = planFixPath(input);

    const addOns: FixPathAddOnDto[] = plan.addOns.map((s) => {
      const a = addOnInfo.get(s.key)!;
      return {
        key: s.key,
        label: a.row.label,
        teardown: s.teardown,
        costMinor: a.costMinor,
        partCost: a.partCost,
        hours: a.row.hours,
        stageIndex: s.stageIndex,
        reachProbability: s.reachProbability,
        savedMinor: s.savedCost,
        savedHours: d.teardowns.get(s.teardown)?.hours ?? 0,
      };
    });

    const causes: FixPathCauseDto[] = kept.map((c) => ({
      key: c.key,
      label: c.partName,
      system: c.system,
      probability: pOf.get(c.key) ?? 0,
      likelihood: { probability: c.probability, lower: c.lower, upper: c.upper, evidence: c.evidence, inheritedEvidence: c.inheritedEvidence, priorWeight: c.priorWeight },
      partCost: c.partCost,
      replaceHours: c.replaceHours,
      labourCostMinor: c.labourCostMinor,
      replaceCostMinor: c.replaceCostMinor,
      check: c.check,
      teardown: c.teardown?.key ?? null,
      teardownName: c.teardown?.name ?? null,
      cautions: c.cautions,
    }));

    const cautionKeys = uniq([...d.entry.cautions.map((c) => c.key), ...kept.flatMap((c) => c.cautions)]);
    let note: string | null = null;
    if (d.causes.length === 0) {
      note = esc
        ? 'No possible causes are known for this code on this vehicle yet: the path hands the job over for further diagnosis.'
        : 'No possible causes are known for this code on this vehicle yet, and no further diagnosis is offered: there is no fix path to suggest.';
    } else if (kept.length === 0) {
      note = esc
        ? 'Every possible cause has been ruled out: the path hands the job over for further diagnosis.'
        : 'Every possible cause has been ruled out and no further diagnosis is offered: the fault is a cause not listed.';
    }

    return {
      code: d.lik.code,
      title: d.entry.title,
      vehicle: d.lik.vehicle,
      listScope: d.lik.listScope,
      money: this.moneyDto(money),
      input,
      plan,
      causes,
      teardowns,
      verification: { hours: v.hours, costMinor: verificationCost, procedure: v.procedure, monitor: v.monitor },
      escalation: esc ? { hours: esc.hours, costMinor: labourCostMinor(esc.hours, rate), description: esc.description } : null,
      cautions: await this.codes.cautionsFor(cautionKeys),
      deferTo: DEFER_TO_PROCEDURE,
      addOns,
      addOnCosts: [...addOnInfo.values()].map((a) => ({ key: a.row.key, partCost: a.partCost, hours: a.row.hours })),
      excluded,
      notListed,
      indicative: causes.some((c) => c.partCost.indicative) || addOns.some((a) => a.partCost.indicative),
      note,
    };
  }

  private moneyDto(m: MoneyContext): MoneyContext {
    return { currency: m.currency, locale: m.locale, labourRateMinor: m.labourRateMinor, taxRateBp: m.taxRateBp };
  }

  private async rates(): Promise<RateTable> {
    const rows = await this.rateRepo.find();
    return new Map(rows.map((r) => [r.currency, r]));
  }

  /** The code's catalogue entry (400 for a malformed code, 404 when not in the catalogue), likelihoods and costed causes. */
  private async detailed(codeInput: string, vehicleIn: VehicleScopeQuery, money: MoneyContext): Promise<Detailed> {
    const structure = parseCodeOr400(codeInput, 'code');
    const entry = await this.codes.get(structure.code, vehicleIn.make?.trim() || undefined);
    const lik = await this.likelihood.likelihoods(structure.code, vehicleIn);
    const rates = await this.rates();
    const rate = money.labourRateMinor;
    const codeCautions = entry.cautions.map((c) => c.key);
    const teardowns = new Map<string, TeardownUseDto>();
    const causes: RankedCauseDto[] = lik.list.map((row) => {
      const post = lik.byKey.get(row.partKey)!;
      const partCost = convertMinor(row.partCostMinor, row.currency, money.currency, rates);
      const labour = labourCostMinor(row.replaceHours, rate);
      let teardown: TeardownUseDto | null = null;
      if (row.teardown) {
        const t = row.teardown;
        teardown = teardowns.get(t.key) ?? { key: t.key, name: t.name, hours: t.hours, openCostMinor: labourCostMinor(t.hours, rate), cautions: t.cautions };
        teardowns.set(t.key, teardown);
      }
      const system = row.part?.system ?? '';
      return {
        ...likelihoodDto(post),
        key: row.partKey,
        partName: row.part?.name ?? row.partKey,
        system,
        partCost,
        replaceHours: row.replaceHours,
        labourCostMinor: labour,
        replaceCostMinor: partCost.minor + labour,
        check: row.checkHours === null ? null : { description: row.checkDescription, hours: row.checkHours, costMinor: labourCostMinor(row.checkHours, rate), mustPrecede: row.checkMustPrecede },
        teardown,
        cautions: uniq([...(teardown?.cautions ?? []), ...(SYSTEM_CAUTIONS[system] ?? []), ...codeCautions]),
      };
    });
    return { entry, lik, causes, teardowns, rates };
  }
}
