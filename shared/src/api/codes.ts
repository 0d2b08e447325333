import type { DtcStructure, StatusBit } from '../dtc/index';

export interface CautionDto {
  key: string;
  title: string;
  points: string[];
  sources: string[];
}

/** The sentence every caution ends with. */
export const DEFER_TO_PROCEDURE = "Follow the vehicle maker's procedure, local regulations and licensed practice.";

export interface CodeSummaryDto {
  code: string;
  /** null: the meaning for every make. */
  make: string | null;
  title: string;
  subsystem: string;
  system: string;
  control: string;
}

export interface CodeIndexEntry extends CodeSummaryDto {
  /** Symptoms joined, for client-side fuzzy search. */
  symptoms: string;
}

export interface CodeEntryDto extends CodeSummaryDto {
  description: string;
  symptoms: string[];
  verification: { monitor: string; procedure: string; hours: number };
  escalation: { hours: number; description: string } | null;
  cautions: CautionDto[];
  structure: DtcStructure;
  source: string;
  /** Other makes' meanings of the same code, when manufacturer-controlled. */
  otherMakes: string[];
}

export interface DecodeResponse {
  input: string;
  structure: DtcStructure;
  /** Catalogue title when the code is known, for convenience. */
  known: { title: string; make: string | null } | null;
  status: { byte: number; hex: string; bits: StatusBit[] } | null;
}

export interface ImportProblem {
  /** 1-based line in the file (the header is line 1). */
  line: number;
  column: string;
  message: string;
}

export interface CatalogueImportReport {
  dryRun: boolean;
  rows: number;
  accepted: number;
  rejected: number;
  created: number;
  updated: number;
  problems: ImportProblem[];
}
