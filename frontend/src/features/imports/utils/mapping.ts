import { IMPORT_FIELDS, IMPORT_REQUIRED_FIELDS, type ImportField, type ImportMapping, type ImportMappingInput } from '@causeway/shared';

export const FIELD_LABELS: Record<ImportField, string> = {
  date: 'Scan date (and time)',
  time: 'Scan time',
  vin: 'VIN',
  odometer: 'Odometer',
  odometerUnit: 'Odometer unit',
  module: 'Module',
  code: 'Fault code',
  status: 'Code status',
  description: 'Description',
  make: 'Make',
  model: 'Model',
  year: 'Model year',
  engine: 'Engine',
  plate: 'Registration plate',
};

/** What one column of the file is read as. */
export type ColumnChoice = ImportField | 'freeze-frame' | 'ignore';

export const FREEZE_FRAME = 'freeze-frame';
export const IGNORE = 'ignore';

export function emptyMapping(): ImportMapping {
  return { columns: {}, freezeFrame: [], odometerUnit: null, dateOrder: null, statusValues: {} };
}

const same = (a: string | null | undefined, b: string) => (a ?? '').trim() === b.trim();

export function choiceOf(mapping: ImportMapping, header: string): ColumnChoice {
  for (const field of IMPORT_FIELDS) if (same(mapping.columns[field], header)) return field;
  if (mapping.freezeFrame.some((f) => same(f.header, header))) return FREEZE_FRAME;
  return IGNORE;
}

/** The mapping with `header` read as `choice`; a field read from another column before now comes from this one. */
export function assign(mapping: ImportMapping, header: string, choice: ColumnChoice): ImportMapping {
  const columns: ImportMapping['columns'] = {};
  for (const [field, h] of Object.entries(mapping.columns) as [ImportField, string | null][]) {
    if (h && !same(h, header) && field !== choice) columns[field] = h;
  }
  let freezeFrame = mapping.freezeFrame.filter((f) => !same(f.header, header));
  if (choice === FREEZE_FRAME) freezeFrame = [...freezeFrame, { header: header.trim(), key: header.trim().slice(0, 60) }];
  else if (choice !== IGNORE) columns[choice] = header.trim();
  return { ...mapping, columns, freezeFrame };
}

/** A saved mapping laid over the current one, as the server merges them. */
export function overlay(base: ImportMapping, input: ImportMappingInput): ImportMapping {
  const out: ImportMapping = { ...base, columns: { ...base.columns }, freezeFrame: [...base.freezeFrame], statusValues: { ...base.statusValues } };
  for (const [field, header] of Object.entries(input.columns ?? {}) as [ImportField, string | null][]) {
    if (header === null || header === '') delete out.columns[field];
    else out.columns[field] = header;
  }
  if (input.freezeFrame !== undefined) out.freezeFrame = [...input.freezeFrame];
  if (input.odometerUnit !== undefined) out.odometerUnit = input.odometerUnit;
  if (input.dateOrder !== undefined) out.dateOrder = input.dateOrder;
  if (input.statusValues !== undefined) Object.assign(out.statusValues, input.statusValues);
  return out;
}

/** Everything the editor shows, for the server: unmapped fields are sent as null so nothing detected sneaks back. */
export function toInput(mapping: ImportMapping): ImportMappingInput {
  const columns: Partial<Record<ImportField, string | null>> = {};
  for (const field of IMPORT_FIELDS) columns[field] = mapping.columns[field] ?? null;
  return { columns, freezeFrame: mapping.freezeFrame, odometerUnit: mapping.odometerUnit, dateOrder: mapping.dateOrder, statusValues: mapping.statusValues };
}

export function missingRequired(mapping: ImportMapping): ImportField[] {
  return IMPORT_REQUIRED_FIELDS.filter((f) => !mapping.columns[f]);
}

export function sameMapping(a: ImportMapping, b: ImportMapping): boolean {
  return JSON.stringify(toInput(a)) === JSON.stringify(toInput(b));
}

export const DELIMITER_LABELS: Record<string, string> = { ',': 'Comma', ';': 'Semicolon', '\t': 'Tab' };
export const ENCODING_LABELS: Record<string, string> = { 'utf-8': 'UTF-8', 'utf-8-bom': 'UTF-8 with byte-order mark' };
export const LINE_ENDING_LABELS: Record<string, string> = { crlf: 'Windows (CR LF)', lf: 'Unix (LF)', cr: 'Old Mac (CR)' };
