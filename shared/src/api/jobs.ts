/** Request and response types of vehicles, jobs, staged estimates and shop insights. */

import type { DistanceUnit, FieldError } from './auth';
import type { CautionDto } from './codes';
import type { FixPathDto, RecordedOutcomeDto } from './knowledge';

// ---------------------------------------------------------------- vehicles

export interface VehicleDto {
  id: string;
  /** Normalised: upper case, no spaces or dashes. */
  vin: string;
  make: string;
  model: string;
  engine: string | null;
  year: number | null;
  plate: string | null;
  /** The last odometer reading, stored in km (null: never read). */
  odometerKm: number | null;
  /** The same reading in the shop's unit, rounded to a whole unit. */
  odometer: number | null;
  distanceUnit: DistanceUnit;
  ownerName: string | null;
  ownerEmail: string | null;
  /**
   * Things worth a second look that do not stop the save: a check digit that does not match on a
   * VIN outside North America, a year that disagrees with VIN position 10, an unused year code.
   */
  warnings: FieldError[];
  createdAt: string;
  updatedAt: string;
}

export interface VehicleInput {
  vin: string;
  make: string;
  model: string;
  engine?: string | null;
  /** Model year; when absent it is read from VIN position 10 with the position-7 rule. */
  year?: number | null;
  plate?: string | null;
  /** In the shop's distance unit; stored in km. */
  odometer?: number | null;
  ownerName?: string | null;
  ownerEmail?: string | null;
  /** Resend with true after a 409 `odometer-lower` answer to accept a reading lower than the last. */
  confirmOdometerLower?: boolean;
}

export type VehiclePatch = Partial<VehicleInput>;

export const VEHICLE_SORTS = ['updatedAt', 'createdAt', 'vin', 'make', 'model', 'year', 'plate', 'ownerName'] as const;
export type VehicleSort = (typeof VEHICLE_SORTS)[number];

/**
 * `details` of the 409 answered when an odometer reading is lower than the last one. The client
 * shows `message`, and resends the same request with `confirmOdometerLower: true` when the user
 * confirms (a replaced instrument cluster, a typing error in the earlier reading).
 */
export interface OdometerLowerDetails {
  reason: 'odometer-lower';
  field: 'odometer';
  /** The last reading in the shop's unit, and in km as stored. */
  lastReading: number;
  lastReadingKm: number;
  /** What was sent, in the shop's unit. */
  given: number;
  unit: DistanceUnit;
  confirmWith: { confirmOdometerLower: true };
}

// ---------------------------------------------------------------- jobs

export type CodeStatus = 'stored' | 'pending' | 'permanent';
export const CODE_STATUSES: readonly CodeStatus[] = ['stored', 'pending', 'permanent'];

export type FreezeFrame = Record<string, string | number>;

export interface JobCodeInput {
  /** As read: P0456, po456, 04 56, P0456-13 … (validated with the shared codec). */
  code: string;
  status: CodeStatus;
  freezeFrame?: FreezeFrame;
}

export interface CreateJobRequest {
  vehicleId: string;
  complaint: string;
  codes: JobCodeInput[];
  /** A member of the shop; the caller when absent. */
  technicianId?: string;
  /** In the shop's unit; updates the vehicle's reading (same lower-reading rule as vehicles). */
  odometer?: number;
  confirmOdometerLower?: boolean;
  /** ISO 8601; now when absent. */
  openedAt?: string;
}

export type StepKind = 'check' | 'replace';
export type CheckResult = 'at-fault' | 'not-at-fault';
export type ReplaceResult = 'cleared' | 'came-back';
export type StepResult = CheckResult | ReplaceResult;

export interface CreateStepRequest {
  /** The job's code the step works on; may be left out when the job has one code. */
  code?: string;
  kind: StepKind;
  /** check: exactly one part key; replace: one or more, replaced together in one stage. */
  parts: string[];
  /** check: at-fault | not-at-fault; replace: cleared | came-back. */
  result: StepResult;
  /** Pre-tax, integer minor units of the shop's currency. */
  actualCostMinor: number;
  notes?: string;
  /** ISO 8601; now when absent. */
  at?: string;
}

export interface JobStepDto {
  id: string;
  /** 1, 2, 3 … in the order recorded. */
  sequence: number;
  code: string;
  kind: StepKind;
  parts: Array<{ key: string; label: string }>;
  result: StepResult;
  actualCostMinor: number;
  notes: string;
  at: string;
  recordedBy: { id: string; displayName: string } | null;
}

/**
 * Where the work on one code stands, from its steps:
 * open — possible causes remain; cause-found — a check found a part at fault, the path is its replacement;
 * cleared — a replacement cleared the code (verify, then close); exhausted — every listed cause was tried.
 */
export type JobCodeState = 'open' | 'cause-found' | 'cleared' | 'exhausted';

export interface JobCodeDto {
  code: string;
  /** As entered in its normal form, e.g. P0456-13 with a failure-type byte. */
  display: string;
  title: string | null;
  status: CodeStatus;
  freezeFrame: FreezeFrame;
  state: JobCodeState;
  /** Parts ruled out inside this job: checked not at fault, or replaced and the code came back. */
  excludedParts: string[];
  /** The part a check found at fault, while it has not been replaced. */
  foundPart: string | null;
  /** The parts of the replacement that cleared the code. */
  clearedBy: string[];
  /** The expected cost of the fix path when the job was opened (net, minor units); null when there was none. */
  expectedCostAtOpenMinor: number | null;
  /**
   * The current fix path, recomputed from the knowledge base and this job's steps on every read;
   * null when the code is cleared, the job is closed, or the knowledge base has no possible cause for it.
   */
  fixPath: FixPathDto | null;
  /** Why there is no fix path, when there is none. */
  fixPathNote: string | null;
  /**
   * After a resolved close: the outcome recorded for this code and how it was credited (shared
   * between parts replaced together, by their likelihoods); null when no outcome was recorded.
   */
  outcome: RecordedOutcomeDto | null;
  cautions: CautionDto[];
}

export type JobStatus = 'open' | 'closed';
export type JobResolution = 'resolved' | 'unresolved';

export interface JobVehicleSummary {
  id: string;
  vin: string;
  make: string;
  model: string;
  engine: string | null;
  year: number | null;
  plate: string | null;
}

export interface JobSummaryDto {
  id: string;
  status: JobStatus;
  resolution: JobResolution | null;
  complaint: string;
  openedAt: string;
  closedAt: string | null;
  vehicle: JobVehicleSummary;
  codes: Array<{ code: string; status: CodeStatus }>;
  technician: { id: string; displayName: string } | null;
  stepCount: number;
  /** Sum of the steps' actual costs, net, minor units. */
  actualCostMinor: number;
  /** Sum of the codes' fix-path expected costs when the job was opened, net, minor units. */
  expectedCostAtOpenMinor: number | null;
  currency: string;
}

export interface EstimateAnswerDto {
  stageIndex: number;
  decision: 'approved' | 'declined';
  name: string | null;
  answeredAt: string;
}

export interface JobDto extends JobSummaryDto {
  codes: JobCodeDto[];
  odometerKm: number | null;
  odometer: number | null;
  distanceUnit: DistanceUnit;
  steps: JobStepDto[];
  closeNotes: string | null;
  verificationPassed: boolean | null;
  estimates: EstimateSummaryDto[];
  taxRateBp: number;
  locale: string;
}

export const JOB_SORTS = ['openedAt', 'closedAt', 'updatedAt', 'status'] as const;
export type JobSort = (typeof JOB_SORTS)[number];

export interface JobListQuery {
  status?: JobStatus;
  code?: string;
  vehicleId?: string;
  technicianId?: string;
  /** Opened on or after (ISO date or date-time). */
  from?: string;
  /** Opened on or before (a date alone means the whole day). */
  to?: string;
  page?: number;
  pageSize?: number;
  sort?: JobSort;
  order?: 'asc' | 'desc';
}

export interface CloseJobRequest {
  resolution: JobResolution;
  /** Must be true to close as resolved: the code stayed away after the verification drive. */
  verificationPassed?: boolean;
  /**
   * What fixed each code (resolved only). Parts are possible-cause keys; `parts: []` means a cause
   * not listed. When left out, each code's last clearing replacement is taken; a code with neither
   * records no outcome (say, P0300 that went with the P0301 fix).
   */
  fixedBy?: Array<{ code: string; parts: string[] }>;
  notes?: string;
}

// ---------------------------------------------------------------- staged estimates

export interface TaxedMoney {
  /** Integer minor units of `currency`. */
  net: number;
  tax: number;
  gross: number;
}

export interface EstimateStageDto {
  index: number;
  code: string;
  kind: 'replace' | 'check' | 'escalate';
  title: string;
  description: string;
  parts: Array<{ key: string; label: string }>;
  /**
   * The stage's price if it is reached. For a check stage it is the expected price (the checks stop
   * at the first part found at fault); `priceUpTo` then is the most it can cost.
   */
  price: TaxedMoney;
  priceUpTo: TaxedMoney | null;
  /** Chance that this stage is where the fault gets fixed, seen from the start. */
  fixProbability: number;
  /** Chance it fixes the fault if the stages before it did not. */
  fixProbabilityIfReached: number;
  /** Chance the fault is fixed by the end of this stage. */
  cumulativeFixProbability: number;
  /** What happens if it does not fix the fault. */
  ifNotFixed: string;
  cautions: CautionDto[];
}

export interface EstimateTotals {
  /** The fix path's expected cost (each stage weighted by the chance it is reached). */
  expected: TaxedMoney;
  /** Every stage carried out. */
  allStages: TaxedMoney;
}

export interface EstimateSummaryDto {
  id: string;
  createdAt: string;
  expiresAt: string;
  expired: boolean;
  recipientEmail: string | null;
  emailedAt: string | null;
  emailError: string | null;
  stageCount: number;
  totals: EstimateTotals;
  answers: EstimateAnswerDto[];
}

export interface EstimateDto extends EstimateSummaryDto {
  jobId: string;
  currency: string;
  locale: string;
  taxRateBp: number;
  stages: EstimateStageDto[];
  /** How amounts are rounded, in words. */
  rounding: string;
  note: string;
}

export interface CreateEstimateRequest {
  /** Days until the link expires (default from ESTIMATE_EXPIRY_DAYS, else 14). */
  expiresInDays?: number;
  /** Send to this address instead of the vehicle owner's. */
  recipientEmail?: string;
  /** A few words from the shop, shown above the stages. */
  message?: string;
}

export interface CreateEstimateResponse {
  estimate: EstimateDto;
  /** The public link (shown once: only a hash of its token is stored). */
  link: string;
  emailed: boolean;
  /** Why the e-mail was not sent, when it was not; the estimate is saved either way. */
  emailError: string | null;
}

/** What the vehicle owner sees through the link: no internal ids beyond the estimate's. */
export interface PublicEstimateDto {
  shop: { name: string };
  vehicle: { make: string; model: string; year: number | null; plate: string | null };
  complaint: string;
  codes: Array<{ code: string; title: string | null }>;
  message: string | null;
  currency: string;
  locale: string;
  taxRateBp: number;
  createdAt: string;
  expiresAt: string;
  stages: EstimateStageDto[];
  totals: EstimateTotals;
  /** The latest answer per stage, and every answer in order. */
  decisions: Array<EstimateAnswerDto | null>;
  answers: EstimateAnswerDto[];
  rounding: string;
  note: string;
  /** False once the job is closed: answers are no longer taken. */
  acceptingAnswers: boolean;
}

export interface EstimateAnswerRequest {
  stageIndex: number;
  decision: 'approved' | 'declined';
  name?: string;
}

// ---------------------------------------------------------------- shop insights

export interface InsightsDto {
  currency: string;
  from: string | null;
  to: string | null;
  jobsByCode: Array<{ code: string; title: string | null; jobs: number; open: number; resolved: number; unresolved: number }>;
  firstTimeFix: {
    /** Resolved jobs with at least one replacement. */
    resolvedJobs: number;
    /** Of those, the jobs whose first replacement cleared the code. */
    firstTimeFixed: number;
    /** null when there is no resolved job. */
    rate: number | null;
  };
  costToResolve: {
    /** Resolved jobs with an expected cost recorded at opening. */
    jobs: number;
    averageActualMinor: number | null;
    averageExpectedMinor: number | null;
    byCode: Array<{ code: string; jobs: number; averageActualMinor: number; averageExpectedMinor: number }>;
  };
  /** Parts replaced where the code came back, most often first. */
  replacedWithoutFix: Array<{ part: string; label: string; times: number; costMinor: number }>;
}
