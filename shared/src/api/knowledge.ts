import type { Plan, PlanInput } from '../fixpath/index';
import type { CautionDto } from './codes';

/**
 * The vehicle a likelihood or fix path is for. Every field is optional: an unstated make
 * means "any vehicle". A stated field must match a vehicle-scoped row; an unstated engine
 * or year does not rule a model's row out (the answer's `scope` says which list was used).
 */
export interface VehicleScopeQuery {
  make?: string;
  model?: string;
  engine?: string;
  year?: number;
}

/** What a money figure is in: the shop's currency, locale, labour rate and tax. */
export interface MoneyContext {
  /** ISO 4217. */
  currency: string;
  /** BCP 47, for formatting. */
  locale: string;
  /** Labour per hour before tax, integer minor units of `currency`. */
  labourRateMinor: number;
  /** Sales tax in basis points (2000 = 20 %). Every figure here is net of tax. */
  taxRateBp: number;
}

export type PartSystem =
  | 'fuel'
  | 'ignition'
  | 'air-intake'
  | 'fuel-injection'
  | 'exhaust'
  | 'evap'
  | 'hybrid'
  | 'srs'
  | 'brakes'
  | 'network'
  | 'cooling'
  | 'electrical'
  | 'engine-mechanical';

export interface VehicleScopeDto {
  make: string | null;
  model: string | null;
  engine: string | null;
  yearFrom: number | null;
  yearTo: number | null;
}

export interface PartDto {
  key: string;
  name: string;
  system: string;
}

export interface TeardownDto extends VehicleScopeDto {
  key: string;
  name: string;
  hours: number;
  cautions: string[];
}

/** One stored possible-cause row of the knowledge base, as curated (no likelihood, no shop money). */
export interface PossibleCauseRowDto extends VehicleScopeDto {
  id: string;
  code: string;
  partKey: string;
  partName: string;
  prior: number;
  partCostMinor: number;
  currency: string;
  replaceHours: number;
  teardownKey: string | null;
  check: { description: string; hours: number; mustPrecede: boolean } | null;
}

/** Posterior likelihood of a cause (product.md §2). */
export interface LikelihoodDto {
  /** Posterior mean p_i. */
  probability: number;
  /** 90 % equal-tailed credible interval of the Beta marginal. */
  lower: number;
  upper: number;
  /** Outcomes counted at the vehicle's own scope (after influence caps). */
  evidence: number;
  /** Outcomes counted at the more general scopes the prior backs off through. */
  inheritedEvidence: number;
  /** The prior weight at the vehicle's own scope (the posterior of the level above). */
  priorWeight: number;
}

/** A part price converted from another currency at the stored (indicative) exchange rate. */
export interface ConvertedMoney {
  minor: number;
  currency: string;
  /** The price as stored, when it was in another currency. */
  original: { minor: number; currency: string } | null;
  /** True when converted: the figure is indicative. */
  indicative: boolean;
}

export interface TeardownUseDto {
  key: string;
  name: string;
  hours: number;
  /** O_g: hours × the labour rate, net of tax. */
  openCostMinor: number;
  cautions: string[];
}

export interface CauseCheckDto {
  description: string;
  hours: number;
  /** T_i: hours × the labour rate, net of tax. */
  costMinor: number;
  /** The cause must be found by this check before it may be replaced. */
  mustPrecede: boolean;
}

export interface RankedCauseDto extends LikelihoodDto {
  /** The part key; unique within one code's list. */
  key: string;
  partName: string;
  system: string;
  partCost: ConvertedMoney;
  replaceHours: number;
  /** replaceHours × the labour rate. */
  labourCostMinor: number;
  /** R_i = part + labour, excluding the teardown. */
  replaceCostMinor: number;
  check: CauseCheckDto | null;
  teardown: TeardownUseDto | null;
  /** Caution keys of this cause: its teardown's, its part system's and the code's. */
  cautions: string[];
}

/** One step of the vehicle-scope back-off, general → specific. */
export interface ScopeLevelDto {
  /** e.g. `all vehicles`, `Halden`, `Halden Tarn 1.6 T`. */
  scope: string;
  /** Outcomes counted at this level (after caps). */
  evidence: number;
}

export interface CauseRankingDto {
  code: string;
  title: string | null;
  vehicle: VehicleScopeQuery;
  /** The scope of the possible-cause list used, or null when the code has none. */
  listScope: VehicleScopeDto | null;
  /** The back-off levels whose outcomes were counted, general → specific. */
  levels: ScopeLevelDto[];
  money: MoneyContext;
  /** Ranked by probability, highest first. */
  causes: RankedCauseDto[];
  /** A cause not listed. */
  unlisted: LikelihoodDto;
  /** N at the vehicle's own scope, unlisted outcomes included. */
  totalEvidence: number;
  /** True when a user's or shop's outcomes were scaled down by the influence caps. */
  capped: boolean;
  /** α: the prior strength in "jobs". */
  priorStrength: number;
  /** The code's cautions (full text). */
  cautions: CautionDto[];
  /** Every caution defers to this. */
  deferTo: string;
  /** True when any price was converted from another currency. */
  indicative: boolean;
}

export interface FixPathCauseDto {
  key: string;
  label: string;
  system: string;
  /** p_i as planned: the posterior, conditioned on the excluded parts. */
  probability: number;
  /** The posterior before in-job conditioning, with its interval and evidence. */
  likelihood: LikelihoodDto;
  partCost: ConvertedMoney;
  replaceHours: number;
  labourCostMinor: number;
  replaceCostMinor: number;
  check: CauseCheckDto | null;
  /** Teardown key, or null. */
  teardown: string | null;
  teardownName: string | null;
  cautions: string[];
}

export interface FixPathAddOnDto {
  key: string;
  label: string;
  teardown: string;
  /** Its own part + labour, net of tax, excluding the opening. */
  costMinor: number;
  partCost: ConvertedMoney;
  hours: number;
  /** Index of the stage of the plan that opens the teardown. */
  stageIndex: number;
  reachProbability: number;
  /** The opening labour the add-on avoids by being done while the teardown is open. */
  savedMinor: number;
  savedHours: number;
}

export interface FixPathDto {
  code: string;
  title: string | null;
  vehicle: VehicleScopeQuery;
  listScope: VehicleScopeDto | null;
  money: MoneyContext;
  /** The planner's input in minor units net of tax, so the client can re-plan in the browser. */
  input: PlanInput;
  plan: Plan;
  causes: FixPathCauseDto[];
  teardowns: TeardownUseDto[];
  verification: { hours: number; costMinor: number; procedure: string; monitor: string };
  escalation: { hours: number; costMinor: number; description: string } | null;
  cautions: CautionDto[];
  deferTo: string;
  addOns: FixPathAddOnDto[];
  /** Part price and own hours of every add-on in `input.addOns`, reached by the path or not, so a client can re-cost them at another labour rate. */
  addOnCosts: Array<{ key: string; partCost: ConvertedMoney; hours: number }>;
  /** Part keys ruled out in this job and left out of the path. */
  excluded: string[];
  /** Part keys asked to be excluded that are not possible causes of this code for this vehicle (ignored). */
  notListed: string[];
  indicative: boolean;
  /** Why the path is what it is when nothing is known (no possible causes), else null. */
  note: string | null;
}

/** Body of `POST /api/fix-paths`: the planner's input, costs in any one unit. */
export type AdHocFixPathRequest = Pick<PlanInput, 'causes' | 'teardowns' | 'verificationCost' | 'escalationCost' | 'unlistedProbability' | 'addOns'>;
export type AdHocFixPathResponse = Plan;

export type OutcomeSource = 'job' | 'field-report';

/** How one verified fix was credited. */
export interface OutcomeCreditDto {
  /** The possible cause (part key) credited; null = a cause not listed. */
  causeKey: string | null;
  /** The replaced parts behind this credit (several for a cause not listed). */
  parts: string[];
  /** Fractional credit; the credits of one outcome sum to 1. */
  weight: number;
}

export interface RecordedOutcomeDto {
  code: string;
  credits: OutcomeCreditDto[];
  /** True when the credit was split between several parts replaced together. */
  shared: boolean;
  /** A sentence the job can show, e.g. "Credited 71 % to Ignition coil and 29 % to Spark plug, by their likelihoods". */
  summary: string;
}

export interface ExchangeRateDto {
  currency: string;
  /** Units of `currency` per one unit of `base`. */
  perBase: number;
  base: string;
  asOf: string;
}
