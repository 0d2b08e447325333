import type { LikelihoodDto, PartSystem, VehicleScopeDto } from './knowledge';

/** What a field report proposes. */
export const FIELD_REPORT_KINDS = ['confirmed-fix', 'new-cause', 'correction'] as const;
export type FieldReportKind = (typeof FIELD_REPORT_KINDS)[number];

/** draft → submitted → approved | rejected; the author may withdraw a draft or a submitted report. */
export const FIELD_REPORT_STATUSES = ['draft', 'submitted', 'approved', 'rejected', 'withdrawn'] as const;
export type FieldReportStatus = (typeof FIELD_REPORT_STATUSES)[number];

export const PART_SYSTEMS: readonly PartSystem[] = [
  'fuel',
  'ignition',
  'air-intake',
  'fuel-injection',
  'exhaust',
  'evap',
  'hybrid',
  'srs',
  'brakes',
  'network',
  'cooling',
  'electrical',
  'engine-mechanical',
];

/** Bounds every knowledge-base figure must stay within, on field reports and direct edits alike. */
export const KNOWLEDGE_LIMITS = {
  /** Largest part price, in minor units (100 000.00). */
  partCostMinorMax: 10_000_000,
  /** Most labour hours for a replacement, a check or a teardown. */
  hoursMax: 100,
  /** Most odometer reading accepted, in km. */
  odometerKmMax: 3_000_000,
  yearMin: 1950,
  yearMax: 2100,
  notesMax: 4000,
  reasonMin: 3,
  reasonMax: 1000,
} as const;

/** Upload limits: per file and per report. */
export const ATTACHMENT_LIMITS = {
  maxBytes: 8 * 1024 * 1024,
  maxFiles: 6,
  /** Types decided from the content, never the extension. */
  contentTypes: ['image/jpeg', 'image/png', 'image/webp', 'application/pdf'] as const,
} as const;
export type AttachmentContentType = (typeof ATTACHMENT_LIMITS.contentTypes)[number];

/** A check that decides for sure whether the cause is the fault. */
export interface CauseCheckInput {
  description: string;
  hours: number;
  /** The cause must be found by the check before it may be replaced. */
  mustPrecede: boolean;
}

/** The vehicle a fix was made on. */
export interface ConfirmedFixPayload {
  code: string;
  make: string;
  model: string;
  engine?: string | null;
  year?: number | null;
  /** Part key of the part whose replacement fixed it (the code stayed away). */
  part: string;
  odometerKm?: number | null;
  /** Part keys tried first without success. */
  triedFirst?: string[];
  notes?: string;
  /** A title proposed for a code that is valid but not in the catalogue. */
  codeTitle?: string | null;
}

export interface NewCausePayload {
  code: string;
  /** Part key: an existing part, or a new key together with `partName` (and `system`). */
  part: string;
  partName?: string | null;
  system?: PartSystem | null;
  /** Proposed prior weight w_i, 0–1. */
  prior: number;
  partCostMinor: number;
  /** ISO 4217. */
  currency: string;
  replaceHours: number;
  /** Teardown key, when the part is behind one. */
  teardown?: string | null;
  check?: CauseCheckInput | null;
  /** Vehicle scope the cause is for; all null = all vehicles. */
  make?: string | null;
  model?: string | null;
  engine?: string | null;
  yearFrom?: number | null;
  yearTo?: number | null;
  notes?: string;
  codeTitle?: string | null;
}

export type CorrectionField = 'partCostMinor' | 'replaceHours' | 'title' | 'description';

export interface CorrectionPayload {
  /** A possible cause (code + part + scope) or a code's catalogue entry. */
  target: 'cause' | 'code';
  code: string;
  /** With target `cause`: the part key of the cause. */
  part?: string | null;
  /** With target `cause`: its scope (all null = the all-vehicles list). */
  make?: string | null;
  model?: string | null;
  engine?: string | null;
  yearFrom?: number | null;
  yearTo?: number | null;
  /** `partCostMinor` / `replaceHours` for a cause (the cost in the cause's currency), `title` / `description` for a code. */
  field: CorrectionField;
  value: number | string;
  reason: string;
}

export type FieldReportPayload = ConfirmedFixPayload | NewCausePayload | CorrectionPayload;

/** Body of `POST /api/field-reports` (a draft unless `submit` is true) and `PATCH /api/field-reports/:id` (drafts only). */
export interface FieldReportRequest {
  kind: FieldReportKind;
  payload: FieldReportPayload;
  submit?: boolean;
}

export interface AttachmentDto {
  id: string;
  /** The uploaded file name, sanitised; the stored file has a random name. */
  name: string;
  contentType: AttachmentContentType;
  size: number;
  width: number | null;
  height: number | null;
  createdAt: string;
  /** `GET` it with the bearer token. */
  url: string;
}

export interface PersonDto {
  id: string;
  displayName: string;
}

export interface FieldReportSummaryDto {
  id: string;
  kind: FieldReportKind;
  status: FieldReportStatus;
  code: string;
  /** One line for lists: e.g. "P0303 fixed by Ignition coil on Morrow Strand 3.0 V6". */
  title: string;
  /** The code is valid but not in the catalogue: approving adds a catalogue entry. */
  proposesNewCode: boolean;
  author: PersonDto;
  attachmentCount: number;
  createdAt: string;
  updatedAt: string;
  submittedAt: string | null;
  decidedAt: string | null;
}

export interface FieldReportDto extends FieldReportSummaryDto {
  payload: FieldReportPayload;
  attachments: AttachmentDto[];
  decidedBy: PersonDto | null;
  /** The moderator's note on approval, or the reason for a rejection. */
  decisionNote: string | null;
  /** When the author was e-mailed about the decision; null when not (yet) sent. */
  notifiedAt: string | null;
}

/** One field that would change: its value now and after approval. */
export interface ReviewFieldChangeDto {
  field: string;
  label: string;
  before: string | number | boolean | null;
  after: string | number | boolean | null;
}

/** A cause's likelihood now and once the report is applied (same back-off and caps as every ranking). */
export interface ReviewLikelihoodChangeDto {
  key: string;
  partName: string;
  before: LikelihoodDto | null;
  after: LikelihoodDto | null;
  /** The cause the report is about. */
  subject: boolean;
}

export interface ReviewDiffDto {
  /** What approving does, in one sentence. */
  summary: string;
  /** What approving writes. */
  target: { entityType: 'possible-cause' | 'dtc-code' | 'outcome'; entityId: string | null; label: string };
  changes: ReviewFieldChangeDto[];
  /** For confirmed fixes and new causes: the list's likelihoods before and after, for the vehicle named. */
  likelihoods: {
    vehicle: { make?: string; model?: string; engine?: string; year?: number };
    listScope: VehicleScopeDto | null;
    priorStrength: number;
    evidenceBefore: number;
    evidenceAfter: number;
    /** The contributor's (or their shop's) outcomes are scaled down by the influence caps. */
    capped: boolean;
    causes: ReviewLikelihoodChangeDto[];
    unlisted: { before: LikelihoodDto; after: LikelihoodDto };
  } | null;
  /** Things the moderator should know (a new catalogue entry, a more specific list that hides this one, …). */
  warnings: string[];
  /** False when approving would be refused as things stand (with the reason in `blockers`). */
  applicable: boolean;
  blockers: string[];
}

export interface ReviewReportDto extends FieldReportDto {
  diff: ReviewDiffDto;
}

export interface ApproveReportRequest {
  note?: string;
  /** For a new cause proposing a new part without a system: the system to file it under. */
  partSystem?: PartSystem;
}

export interface RejectReportRequest {
  /** 3–1000 characters; e-mailed to the author. */
  reason: string;
}

/** One audited change: who, when, what, before and after. */
export interface AuditEntryDto {
  id: string;
  at: string;
  actorId: string | null;
  actorEmail: string;
  /** e.g. `report.approve`, `report.reject`, `cause.update`, `code.update`, `part.create`. */
  action: string;
  /** e.g. `field-report`, `possible-cause`, `dtc-code`, `part`, `teardown`, `outcome`. */
  entityType: string;
  entityId: string;
  before: unknown;
  after: unknown;
  note: string | null;
}

/** Direct edit of a code's catalogue entry (moderators). */
export interface CodeEditRequest {
  title?: string;
  description?: string;
  subsystem?: string;
  symptoms?: string[];
  verification?: { monitor?: string; procedure?: string; hours?: number };
  escalation?: { hours: number; description: string } | null;
  cautions?: string[];
}

export interface PartEditRequest {
  key?: string;
  name?: string;
  system?: PartSystem;
}

export interface TeardownEditRequest {
  key?: string;
  name?: string;
  hours?: number;
  make?: string | null;
  model?: string | null;
  engine?: string | null;
  yearFrom?: number | null;
  yearTo?: number | null;
  cautions?: string[];
}

export interface CauseEditRequest {
  code?: string;
  partKey?: string;
  prior?: number;
  partCostMinor?: number;
  currency?: string;
  replaceHours?: number;
  teardownKey?: string | null;
  check?: CauseCheckInput | null;
  make?: string | null;
  model?: string | null;
  engine?: string | null;
  yearFrom?: number | null;
  yearTo?: number | null;
}
