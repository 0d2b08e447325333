/**
 * Request and response types of the scan-tool CSV import
 * (upload → detect → map → preview → commit, saved mappings, import history).
 */

import type { CodeStatus, FreezeFrame } from './jobs';

/** Limits of one import; the server answers a clear 413/400 beyond them. */
export const IMPORT_LIMITS = {
  /** Largest file, bytes (50 MiB). */
  maxBytes: 50 * 1024 * 1024,
  /** Most data rows in one file. */
  maxRows: 200_000,
  /** Rows shown normalised in the preview. */
  previewRows: 20,
  /** Problems and corrections kept in a report; the totals say how many there were. */
  maxListed: 1000,
} as const;

/**
 * What a column of the file can mean. `date` may hold the date and time together; `time` is a
 * separate time-of-day column combined with a date-only `date`.
 */
export const IMPORT_FIELDS = [
  'date',
  'time',
  'vin',
  'odometer',
  'odometerUnit',
  'module',
  'code',
  'status',
  'description',
  'make',
  'model',
  'year',
  'engine',
  'plate',
] as const;
export type ImportField = (typeof IMPORT_FIELDS)[number];

/** Without these three the file is refused before any row is read. */
export const IMPORT_REQUIRED_FIELDS: readonly ImportField[] = ['vin', 'code', 'date'];

/**
 * How the columns of a file are read. Headers are matched without regard to case, surrounding
 * spaces or a byte-order mark.
 *
 * Dates accepted: ISO 8601 (`2025-03-14`, `2025-03-14T09:30`, `2025-03-14T09:30:00Z`,
 * `2025-03-14T09:30:00+01:00`), `YYYY-MM-DD HH:mm[:ss]`, `DD/MM/YYYY [HH:mm[:ss]]` (or
 * `MM/DD/YYYY` — see `dateOrder`), `DD.MM.YYYY [HH:mm[:ss]]` (always day first); a 12-hour time
 * may end in AM/PM. Years take four digits. A time without an offset is taken as UTC; the scan
 * day of a row is the calendar date as written.
 */
export interface ImportMapping {
  /** Field → the header of the file that holds it (null: the field is not in the file). */
  columns: Partial<Record<ImportField, string | null>>;
  /**
   * Columns kept as freeze-frame values: `header` in the file, stored under `key`. Headers
   * starting "FF:" or "Freeze frame:" are taken automatically, the rest of the header as key.
   */
  freezeFrame: Array<{ header: string; key: string }>;
  /**
   * The unit of the odometer when no unit column or value suffix says otherwise; detected from a
   * header such as "Odometer (mi)". null: the shop's distance unit.
   */
  odometerUnit: 'km' | 'mi' | null;
  /**
   * How a slash date (03/04/2025) is read: 'MDY' month first, 'DMY' day first. null: from the shop's
   * locale (en-US month first, every other locale day first).
   */
  dateOrder: 'DMY' | 'MDY' | null;
  /**
   * Extra status words (lower case) and what they mean, on top of the built-in ones
   * (stored: stored, confirmed, current, active…; pending: pending, maturing…; permanent: permanent…).
   */
  statusValues: Record<string, CodeStatus>;
}

/** A mapping as sent by a client: every part optional, merged over the detected one. */
export type ImportMappingInput = Partial<ImportMapping>;

export interface ImportRowProblem {
  /** 1-based line of the file where the row starts (the header is line 1). */
  line: number;
  /** The header of the column as written in the file, or the field name when the file lacks it. */
  column: string;
  message: string;
  /** Errors reject the row; warnings (a VIN outside North America without a check digit) do not. */
  severity: 'error' | 'warning';
}

/** A value read in a form the codec or VIN rules accept, and what it was read as. */
export interface ImportCorrection {
  line: number;
  column: string;
  from: string;
  to: string;
}

export interface ImportDetected {
  delimiter: ',' | ';' | '\t';
  encoding: 'utf-8' | 'utf-8-bom';
  lineEnding: 'crlf' | 'lf' | 'cr';
  headers: string[];
  /** The mapping used: the detected one with the client's changes applied. */
  mapping: ImportMapping;
  /** Headers that no field reads (ignored). */
  unmapped: string[];
}

/** One row as it would be stored. Null fields could not be read (see the problems of its line). */
export interface ImportPreviewRow {
  line: number;
  valid: boolean;
  /** Already imported before, or repeated earlier in the file: skipped. */
  duplicate: boolean;
  vin: string | null;
  /** ISO 8601 instant. */
  scannedAt: string | null;
  /** The calendar date as written, YYYY-MM-DD: one job per vehicle and scan day. */
  scanDay: string | null;
  odometerKm: number | null;
  module: string | null;
  /** Normalised, with the failure-type byte when one was read (P0456-13). */
  code: string | null;
  status: CodeStatus | null;
  description: string | null;
  freezeFrame: FreezeFrame;
  make: string | null;
  model: string | null;
}

export type ImportStatus = 'running' | 'committed' | 'refused' | 'failed' | 'interrupted';
export const IMPORT_STATUSES: readonly ImportStatus[] = ['running', 'committed', 'refused', 'failed', 'interrupted'];

/**
 * The answer to `POST /api/imports`. In a dry run the created/updated counts are what importing
 * the valid rows would do (the commit is rehearsed and rolled back); in a refused commit they are 0.
 */
export interface ImportReport {
  /** The import in the history; null for a dry run. */
  importId: string | null;
  fileName: string;
  dryRun: boolean;
  validOnly: boolean;
  /** True when the rows were written. */
  committed: boolean;
  /** True when the file has rejected rows and `validOnly` was not asked for: nothing is written. */
  refused: boolean;
  /** Data rows (empty lines not counted). */
  rows: number;
  /** Rows without an error (duplicates included). */
  accepted: number;
  rejected: number;
  /** Accepted rows already imported, or repeated in the file: they change nothing. */
  skippedDuplicates: number;
  createdVehicles: number;
  /** Existing vehicles whose odometer reading went up. */
  updatedVehicles: number;
  createdJobs: number;
  createdCodes: number;
  problems: ImportRowProblem[];
  problemsTotal: number;
  corrections: ImportCorrection[];
  correctionsTotal: number;
  preview: ImportPreviewRow[];
  detected: ImportDetected;
}

export interface ImportProgress {
  /** reading: parsing and checking rows; writing: the one transaction; done. */
  phase: 'reading' | 'writing' | 'done';
  bytesProcessed: number;
  bytesTotal: number;
  rowsProcessed: number;
}

export interface ImportSummaryDto {
  id: string;
  fileName: string;
  fileBytes: number;
  status: ImportStatus;
  validOnly: boolean;
  rows: number;
  accepted: number;
  rejected: number;
  skippedDuplicates: number;
  createdVehicles: number;
  updatedVehicles: number;
  createdJobs: number;
  createdCodes: number;
  progress: ImportProgress;
  createdBy: { id: string; displayName: string } | null;
  createdAt: string;
  finishedAt: string | null;
}

export interface ImportDto extends ImportSummaryDto {
  /** Why a failed import stopped (a file-level problem), null otherwise. */
  message: string | null;
  /** Null while running, and for an import that failed before its rows were read. */
  report: ImportReport | null;
}

export interface ImportListQuery {
  status?: ImportStatus;
  page?: number;
  pageSize?: number;
}

export interface SaveImportMappingRequest {
  /** Unique in the shop; saving under an existing name replaces that mapping. */
  name: string;
  mapping: ImportMappingInput;
}

export interface ImportMappingDto {
  id: string;
  name: string;
  mapping: ImportMappingInput;
  createdAt: string;
  updatedAt: string;
}

/** `details` of the 400 answered for a file without a required column. */
export interface ImportMissingColumnsDetails {
  missing: ImportField[];
  /** The headers of the file, as written. */
  headers: string[];
}
